import type { APIRoute } from 'astro';
import { ApiError, handle, readJson } from '../../../server/http';
import { limitRequest } from '../../../server/rate-limit';
import { solveInput } from '../../../server/services/solve';

export const prerender = false;

const PER_MINUTE = Number(process.env.COILWRIGHT_SOLVE_RATE_LIMIT ?? '') || 120;

export const POST: APIRoute = handle(async ({ request, clientAddress, locals }) => {
  if (!limitRequest(locals, 'solve', clientAddress, PER_MINUTE)) throw new ApiError('rate_limited');
  const { result } = solveInput(await readJson(request));
  return Response.json(result);
});
