import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z, type ZodObject } from 'zod';
import { startServer, type TestServer } from '../helpers/server';
import { createDesign, signUp } from '../helpers/accounts';
import {
  apiErrorBodySchema,
  designListResponseSchema,
  designRecordSchema,
  meResponseSchema,
  sessionUserSchema,
  updateMeBodySchema,
} from '../../src/lib/api/contracts';

type Schema = { type?: string; properties?: Record<string, Schema>; required?: string[]; $ref?: string; enum?: unknown[]; anyOf?: Schema[]; additionalProperties?: unknown };
type Operation = { requestBody?: { content: Record<string, { schema: Schema }> }; responses: Record<string, { content?: Record<string, { schema: Schema }> }> };
type Doc = { paths: Record<string, Record<string, Operation>>; components: { schemas: Record<string, Schema> } };

let s: TestServer;
let doc: Doc;
beforeAll(async () => {
  s = await startServer();
  doc = await (await fetch(`${s.url}/api/v1/openapi.json`)).json();
});
afterAll(async () => {
  await s?.stop();
});

const root = resolve(import.meta.dirname, '../..');
const apiDir = join(root, 'src/pages/api/v1');

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? routeFiles(join(dir, e.name)) : e.name.endsWith('.ts') ? [join(dir, e.name)] : []));
}

/** src/pages/api/v1/designs/[id]/index.ts → /api/v1/designs/{id} */
function openApiPath(file: string): string {
  const rel = relative(apiDir, file).replace(/\.ts$/, '').replace(/(^|\/)index$/, '');
  return `/api/v1${rel ? `/${rel}` : ''}`.replace(/\[(\w+)\]/g, '{$1}');
}

function jsonOf(op: Operation | undefined, code: string): Schema {
  const schema = op?.responses[code]?.content?.['application/json']?.schema;
  expect(schema, `no JSON schema for ${code}`).toBeTruthy();
  return schema!;
}

/** A contract object's JSON Schema as zod writes it: property names, required names and each property's type. */
function shapeOf(schema: ZodObject, io: 'input' | 'output' = 'output') {
  const js = z.toJSONSchema(schema, { io, unrepresentable: 'any' }) as Schema;
  return { keys: Object.keys(js.properties ?? {}).sort(), required: [...(js.required ?? [])].sort(), types: typesOf(js) };
}

function typesOf(js: Schema): Record<string, unknown> {
  return Object.fromEntries(Object.entries(js.properties ?? {}).map(([k, v]) => [k, v.type ?? (v.enum ? { enum: v.enum } : null)]));
}

function documentedShape(js: Schema) {
  return { keys: Object.keys(js.properties ?? {}).sort(), required: [...(js.required ?? [])].sort(), types: typesOf(js) };
}

describe('the OpenAPI document is the contract', () => {
  it('GET /api/v1/designs/{id} answers with the contract’s design record', () => {
    const js = jsonOf(doc.paths['/api/v1/designs/{id}']?.get, '200');
    expect(documentedShape(js)).toEqual(shapeOf(designRecordSchema));
    expect(js.properties?.design.$ref).toBe('#/components/schemas/StoredDesign');
    expect(js.properties?.result.anyOf?.[0].$ref).toBe('#/components/schemas/Result');
    expect(doc.components.schemas.Result.type).toBe('object');
  });

  it('GET and PATCH /api/v1/me answer with the contract’s user, and PATCH takes the contract’s body', () => {
    for (const method of ['get', 'patch']) {
      const js = jsonOf(doc.paths['/api/v1/me']?.[method], '200');
      expect(documentedShape(js)).toEqual(shapeOf(meResponseSchema));
      expect(documentedShape(js.properties!.user)).toEqual(shapeOf(sessionUserSchema));
      expect(js.properties!.user.properties!.unitSystem.enum).toEqual(['metric', 'imperial']);
    }
    const body = doc.paths['/api/v1/me'].patch.requestBody!.content['application/json'].schema;
    expect(documentedShape(body)).toEqual(shapeOf(updateMeBodySchema, 'input'));
    expect(body.additionalProperties).toBe(false);
  });

  it('every error answer refers to the contract’s error body', () => {
    expect(documentedShape(doc.components.schemas.Error)).toEqual(shapeOf(apiErrorBodySchema));
    let errors = 0;
    for (const ops of Object.values(doc.paths)) {
      for (const op of Object.values(ops)) {
        for (const [code, r] of Object.entries(op.responses)) {
          if (Number(code) < 400) continue;
          errors += 1;
          expect(r.content?.['application/json']?.schema.$ref).toBe('#/components/schemas/Error');
        }
      }
    }
    expect(errors).toBeGreaterThan(50);
  });

  it('every route file under src/pages/api/v1 and each method it exports is documented, and nothing else is', () => {
    const files = routeFiles(apiDir);
    expect(files.length).toBeGreaterThan(30);
    const fromFiles = files.flatMap((f) => {
      const methods = [...readFileSync(f, 'utf8').matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1].toLowerCase());
      expect(methods.length, `${f} exports no method`).toBeGreaterThan(0);
      return methods.map((m) => `${m} ${openApiPath(f)}`);
    });
    const documented = Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m} ${p}`));
    expect(documented.sort()).toEqual(fromFiles.sort());
  });
});

describe('real answers match the contract', () => {
  it('GET /api/v1/designs/:id, GET /api/v1/designs and GET /api/v1/me parse with the contract schemas, with no member left undocumented', async () => {
    const { c } = await signUp(s.url, 'Ines Harbour');
    const { id } = await createDesign(c, 'Open day coil');
    const one = await (await c.get(`/api/v1/designs/${id}`)).json();
    expect(designRecordSchema.strict().safeParse(one).error).toBeUndefined();
    expect(one.result.secondary.inductance).toBeGreaterThan(0);
    const list = await (await c.get('/api/v1/designs')).json();
    expect(designListResponseSchema.safeParse(list).error).toBeUndefined();
    expect(list.designs.map((d: { id: string }) => d.id)).toEqual([id]);
    const me = await (await c.get('/api/v1/me')).json();
    expect(z.object({ user: sessionUserSchema.strict() }).strict().safeParse(me).error).toBeUndefined();
  });

  it('a refused PATCH /api/v1/me answers with the contract’s error body naming the field', async () => {
    const { c } = await signUp(s.url, 'Odile Harbour');
    const r = await c.patch('/api/v1/me', { unitSystem: 'cubits' });
    expect(r.status).toBe(400);
    const body = apiErrorBodySchema.parse(await r.json());
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.issues).toEqual([{ path: 'unitSystem', message: 'Choose metric or imperial.' }]);
  });
});
