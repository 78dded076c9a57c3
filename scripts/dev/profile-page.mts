// Profiles the signed-in design page under load: writes a .cpuprofile into PROFILE_DIR.
import autocannon from 'autocannon';
import { startServer } from '../../tests/helpers/server';
import { Client } from '../../tests/helpers/client';
import { exampleDesigns } from '../../src/lib/design/examples';
const dir = process.env.PROFILE_DIR ?? '/tmp/prof';
const path = process.env.PROFILE_PATH ?? 'page';
const app = await startServer({ COILWRIGHT_SOLVE_RATE_LIMIT: '1000000000' }, { nodeArgs: ['--cpu-prof', `--cpu-prof-dir=${dir}`] });
const c = new Client(app.url);
await c.signUp('Prof Po', `prof-${process.pid}@example.test`);
const r = await c.post('/api/v1/designs', { name: 'Profiled coil', design: exampleDesigns[1].design });
const { id } = (await r.json()) as { id: string };
const cookie = [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
const url = path === 'api' ? `${app.url}/api/v1/designs/${id}` : `${app.url}/designs/${id}`;
const res = await autocannon({ url, connections: 10, duration: Number(process.env.PROFILE_SECONDS || 8), headers: { cookie } });
console.log('rps', res.requests.average, 'p99', res.latency.p99, 'non2xx', res.non2xx);
await app.stop();
