import { z, type ZodType } from 'zod';
import { designInputSchema } from '../lib/design';
import { createDesignBody, updateDesignBody } from './services/designs';
import type { RouteDoc } from './openapi-types';
import { libraryRoutes } from './openapi-routes-library';
import { workbenchRoutes } from './openapi-routes-workbench';

const meBody = z.object({ name: z.string().optional(), unitSystem: z.enum(['metric', 'imperial']).optional() });

const coreRoutes: RouteDoc[] = [
  { method: 'post', path: '/api/v1/solve', summary: 'Solve one design (no sign-in needed; rate limited).', body: designInputSchema, auth: false, responses: { 200: 'The result (see components.schemas.Result).', 400: 'Invalid design: error.issues names each field.', 429: 'Too many requests.' } },
  { method: 'get', path: '/api/v1/designs', summary: 'My designs and those shared with me.', responses: { 200: '{ designs: [{ id, name, role, revision, updatedAt, loadedFrequency, tapTurns }] }', 401: 'Not signed in.' } },
  { method: 'post', path: '/api/v1/designs', summary: 'Create a design (revision 1).', body: createDesignBody, responses: { 201: '{ id, name, revision: 1, role, design, result }', 400: 'Invalid name or design.', 401: 'Not signed in.' } },
  { method: 'get', path: '/api/v1/designs/{id}', summary: 'One design with its result.', responses: { 200: '{ id, name, design, revision, role, result }', 404: 'No such design, or no role on it.' } },
  { method: 'put', path: '/api/v1/designs/{id}', summary: 'Save a new revision; revision must be the latest.', body: updateDesignBody, responses: { 200: 'The saved design with its new revision.', 400: 'Invalid input; nothing saved.', 403: 'Viewer or admin: cannot write.', 404: 'No role on it.', 409: 'Stale revision; nothing overwritten (error.latestRevision).' } },
  { method: 'delete', path: '/api/v1/designs/{id}', summary: 'Delete a design with its revisions and files (owner only).', responses: { 204: 'Deleted.', 403: 'Not the owner.', 404: 'No role on it.' } },
  { method: 'get', path: '/api/v1/designs/{id}/revisions', summary: 'Every saved revision, newest first.', responses: { 200: '{ revisions: [{ revision, createdAt, author, name, message, summary }] }', 404: 'No role on it.' } },
  { method: 'get', path: '/api/v1/designs/{id}/revisions/{revision}', summary: 'One revision, read-only, with its result.', responses: { 200: '{ revision, name, design, createdAt, message, result }', 404: 'No such revision or no role.' } },
  { method: 'get', path: '/api/v1/designs/{id}/share', summary: 'Live share links (owner).', responses: { 200: '{ shares: [{ token, url, createdAt }] }', 404: 'No role on it.' } },
  { method: 'post', path: '/api/v1/designs/{id}/share', summary: 'Create a read-only share link (owner).', responses: { 201: '{ token, url }', 403: 'Not the owner.', 404: 'No role on it.' } },
  { method: 'delete', path: '/api/v1/designs/{id}/share/{token}', summary: 'Revoke a share link (owner).', responses: { 204: 'Revoked.', 404: 'No such link.' } },
  { method: 'get', path: '/api/v1/shared/{token}', summary: 'A shared design, without sign-in.', auth: false, responses: { 200: '{ name, design, result }', 404: 'Unknown or revoked token.' } },
  { method: 'get', path: '/api/v1/me', summary: 'The signed-in user.', responses: { 200: '{ user }', 401: 'Not signed in.' } },
  { method: 'patch', path: '/api/v1/me', summary: 'Change my name or unit preference.', body: meBody, responses: { 200: '{ user }', 400: 'Invalid field.', 401: 'Not signed in.' } },
];

function schemaOf(t: ZodType): unknown {
  try {
    return z.toJSONSchema(t, { io: 'input', unrepresentable: 'any' });
  } catch {
    return {};
  }
}

const errorSchema = {
  type: 'object',
  required: ['error'],
  properties: {
    error: {
      type: 'object',
      required: ['code', 'message'],
      properties: {
        code: { type: 'string' },
        message: { type: 'string' },
        issues: { type: 'array', items: { type: 'object', properties: { path: { type: 'string' }, message: { type: 'string' } } } },
      },
    },
  },
};

let cached: unknown;

/** The OpenAPI 3.1 document, generated from the same zod schemas the endpoints parse with. */
export function openApiDocument(): unknown {
  if (cached) return cached;
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of [...coreRoutes, ...libraryRoutes, ...workbenchRoutes]) {
    const params = [...r.path.matchAll(/\{(\w+)\}/g)].map((m) => ({ name: m[1], in: 'path', required: true, schema: { type: 'string' } }));
    const op: Record<string, unknown> = {
      summary: r.summary,
      parameters: params,
      security: r.auth === false ? [] : [{ session: [] }],
      responses: Object.fromEntries(
        Object.entries(r.responses).map(([code, description]) => [
          code,
          Number(code) >= 400 ? { description, content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } } } : { description },
        ]),
      ),
    };
    if (r.query) {
      const q = schemaOf(r.query) as { properties?: Record<string, unknown>; required?: string[] };
      for (const [name, schema] of Object.entries(q.properties ?? {})) params.push({ name, in: 'query', required: (q.required ?? []).includes(name), schema } as never);
    }
    if (r.body) op.requestBody = { required: true, content: { 'application/json': { schema: schemaOf(r.body) } } };
    (paths[r.path] ??= {})[r.method] = op;
  }
  cached = {
    openapi: '3.1.0',
    info: {
      title: 'Coilwright API',
      version: '1',
      description: 'Design, solve, store and share resonant air-core transformer (Tesla coil) designs. Quantities are SI numbers or strings with units.',
    },
    paths,
    components: {
      securitySchemes: { session: { type: 'apiKey', in: 'cookie', name: 'better-auth.session_token' } },
      schemas: { Design: schemaOf(designInputSchema), Error: errorSchema },
    },
  };
  return cached;
}
