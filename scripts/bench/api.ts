// API and page throughput against a bare node:http baseline in the same run (autocannon, loopback).
// Prints, for 10 and 50 connections: requests/s and p99 latency of the app and of the baseline, and their
// ratio. Asserts nothing. Run: npx tsx scripts/bench/api.ts   (needs a build; npm run bench runs it too)
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { freePort, startServer } from '../../tests/helpers/server';
import { Client } from '../../tests/helpers/client';
import { exampleDesigns } from '../../src/lib/design/examples';

const root = resolve(import.meta.dirname, '../..');
const DURATION = Number(process.env.BENCH_API_SECONDS || 5);

type Figure = { rps: number; p99: number; errors: number; non2xx: number };

async function load(url: string, connections: number, opts: { method?: 'GET' | 'POST'; headers?: Record<string, string>; body?: string } = {}): Promise<Figure> {
  // A short warm-up so JIT and caches are in the same state for both servers.
  await autocannon({ url, connections, duration: 1, method: opts.method ?? 'GET', headers: opts.headers, body: opts.body });
  const r = await autocannon({ url, connections, duration: DURATION, method: opts.method ?? 'GET', headers: opts.headers, body: opts.body });
  return { rps: r.requests.average, p99: r.latency.p99, errors: r.errors + r.timeouts, non2xx: r.non2xx };
}

export async function runApiBench(): Promise<void> {
  const app = await startServer({ COILWRIGHT_SOLVE_RATE_LIMIT: '1000000000', COILWRIGHT_AUTH_RATE_LIMIT: '1000', COILWRIGHT_WARM_PAGES: '1' }, { keepData: true });
  const design = exampleDesigns[1].design;
  const c = new Client(app.url);
  await c.signUp('Bench Bo', `bench-${process.pid}@example.test`);
  const created = await c.post('/api/v1/designs', { name: 'Harbour Lane bench coil', design });
  const { id } = (await created.json()) as { id: string };
  const cookie = [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  // A browser keeps the session cookie better-auth refreshes (its signed copy lasts 60 s); autocannon sends one
  // fixed header, so each signed-in run starts with the cookie as it stands then.
  const freshCookie = async () => {
    await c.get('/api/v1/me');
    return [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  };
  const get = async (path: string, withCookie: boolean) => (await fetch(app.url + path, { headers: withCookie ? { cookie } : {} })).text();
  const bodies = { design: await get(`/api/v1/designs/${id}`, true), page: await get(`/designs/${id}`, true), home: await get('/', false) };
  const tmp = mkdtempSync(join(tmpdir(), 'coilwright-bench-'));
  const bodiesFile = join(tmp, 'bodies.json');
  writeFileSync(bodiesFile, JSON.stringify(bodies));
  const port = await freePort();
  const bare = spawn(process.execPath, [join(root, 'node_modules/tsx/dist/cli.mjs'), join(root, 'scripts/bench/bare-server.ts')], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'production', PORT: String(port), BENCH_DB: join(app.dataDir, 'test.db'), BENCH_DESIGN_ID: id, BENCH_BODIES: bodiesFile },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise<void>((ok) => bare.stdout!.once('data', () => ok()));
  const base = `http://127.0.0.1:${port}`;
  const solveBody = JSON.stringify(design);
  const json = { 'content-type': 'application/json' };
  const rows: Array<{ name: string; app: (n: number) => Promise<Figure>; bare: (n: number) => Promise<Figure>; target: string }> = [
    {
      name: 'POST /api/v1/solve',
      app: (n) => load(`${app.url}/api/v1/solve`, n, { method: 'POST', headers: json, body: solveBody }),
      bare: (n) => load(`${base}/solve`, n, { method: 'POST', headers: json, body: solveBody }),
      target: 'ratio ≥ 0.9 at 10',
    },
    {
      name: 'GET /api/v1/designs/:id (signed in)',
      app: async (n) => load(`${app.url}/api/v1/designs/${id}`, n, { headers: { cookie: await freshCookie() } }),
      bare: (n) => load(`${base}/design`, n),
      target: 'ratio ≥ 0.1 at 10; p99 ≤ 100 ms at 50',
    },
    {
      name: 'GET /designs/:id (signed in)',
      app: async (n) => load(`${app.url}/designs/${id}`, n, { headers: { cookie: await freshCookie() } }),
      bare: (n) => load(`${base}/page`, n),
      target: 'ratio ≥ 0.05 at 10; p99 ≤ 250 ms at 50',
    },
    { name: 'GET / (anonymous)', app: (n) => load(`${app.url}/`, n), bare: (n) => load(`${base}/home`, n), target: 'ratio ≥ 0.3 at 10' },
  ];
  console.log(`\nAPI and pages against a bare node:http server answering the same bytes (autocannon, ${DURATION} s a run, loopback)`);
  try {
    for (const r of rows.filter((x) => !process.env.BENCH_API_ONLY || x.name.includes(process.env.BENCH_API_ONLY))) {
      for (const n of [10, 50]) {
        const a = await r.app(n);
        const b = await r.bare(n);
        const bad = a.errors + a.non2xx > 0 ? ` (app: ${a.errors} errors, ${a.non2xx} non-2xx)` : '';
        console.log(
          `${r.name}, ${n} connections: app ${a.rps.toFixed(0)} req/s p99 ${a.p99} ms | bare ${b.rps.toFixed(0)} req/s p99 ${b.p99} ms | ratio ${(a.rps / b.rps).toFixed(3)}${bad}  [target ${r.target}]`,
        );
      }
    }
  } finally {
    bare.kill('SIGTERM');
    await app.stop();
    rmSync(app.dataDir, { recursive: true, force: true });
    rmSync(tmp, { recursive: true, force: true });
  }
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(import.meta.filename)) await runApiBench();
