import type { APIRoute } from 'astro';
import { env } from '../../../server/env';
import { ApiError, handle, readJson } from '../../../server/http';
import { limitRequest } from '../../../server/rate-limit';
import { solveInput } from '../../../server/services/solve';

export const prerender = false;

export const POST: APIRoute = handle(async ({ request, clientAddress, locals }) => {
  if (!limitRequest(locals, 'solve', clientAddress, env().COILWRIGHT_SOLVE_RATE_LIMIT)) throw new ApiError('rate_limited');
  // The design schema checks the body and names every field (solveBodySchema in the contract).
  const { result } = solveInput(await readJson(request));
  return Response.json(result);
});
