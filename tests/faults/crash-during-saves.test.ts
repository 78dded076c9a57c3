import { afterAll, describe, expect, it } from 'vitest';
import { createClient } from '@libsql/client';
import { join } from 'node:path';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { toroidCoil } from '../api/designs-fixtures';
import { createDesign, signUp as signedUp } from '../helpers/accounts';

type Ack = { revision: number; turns: number; name: string };

const servers: TestServer[] = [];
afterAll(async () => {
  for (const s of servers.reverse()) await s.stop();
});

function designWith(turns: number) {
  return { ...toroidCoil, secondary: { ...toroidCoil.secondary, turns } };
}

/** Saves one new revision after another, taking the latest revision from a 409 when another client got there first. */
async function saver(c: Client, id: string, tag: string, acks: Ack[], stop: { now: boolean }) {
  let revision = 1;
  for (let i = 0; !stop.now; i++) {
    const turns = 500 + Math.floor(Math.random() * 1500);
    const name = `${tag} save ${i} (${turns} turns)`;
    let r: Response;
    try {
      r = await c.put(`/api/v1/designs/${id}`, { name, design: designWith(turns), revision });
    } catch {
      return; // the server went away mid-request: this save was never acknowledged
    }
    if (r.status === 200) {
      const body = (await r.json()) as { revision: number };
      acks.push({ revision: body.revision, turns, name });
      revision = body.revision;
    } else if (r.status === 409) {
      revision = ((await r.json()) as { error: { latestRevision: number } }).error.latestRevision;
    } else {
      throw new Error(`unexpected ${r.status}: ${await r.text()}`);
    }
  }
}

describe('a server killed in the middle of concurrent saves', () => {
  it('keeps every acknowledged revision, shows no half-written one, and the database passes integrity_check', { timeout: 180_000 }, async () => {
    const first = await startServer({}, { keepData: true });
    servers.push(first);
    // Three builders, each saving one design from two browsers at once (two sessions of the same account).
    const designs: { id: string; clients: Client[]; acks: Ack[] }[] = [];
    for (const who of ['Crash Cora', 'Crash Cyd', 'Crash Cal']) {
      const u = await signedUp(first.url, who);
      const { id } = await createDesign(u.c, `${who}'s coil`);
      const second = new Client(first.url);
      await second.signIn(u.email);
      designs.push({ id, clients: [u.c, second], acks: [] });
    }
    const stop = { now: false };
    const running = designs.flatMap((d) => d.clients.map((c, k) => saver(c, d.id, `client ${k}`, d.acks, stop)));
    // Let the saves run until each design has some acknowledged revisions, then cut the power.
    const deadline = Date.now() + 20_000;
    while (designs.some((d) => d.acks.length < 8) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    await first.kill();
    stop.now = true;
    await Promise.all(running);
    for (const d of designs) expect(d.acks.length).toBeGreaterThanOrEqual(8);

    const again = await startServer({}, { dataDir: first.dataDir });
    servers.push(again);
    const raw = createClient({ url: `file:${join(first.dataDir, 'test.db')}` });
    try {
      for (const d of designs) {
        const head = await raw.execute({ sql: 'SELECT revision, name, design FROM designs WHERE id = ?', args: [d.id] });
        const revs = await raw.execute({ sql: 'SELECT revision, name, design FROM design_revisions WHERE design_id = ? ORDER BY revision', args: [d.id] });
        const latest = Number(head.rows[0].revision);
        // Every acknowledged revision is there with exactly what was acknowledged.
        for (const a of d.acks) {
          const row = revs.rows.find((r) => Number(r.revision) === a.revision);
          expect(row, `revision ${a.revision} of ${d.id}`).toBeDefined();
          expect(row!.name).toBe(a.name);
          expect(JSON.parse(String(row!.design)).secondary.turns).toBe(a.turns);
        }
        expect(latest).toBeGreaterThanOrEqual(Math.max(...d.acks.map((a) => a.revision)));
        // No half-write: revisions are 1..latest without a gap, and the design row is its latest revision.
        expect(revs.rows.map((r) => Number(r.revision))).toEqual(Array.from({ length: latest }, (_, i) => i + 1));
        const top = revs.rows[revs.rows.length - 1];
        expect(head.rows[0].name).toBe(top.name);
        expect(JSON.parse(String(head.rows[0].design))).toEqual(JSON.parse(String(top.design)));
        // Each stored name matches its own design (a revision row is never half old, half new).
        for (const r of revs.rows.slice(1)) {
          const m = /\((\d+) turns\)$/.exec(String(r.name));
          expect(m, String(r.name)).not.toBeNull();
          expect(JSON.parse(String(r.design)).secondary.turns).toBe(Number(m![1]));
        }
      }
      const check = await raw.execute('PRAGMA integrity_check');
      expect(check.rows.map((r) => Object.values(r)[0])).toEqual(['ok']);
    } finally {
      raw.close();
    }
    // Sessions are stored in the same database: the builders' cookies still work, and the API shows the latest revision.
    for (const d of designs) {
      const reader = new Client(again.url);
      reader.cookies = new Map(d.clients[0].cookies);
      const r = await reader.get(`/api/v1/designs/${d.id}`);
      expect(r.status).toBe(200);
      const body = (await r.json()) as { revision: number; name: string };
      expect(body.revision).toBeGreaterThanOrEqual(Math.max(...d.acks.map((a) => a.revision)));
    }
    // The restarted server serves and accepts saves on the same database.
    const u = await signedUp(again.url, 'After Alba');
    const { id } = await createDesign(u.c, 'After the crash');
    expect((await u.c.put(`/api/v1/designs/${id}`, { design: designWith(900), revision: 1 })).status).toBe(200);
  });
});
