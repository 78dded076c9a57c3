import type { APIRoute } from 'astro';
import { reviewIdParamSchema } from '../../../../../../../lib/api/contracts';
import { handle, parseParam, requireUser } from '../../../../../../../server/http';
import { getReview } from '../../../../../../../server/services/reviews';

export const prerender = false;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json(await getReview(u, params.id!, parseParam(params.reviewId, reviewIdParamSchema, 'No such review.')));
});
