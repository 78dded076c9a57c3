import type { APIRoute } from 'astro';
import { decideReviewBodySchema, reviewIdParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseBody, parseParam, requireUser } from '../../../../../../../server/http';
import { siteOrigin } from '../../../../../../../server/site-url';
import { decideReview } from '../../../../../../../server/services/reviews';

export const prerender = false;

/** The reviewer records a finding per item and signs off or asks for changes. */
export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  const reviewId = parseParam(params.reviewId, reviewIdParamSchema, 'No such review.');
  const b = await parseBody(request, decideReviewBodySchema);
  return Response.json(await decideReview(u, params.id!, reviewId, b, siteOrigin()));
});
