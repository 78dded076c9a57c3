import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { createClient } from '@libsql/client';
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, sep } from 'node:path';
import { startServer, type TestServer } from '../helpers/server';
import { toroidCoil } from '../api/designs-fixtures';
import { createDesign, signUp as signedUp } from '../helpers/accounts';
import type { Client } from '../helpers/client';

/**
 * Hostile input against every /api/v1 route the app has (found from the files under src/pages/api/v1):
 * random JSON, wrong types in a valid design, broken JSON and random bytes as bodies, random strings as
 * path parameters. Never a 5xx; every error in the contract's shape without a stack trace, SQL or file
 * path; when no request of a route succeeded, nothing stored changed.
 */
const RUNS = Number(process.env.FUZZ_RUNS || 1000);
const API_DIR = resolve(import.meta.dirname, '../../src/pages/api/v1');

type Route = { path: string; methods: string[] };

function routes(): Route[] {
  const out: Route[] = [];
  const walk = (dir: string) => {
    for (const name of readdirSync(dir)) {
      const p = join(dir, name);
      if (statSync(p).isDirectory()) walk(p);
      else if (p.endsWith('.ts')) {
        const rel = relative(API_DIR, p).split(sep).join('/').replace(/\.ts$/, '').replace(/\/index$|^index$/, '');
        const methods = [...readFileSync(p, 'utf8').matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1]);
        out.push({ path: `/api/v1/${rel}`.replace(/\/$/, ''), methods });
      }
    }
  };
  walk(API_DIR);
  return out;
}

const LEAKS = [/\bat \S+ \(.*:\d+:\d+\)/, /SQLITE_|LibsqlError|\bSELECT\b|\bINSERT INTO\b|\bUPDATE \w+ SET\b/i, /node_modules|\/work\/|\/tmp\/|\/home\/|file:\/\//, /TypeError|ReferenceError|RangeError/];

let s: TestServer;
let c: Client;
let ids: Record<string, string>;

beforeAll(async () => {
  s = await startServer({ COILWRIGHT_SOLVE_RATE_LIMIT: '100000000' });
  const u = await signedUp(s.url, 'Fuzz Fenna');
  c = u.c;
  const { id } = await createDesign(c, 'Fuzzed coil');
  ids = { id, userId: u.id, revision: '1', token: 'no-such-token', invitationId: 'no-such-invitation', measurementId: 'no-such-measurement' };
});
afterAll(async () => {
  await s?.stop();
});

async function snapshot(): Promise<string> {
  const db = createClient({ url: `file:${join(s.dataDir, 'test.db')}` });
  try {
    const tables = (await db.execute("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT IN ('session', 'verification') AND name NOT LIKE 'sqlite_%' AND name NOT LIKE '__drizzle%' ORDER BY name")).rows.map((r) => String(r.name));
    const h = createHash('sha256');
    for (const t of tables) {
      const rows = await db.execute(`SELECT * FROM "${t}" ORDER BY 1`);
      h.update(t).update(JSON.stringify(rows.rows));
    }
    return h.digest('hex');
  } finally {
    db.close();
  }
}

function fill(path: string, param?: string): string {
  return path.replace(/\[(\w+)\]/g, (_, name: string) => (param !== undefined ? encodeURIComponent(param) : ids[name] ?? 'x'));
}

const designKeys = ['secondary', 'primary', 'topload', 'tank', 'supply', 'tuning', 'name', 'design', 'revision', 'role', 'email', 'message', 'unitSystem'];
const hostileValue = fc.oneof(fc.anything(), fc.string(), fc.double(), fc.integer(), fc.constant(null), fc.constant('3 kg'), fc.constant('-1e308 m'), fc.constant('__proto__'));
const body = fc.oneof(
  fc.anything().map((v) => JSON.stringify(v) ?? 'null'),
  fc.dictionary(fc.constantFrom(...designKeys), hostileValue).map((o) => JSON.stringify(o)),
  fc.record({ name: fc.string(), design: fc.constantFrom(toroidCoil).chain((d) => fc.record({ secondary: fc.record({ ...Object.fromEntries(Object.keys(d.secondary).map((k) => [k, hostileValue])) }) })), revision: hostileValue }).map((o) => JSON.stringify(o)),
  fc.string(),
  fc.uint8Array({ maxLength: 256 }).map((b) => Buffer.from(b).toString('latin1')),
);

function checkError(status: number, text: string, what: string) {
  expect(status, what).toBeLessThan(500);
  for (const leak of LEAKS) expect(text, `${what}: ${leak}`).not.toMatch(leak);
  if (status >= 400 && text) {
    const parsed = JSON.parse(text) as { error?: { code?: unknown; message?: unknown; issues?: unknown } };
    expect(typeof parsed.error?.code, what).toBe('string');
    expect(typeof parsed.error?.message, what).toBe('string');
    if (parsed.error?.issues !== undefined) expect(Array.isArray(parsed.error.issues), what).toBe(true);
  }
}

describe('fuzzing every /api/v1 route', () => {
  const all = routes();
  it('finds the routes from the files', () => {
    expect(all.length).toBeGreaterThan(20);
    expect(all.map((r) => r.path)).toContain('/api/v1/solve');
  });

  for (const r of all) {
    for (const method of r.methods) {
      const takesBody = method === 'POST' || method === 'PUT' || method === 'PATCH';
      const hasParams = r.path.includes('[');
      if (!takesBody && !hasParams) continue;
      it(`${method} ${r.path}: ${takesBody ? 'bodies' : 'parameters'}`, { timeout: 600_000 }, async () => {
        const before = await snapshot();
        let succeeded = 0;
        const arb = takesBody ? body.map((b) => ({ b, p: undefined as string | undefined })) : fc.string({ maxLength: 80 }).map((p) => ({ b: undefined as string | undefined, p }));
        await fc.assert(
          fc.asyncProperty(arb, async ({ b, p }) => {
            const path = fill(r.path, p);
            const res = await c.req(method, path, b, b === undefined ? {} : { 'content-type': 'application/json' });
            const text = await res.text();
            if (res.status < 300) succeeded += 1;
            checkError(res.status, res.status >= 400 ? text : '', `${method} ${path} ${String(b).slice(0, 200)}`);
          }),
          { numRuns: RUNS },
        );
        // The server keeps serving.
        expect((await c.get('/api/v1/me')).status).toBe(200);
        if (succeeded === 0 && method !== 'GET') expect(await snapshot(), 'a failed request changed what was stored').toBe(before);
      });
    }
  }

  it('a body over the limit gets 413 and the server keeps serving', async () => {
    const big = JSON.stringify({ name: 'x'.repeat(2_000_000), design: toroidCoil });
    const res = await c.req('POST', '/api/v1/designs', big);
    expect(res.status).toBe(413);
    expect((await res.json()).error.code).toBe('payload_too_large');
    expect((await c.get('/api/v1/me')).status).toBe(200);
  });
});
