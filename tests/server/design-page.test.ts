import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AstroGlobal } from 'astro';
import { openDb, prepareDb, type Db } from '../../src/server/db/client';
import { user } from '../../src/server/db/schema';
import type { SessionUser } from '../../src/server/session';
import { loadDesignPage, openDesignPage } from '../../src/server/design-page';
import { withDatabase } from '../../src/server/services/database';
import { createDesign } from '../../src/server/services/designs';
import { createMeasurement, getCalibration, listMeasurements } from '../../src/server/services/measurements';
import { listAttachments } from '../../src/server/services/attachments';
import { parseTroubleshootQuery, troubleshootDesign } from '../../src/server/services/troubleshoot';
import { getBuildSheet, parseBuildSheetQuery } from '../../src/server/services/build-sheet';
import { compareRevisions, getRevision, listRevisions } from '../../src/server/services/revisions';
import { solve, type DesignSI, type Result } from '../../src/solver';

const coil = {
  secondary: { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' } },
  topload: { shape: 'toroid', majorDiameter: '20 in', minorDiameter: '5 in', elevation: '3 in' },
  primary: { shape: 'flat', innerDiameter: '6 in', turns: 12, conductorDiameter: '0.25 in', spacing: '0.25 in' },
  tank: { capacitance: '20 nF' },
  supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA', lineFrequency: '60 Hz' },
};

const member = (id: string): SessionUser => ({ id, name: id, email: `${id}@harbour-lane.example`, emailVerified: true, role: 'member', unitSystem: 'metric' });
const owner = member('owner');
const stranger = member('stranger');

/** The real solver, counting how often it runs. */
function countingSolver() {
  const counter = { calls: 0, solver: (d: DesignSI): Result => (counter.calls++, solve(d)) };
  return counter;
}

let db: Db;

/** Counts reads of a design row by id (the first step of every access check), as statements reach the database. */
function countDesignLookups() {
  const client = db.$client;
  const original = client.execute;
  let calls = 0;
  client.execute = ((stmt: Parameters<typeof original>[0], ...rest: unknown[]) => {
    const text = typeof stmt === 'string' ? stmt : (stmt as { sql: string }).sql;
    if (/^select\b[\s\S]*\bfrom "designs"[\s\S]*\bwhere "designs"\."id" = \?/i.test(text)) calls++;
    return (original as (...a: unknown[]) => ReturnType<typeof original>).call(client, stmt, ...rest);
  }) as typeof original;
  return {
    stop: () => {
      client.execute = original;
      return calls;
    },
  };
}
let designId: string;
const troubleQuery = parseTroubleshootQuery(new URL('http://coilwright.test/?symptom=short-sparks&rfGround=yes'));
const sheetQuery = parseBuildSheetQuery(new URL('http://coilwright.test/?rpm=60'));

/** Runs a test body with the services on this file's own database. */
const inDb = (fn: () => Promise<void>) => () => withDatabase(db, fn);

beforeAll(async () => {
  db = openDb(':memory:');
  await prepareDb(db, ':memory:');
  await db.insert(user).values([owner, stranger].map((u) => ({ id: u.id, name: u.name, email: u.email })));
  await withDatabase(db, async () => {
    designId = (await createDesign(owner, { name: 'Workshop coil', design: coil })).id;
    await createMeasurement(owner, designId, { kind: 'loaded-frequency', value: 190000, measuredAt: '2026-03-14' });
  });
});

afterAll(() => {
  db?.$client.close();
});

describe('openDesignPage', () => {
  it('authorizes and solves the design once for everything the bench page reads, with the same answers as the services', inDb(async () => {
    const count = countingSolver();
    const lookups = countDesignLookups();
    const page = await openDesignPage(owner, designId, { solver: count.solver });
    expect(page).not.toBeNull();
    expect(page!.name).toBe('Workshop coil');
    expect(page!.role).toBe('owner');
    expect(page!.canWrite).toBe(true);

    const [measurements, attachments, trouble] = await Promise.all([page!.measurements(), page!.attachments(), page!.troubleshoot(troubleQuery)]);
    const calibration = page!.calibration();
    const sheet = page!.buildSheet(sheetQuery);
    expect(page!.result?.system?.resonantFrequency).toBeGreaterThan(0);
    expect(page!.si?.secondary.turns).toBe(1000);
    expect(count.calls).toBe(1);
    expect(lookups.stop()).toBe(1);

    // what each page part shows is what the authorizing service answers on its own
    expect(measurements).toEqual(await listMeasurements(owner, designId));
    expect(measurements.measurements[0].predicted).toBe(page!.result?.system?.resonantFrequency);
    expect(calibration).toEqual(await getCalibration(owner, designId));
    expect(attachments).toEqual(await listAttachments(owner, designId));
    expect(trouble).toEqual(await troubleshootDesign(owner, designId, troubleQuery));
    expect(sheet).toEqual(await getBuildSheet(owner, designId, sheetQuery));
    expect(count.calls).toBe(1);
  }));

  it('does not solve at all for a page that shows no result', inDb(async () => {
    const count = countingSolver();
    const page = await openDesignPage(owner, designId, { solver: count.solver });
    expect(page?.revision).toBe(1);
    expect(await page!.revisions()).toHaveLength(1);
    expect(count.calls).toBe(0);
  }));

  it('is null for a stranger and for a design that does not exist, without solving', inDb(async () => {
    const count = countingSolver();
    expect(await openDesignPage(stranger, designId, { solver: count.solver })).toBeNull();
    expect(await openDesignPage(owner, 'no-such-design', { solver: count.solver })).toBeNull();
    expect(count.calls).toBe(0);
  }));

  it('reads history, revisions and comparisons under its one access check, with the services\' answers', inDb(async () => {
    const lookups = countDesignLookups();
    const page = await openDesignPage(owner, designId);
    const [history, revision, comparison] = await Promise.all([page!.revisions(), page!.readRevision(1), page!.compare(1, 1)]);
    expect(lookups.stop()).toBe(1);
    expect(history).toEqual(await listRevisions(owner, designId));
    expect(revision).toEqual(await getRevision(owner, designId, 1));
    expect(comparison).toEqual(await compareRevisions(owner, designId, 1, 1));
  }));

  it('answers null for a revision or comparison that does not exist', inDb(async () => {
    const page = await openDesignPage(owner, designId);
    expect((await page!.readRevision(1))?.name).toBe('Workshop coil');
    expect(await page!.readRevision(2)).toBeNull();
    expect(await page!.readRevision(Number('x'))).toBeNull();
    expect(await page!.compare(1, 2)).toBeNull();
    expect((await page!.compare(1, 1))?.nameChanged).toBe(false);
  }));
});

/** Enough of Astro's page global for the loader: the request, its URL and params, the signed-in user. */
function astroFor(path: string, who: SessionUser | null, request = new Request(`http://coilwright.test${path}`)) {
  const rewrites: string[] = [];
  const astro = {
    request,
    url: new URL(request.url),
    params: { id: new URL(request.url).pathname.split('/')[2] },
    locals: { user: who, session: null },
    redirect: (to: string) => new Response(null, { status: 302, headers: { location: to } }),
    rewrite: async (to: string) => (rewrites.push(to), new Response('not found', { status: 404 })),
  };
  return { astro: astro as unknown as AstroGlobal, rewrites };
}

describe('loadDesignPage', () => {
  it('loads and solves once per request, however often the page and its layout ask', inDb(async () => {
    const count = countingSolver();
    const { astro } = astroFor(`/designs/${designId}/bench`, owner);
    const first = await loadDesignPage(astro, { solver: count.solver });
    const again = await loadDesignPage(astro, { solver: count.solver });
    expect(again).toBe(first);
    if (first instanceof Response) throw new Error('expected the design');
    void first.result;
    void (again as typeof first).result;
    await first.troubleshoot(troubleQuery);
    expect(count.calls).toBe(1);

    // the next request loads afresh
    const next = await loadDesignPage(astroFor(`/designs/${designId}/bench`, owner).astro, { solver: count.solver });
    expect(next).not.toBe(first);
    void (next as typeof first).result;
    expect(count.calls).toBe(2);
  }));

  it('sends a visitor who is not signed in to sign in, and comes back to the same page', inDb(async () => {
    const r = await loadDesignPage(astroFor(`/designs/${designId}/event?spark=1.2`, null).astro);
    expect(r).toBeInstanceOf(Response);
    expect((r as Response).status).toBe(302);
    expect((r as Response).headers.get('location')).toBe(`/sign-in?next=${encodeURIComponent(`/designs/${designId}/event?spark=1.2`)}`);
  }));

  it('answers the 404 page for a stranger and for a missing design', inDb(async () => {
    for (const [path, who] of [[`/designs/${designId}/history`, stranger], ['/designs/no-such-design/history', owner]] as const) {
      const { astro, rewrites } = astroFor(path, who);
      const r = await loadDesignPage(astro);
      expect((r as Response).status).toBe(404);
      expect(rewrites).toEqual(['/404']);
    }
  }));
});
