import { z, type ZodType } from 'zod';
import {
  apiErrorBodySchema,
  createDesignBodySchema,
  designInputSchema,
  designListResponseSchema,
  designRecordSchema,
  meResponseSchema,
  resultSchema,
  revisionListResponseSchema,
  revisionRecordSchema,
  sharedDesignSchema,
  shareLinkSchema,
  shareListResponseSchema,
  solveBodySchema,
  solveResponseSchema,
  storedDesignSchema,
  updateDesignBodySchema,
  updateMeBodySchema,
} from '../lib/api/contracts';
import { json, media, type ResponseDoc, type RouteDoc } from './openapi-types';
import { libraryRoutes } from './openapi-routes-library';
import { workbenchRoutes } from './openapi-routes-workbench';
import { windingRoutes } from './openapi-routes-winding';
import { groupRoutes } from './openapi-routes-groups';

const coreRoutes: RouteDoc[] = [
  { method: 'post', path: '/api/v1/solve', summary: 'Solve one design (no sign-in needed; rate limited).', body: solveBodySchema, auth: false, responses: { 200: json(solveResponseSchema, 'The result.'), 400: 'Invalid design: error.issues names each field.', 429: 'Too many requests.' } },
  { method: 'get', path: '/api/v1/designs', summary: 'My designs and those shared with me.', responses: { 200: json(designListResponseSchema, 'My designs, most recently changed first.'), 401: 'Not signed in.' } },
  { method: 'post', path: '/api/v1/designs', summary: 'Create a design (revision 1).', body: createDesignBodySchema, responses: { 201: json(designRecordSchema, 'The new design at revision 1.'), 400: 'Invalid name or design.', 401: 'Not signed in.' } },
  { method: 'get', path: '/api/v1/designs/{id}', summary: 'One design with its result.', responses: { 200: json(designRecordSchema, 'The design with its result.'), 404: 'No such design, or no role on it.' } },
  { method: 'put', path: '/api/v1/designs/{id}', summary: 'Save a new revision; revision must be the latest.', body: updateDesignBodySchema, responses: { 200: json(designRecordSchema, 'The saved design with its new revision.'), 400: 'Invalid input; nothing saved.', 403: 'Viewer or admin: cannot write.', 404: 'No role on it.', 409: 'Stale revision; nothing overwritten (error.latestRevision).' } },
  { method: 'delete', path: '/api/v1/designs/{id}', summary: 'Delete a design with its revisions and files (owner only).', responses: { 204: 'Deleted.', 403: 'Not the owner.', 404: 'No role on it.' } },
  { method: 'get', path: '/api/v1/designs/{id}/revisions', summary: 'Every saved revision, newest first.', responses: { 200: json(revisionListResponseSchema, 'The revisions, newest first.'), 404: 'No role on it.' } },
  { method: 'get', path: '/api/v1/designs/{id}/revisions/{revision}', summary: 'One revision, read-only, with its result.', responses: { 200: json(revisionRecordSchema, 'The revision with its result.'), 404: 'No such revision or no role.' } },
  { method: 'get', path: '/api/v1/designs/{id}/share', summary: 'Live share links (owner).', responses: { 200: json(shareListResponseSchema, 'The live links, newest first.'), 404: 'No role on it.' } },
  { method: 'post', path: '/api/v1/designs/{id}/share', summary: 'Create a read-only share link (owner).', responses: { 201: json(shareLinkSchema, 'The new link.'), 403: 'Not the owner.', 404: 'No role on it.' } },
  { method: 'delete', path: '/api/v1/designs/{id}/share/{token}', summary: 'Revoke a share link (owner).', responses: { 204: 'Revoked.', 404: 'No such link.' } },
  { method: 'get', path: '/api/v1/shared/{token}', summary: 'A shared design, without sign-in.', auth: false, responses: { 200: json(sharedDesignSchema, 'The shared design with its result.'), 404: 'Unknown or revoked token.' } },
  { method: 'get', path: '/api/v1/me', summary: 'The signed-in user.', responses: { 200: json(meResponseSchema, 'The signed-in user.'), 401: 'Not signed in.' } },
  { method: 'get', path: '/api/v1/openapi.json', summary: 'This document, generated from the contract schemas.', auth: false, responses: { 200: media('application/json', 'The OpenAPI 3.1 document.') } },
  { method: 'patch', path: '/api/v1/me', summary: 'Change my name or unit preference.', body: updateMeBodySchema, responses: { 200: json(meResponseSchema, 'The user as stored now.'), 400: 'Invalid field.', 401: 'Not signed in.' } },
];

/** Every documented route; a test checks each route file under src/pages/api/v1 appears here. */
export const apiRoutes: readonly RouteDoc[] = [...coreRoutes, ...libraryRoutes, ...workbenchRoutes, ...windingRoutes, ...groupRoutes];

type JsonSchema = Record<string, unknown>;

/** Schemas the contract types with TypeScript alone (z.custom): objects, described in words. */
const customSchemas = new Set<ZodType>([resultSchema, storedDesignSchema]);

const REF = '#/components/schemas/';

/** Replaces `#/$defs/X` with a components reference, everywhere in a converted schema. */
function relink(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(relink);
  if (node && typeof node === 'object') {
    return Object.fromEntries(
      Object.entries(node).map(([k, v]) => [k, k === '$ref' && typeof v === 'string' ? v.replace(/^#\/\$defs\//, REF) : relink(v)]),
    );
  }
  return node;
}

/**
 * A contract schema as JSON Schema (draft 2020-12, which OpenAPI 3.1 uses). Schemas named with `.meta({ id })`
 * become shared components; everything else is inlined.
 */
export function jsonSchemaOf(schema: ZodType, io: 'input' | 'output', components: Record<string, unknown> = {}): JsonSchema {
  const raw = z.toJSONSchema(schema, {
    io,
    unrepresentable: 'any',
    override: (ctx) => {
      if (customSchemas.has(ctx.zodSchema as unknown as ZodType)) ctx.jsonSchema.type = 'object';
    },
  }) as JsonSchema & { $defs?: Record<string, unknown> };
  const { $schema: _schema, $defs, ...rest } = raw;
  for (const [id, def] of Object.entries($defs ?? {})) components[id] ??= relink(def);
  return relink(rest) as JsonSchema;
}

function unwrapOptional(schema: ZodType): ZodType {
  return schema instanceof z.ZodOptional ? (schema.unwrap() as ZodType) : schema;
}

function responseOf(code: string, doc: ResponseDoc | string, components: Record<string, unknown>) {
  if (Number(code) >= 400) {
    const description = typeof doc === 'string' ? doc : doc.description;
    return { description, content: { 'application/json': { schema: { $ref: `${REF}Error` } } } };
  }
  if (typeof doc === 'string') return { description: doc };
  if ('schema' in doc) return { description: doc.description, content: { 'application/json': { schema: jsonSchemaOf(doc.schema, 'output', components) } } };
  return { description: doc.description, content: { [doc.media]: {} } };
}

let cached: unknown;

/** The OpenAPI 3.1 document, generated from the contract schemas the endpoints parse with and the services return. */
export function openApiDocument(): unknown {
  if (cached) return cached;
  const components: Record<string, unknown> = {
    Design: jsonSchemaOf(designInputSchema, 'input'),
  };
  components.Error = jsonSchemaOf(apiErrorBodySchema, 'output', components);
  const paths: Record<string, Record<string, unknown>> = {};
  for (const r of apiRoutes) {
    const params: unknown[] = [...r.path.matchAll(/\{(\w+)\}/g)].map((m) => ({ name: m[1], in: 'path', required: true, schema: { type: 'string' } }));
    if (r.query) {
      const q = jsonSchemaOf(r.query, 'input', components) as { properties?: Record<string, unknown>; required?: string[] };
      for (const [name, schema] of Object.entries(q.properties ?? {})) params.push({ name, in: 'query', required: (q.required ?? []).includes(name), schema });
    }
    const op: Record<string, unknown> = {
      summary: r.summary,
      parameters: params,
      security: r.auth === false ? [] : [{ session: [] }],
      responses: Object.fromEntries(Object.entries(r.responses).map(([code, doc]) => [code, responseOf(code, doc, components)])),
    };
    if (r.body) {
      op.requestBody = {
        required: !r.bodyOptional,
        content: { [r.bodyMedia ?? 'application/json']: { schema: jsonSchemaOf(unwrapOptional(r.body), 'input', components) } },
      };
    }
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
      schemas: components,
    },
  };
  return cached;
}
