// CPU milliseconds the server process spends per request (user + system, from /proc), for the signed-in
// design API, the design page and the home page. Less sensitive to other load on the machine than req/s.
import autocannon from 'autocannon';
import { readFileSync } from 'node:fs';
import { startServer } from '../../tests/helpers/server';
import { Client } from '../../tests/helpers/client';
import { exampleDesigns } from '../../src/lib/design/examples';

const TICK_MS = 10; // USER_HZ = 100 on Linux
const cpuMs = (pid: number) => {
  const f = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
  return (Number(f[11]) + Number(f[12])) * TICK_MS;
};
const app = await startServer({ COILWRIGHT_SOLVE_RATE_LIMIT: '1000000000' });
const c = new Client(app.url);
await c.signUp('Cpu Cy', `cpu-${process.pid}@example.test`);
const r = await c.post('/api/v1/designs', { name: 'Measured coil', design: exampleDesigns[1].design });
const { id } = (await r.json()) as { id: string };
const cookie = [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
const rows: Array<[string, string, Record<string, string>]> = [
  ['GET /api/v1/designs/:id', `/api/v1/designs/${id}`, { cookie }],
  ['GET /designs/:id', `/designs/${id}`, { cookie }],
  ['GET /', '/', {}],
];
for (const [name, path, headers] of rows) {
  await autocannon({ url: app.url + path, connections: 10, amount: 300, headers });
  const before = cpuMs(app.pid);
  const res = await autocannon({ url: app.url + path, connections: 10, amount: 2000, headers });
  const used = cpuMs(app.pid) - before;
  console.log(`${name}: ${(used / res.requests.total).toFixed(3)} ms CPU a request (${res.requests.total} requests, ${res.non2xx} non-2xx)`);
}
await app.stop();
