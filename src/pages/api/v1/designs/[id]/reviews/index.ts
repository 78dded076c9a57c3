import type { APIRoute } from 'astro';
import { requestReviewBodySchema } from '../../../../../../lib/api/contracts';
import { ApiError, handle, parseBody, requireUser } from '../../../../../../server/http';
import { allow } from '../../../../../../server/rate-limit';
import { siteOrigin } from '../../../../../../server/site-url';
import { listReviews, requestReview } from '../../../../../../server/services/reviews';

export const prerender = false;

// A request mails the reviewers.
const PER_MINUTE = 20;

export const GET: APIRoute = handle(async ({ locals, params }) => {
  const u = requireUser(locals);
  return Response.json({ reviews: await listReviews(u, params.id!) });
});

export const POST: APIRoute = handle(async ({ locals, params, request }) => {
  const u = requireUser(locals);
  if (!allow('review', u.id, PER_MINUTE)) throw new ApiError('rate_limited');
  const b = await parseBody(request, requestReviewBodySchema);
  return Response.json(await requestReview(u, params.id!, b, siteOrigin()), { status: 201 });
});
