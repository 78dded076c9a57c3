import type { APIRoute } from 'astro';
import { getDb } from '../../../../server/db';
import { handle, readJson, requireUser } from '../../../../server/http';
import { IMPORT_LIMIT_BYTES, importDesign } from '../../../../server/services/import-export';

export const prerender = false;

export const POST: APIRoute = handle(async ({ locals, request }) => {
  const u = requireUser(locals);
  const created = await importDesign(getDb(), u, await readJson(request, IMPORT_LIMIT_BYTES));
  return Response.json(created, { status: 201 });
});
