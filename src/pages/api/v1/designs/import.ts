import type { APIRoute } from 'astro';
import { IMPORT_LIMIT_BYTES } from '../../../../lib/api/contracts';
import { handle, readJson, requireUser } from '../../../../server/http';
import { importDesign } from '../../../../server/services/import-export';

export const prerender = false;

// The whole file is checked at once (envelope and design), so every issue is reported together.
export const POST: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const created = await importDesign(u, await readJson(request, IMPORT_LIMIT_BYTES));
  return Response.json(created, { status: 201 });
});
