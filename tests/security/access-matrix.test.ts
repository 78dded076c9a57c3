import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative, resolve, sep } from 'node:path';
import sharp from 'sharp';
import { startServer, type TestServer } from '../helpers/server';
import { Client, linkIn, waitForMail } from '../helpers/client';
import { demoAccounts } from '../../scripts/seed-demo';
import { createDesign, signUp } from '../helpers/accounts';
import { addMember, tokenFromLink, verifiedUser } from '../api/designs-fixtures';

/**
 * The access-control matrix: every route the app has (each endpoint file's exported methods, each page) called
 * by a site admin, the design's owner, an editor, a viewer, a signed-in stranger and an anonymous caller. The
 * table below is checked against the route files first, so a route added without a row fails this test.
 */

type Who = 'admin' | 'owner' | 'editor' | 'viewer' | 'stranger' | 'anonymous';
const everyone: Who[] = ['admin', 'owner', 'editor', 'viewer', 'stranger', 'anonymous'];
type Expect = Record<Who, number>;
type Params = Record<string, string>;

/** Read by anyone with a role on the design (admins read every design); hidden from a stranger. */
const read: Expect = { admin: 200, owner: 200, editor: 200, viewer: 200, stranger: 404, anonymous: 401 };
/** Changed by the owner and editors; a viewer or an admin may read but not write. */
const write = (ok: number): Expect => ({ admin: 403, owner: ok, editor: ok, viewer: 403, stranger: 404, anonymous: 401 });
/** The owner's alone. */
const owner = (ok: number): Expect => ({ admin: 403, owner: ok, editor: 403, viewer: 403, stranger: 404, anonymous: 401 });
/** Any signed-in account; anonymous callers must sign in. */
const signedIn = (ok: number): Expect => ({ admin: ok, owner: ok, editor: ok, viewer: ok, stranger: ok, anonymous: 401 });
const open = (ok: number): Expect => ({ admin: ok, owner: ok, editor: ok, viewer: ok, stranger: ok, anonymous: ok });
/** Pages under /designs/:id: a sign-in redirect for anonymous callers. */
const page: Expect = { ...read, anonymous: 302 };

type Row = {
  method: string;
  /** route file path under src/pages, as the router names it */
  file: string;
  path: string;
  expect: Expect;
  body?: (p: Params, who: Who) => unknown;
  /** fresh resources for each caller (for calls that use one up) */
  prepare?: (who: Who) => Promise<Params>;
  note?: string;
};

let s: TestServer;
let c: Record<Who, Client>;
const base: Params = {};
let design: unknown;
let exported: unknown;
let png: Uint8Array<ArrayBuffer>;

const photo = () => {
  const f = new FormData();
  f.set('file', new File([png], 'first light.png', { type: 'image/png' }));
  return f;
};
const ownerPost = async (path: string, body?: unknown) => {
  const r = await c.owner.post(path, body);
  expect(r.status, `${path}: ${await r.clone().text()}`).toBeLessThan(300);
  return r.json();
};
const freshDesign = async () => ({ id: (await createDesign(c.owner, 'Matrix spare coil')).id });
const withMembers = async () => {
  const id = (await createDesign(c.owner, 'Matrix shared coil')).id;
  await addMember(s.url, c.owner, id, editorAccount, 'editor');
  await addMember(s.url, c.owner, id, viewerAccount, 'viewer');
  return id;
};
let editorAccount: { c: Client; email: string; id: string };
let viewerAccount: { c: Client; email: string; id: string };

const now = () => new Date().toISOString();
type Session = { id: string; plan: { turns: number; windingLength: number } };
/** A design shared with the editor and viewer, with a winding session under way (or paused, or finished). */
const windingOn = async (state: 'running' | 'paused' | 'finished' = 'running') => {
  const id = await withMembers();
  const sess = (await ownerPost(`/api/v1/designs/${id}/winding`, { rpm: 40 })) as Session;
  if (state === 'paused') await ownerPost(`/api/v1/designs/${id}/winding/${sess.id}/pause`, { reason: 'splice', at: now() });
  if (state === 'finished') await ownerPost(`/api/v1/designs/${id}/winding/${sess.id}/finish`, { at: now(), woundTurns: sess.plan.turns, windingLength: sess.plan.windingLength });
  return { id, sessionId: sess.id };
};

const rows: Row[] = [
  // designs
  { method: 'GET', file: 'api/v1/designs/index.ts', path: '/api/v1/designs', expect: signedIn(200) },
  { method: 'POST', file: 'api/v1/designs/index.ts', path: '/api/v1/designs', expect: signedIn(201), body: () => ({ name: 'Matrix new coil', design }) },
  { method: 'POST', file: 'api/v1/designs/import.ts', path: '/api/v1/designs/import', expect: signedIn(201), body: () => exported },
  { method: 'GET', file: 'api/v1/designs/[id]/index.ts', path: '/api/v1/designs/:id', expect: read },
  { method: 'PUT', file: 'api/v1/designs/[id]/index.ts', path: '/api/v1/designs/:id', expect: write(200), prepare: async () => ({ id: await withMembers() }), body: () => ({ design, revision: 1 }) },
  { method: 'DELETE', file: 'api/v1/designs/[id]/index.ts', path: '/api/v1/designs/:id', expect: owner(204), prepare: async () => ({ id: await withMembers() }) },
  { method: 'GET', file: 'api/v1/designs/[id]/revisions/index.ts', path: '/api/v1/designs/:id/revisions', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/revisions/[revision].ts', path: '/api/v1/designs/:id/revisions/1', expect: read },
  { method: 'POST', file: 'api/v1/designs/[id]/revisions/[revision]/restore.ts', path: '/api/v1/designs/:id/revisions/1/restore', expect: write(201) },
  { method: 'GET', file: 'api/v1/designs/[id]/compare.ts', path: '/api/v1/designs/:id/compare?from=1&to=1', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/summary.ts', path: '/api/v1/designs/:id/summary', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/export.ts', path: '/api/v1/designs/:id/export', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/build-sheet.pdf.ts', path: '/api/v1/designs/:id/build-sheet.pdf', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/troubleshoot.ts', path: '/api/v1/designs/:id/troubleshoot', expect: read },
  { method: 'POST', file: 'api/v1/designs/[id]/duplicate.ts', path: '/api/v1/designs/:id/duplicate', expect: { ...read, admin: 201, owner: 201, editor: 201, viewer: 201 } },
  { method: 'POST', file: 'api/v1/designs/[id]/transfer.ts', path: '/api/v1/designs/:id/transfer', expect: owner(200), prepare: async () => ({ id: await withMembers() }), body: () => ({ userId: editorAccount.id }) },
  // people and links
  { method: 'GET', file: 'api/v1/designs/[id]/members/index.ts', path: '/api/v1/designs/:id/members', expect: read },
  { method: 'PATCH', file: 'api/v1/designs/[id]/members/[userId].ts', path: '/api/v1/designs/:id/members/:viewerId', expect: owner(200), body: () => ({ role: 'viewer' }) },
  {
    method: 'DELETE',
    file: 'api/v1/designs/[id]/members/[userId].ts',
    path: '/api/v1/designs/:id/members/:viewerId',
    // the owner removes a member; a member may leave (remove themself), nobody else may
    expect: { ...owner(204), viewer: 204 },
    prepare: async () => ({ id: await withMembers() }),
  },
  { method: 'GET', file: 'api/v1/designs/[id]/invitations/index.ts', path: '/api/v1/designs/:id/invitations', expect: owner(200) },
  { method: 'POST', file: 'api/v1/designs/[id]/invitations/index.ts', path: '/api/v1/designs/:id/invitations', expect: owner(201), body: (_p, who) => ({ email: `matrix-invitee-${who}@example.test`, role: 'viewer' }) },
  {
    method: 'DELETE',
    file: 'api/v1/designs/[id]/invitations/[invitationId].ts',
    path: '/api/v1/designs/:id/invitations/:invitationId',
    expect: owner(204),
    prepare: async (who) => ({ invitationId: (await ownerPost(`/api/v1/designs/${base.id}/invitations`, { email: `matrix-revoked-${who}@example.test`, role: 'viewer' })).id }),
  },
  { method: 'GET', file: 'api/v1/designs/[id]/share/index.ts', path: '/api/v1/designs/:id/share', expect: owner(200) },
  { method: 'POST', file: 'api/v1/designs/[id]/share/index.ts', path: '/api/v1/designs/:id/share', expect: owner(201) },
  {
    method: 'DELETE',
    file: 'api/v1/designs/[id]/share/[token].ts',
    path: '/api/v1/designs/:id/share/:shareToken',
    expect: owner(204),
    prepare: async () => ({ shareToken: (await ownerPost(`/api/v1/designs/${base.id}/share`)).token }),
  },
  { method: 'GET', file: 'api/v1/invitations/[token].ts', path: '/api/v1/invitations/:openToken', expect: open(200), note: 'the invitation link itself is the key' },
  {
    method: 'POST',
    file: 'api/v1/invitations/[token]/accept.ts',
    path: '/api/v1/invitations/:inviteToken/accept',
    // only the invited address may accept (the owner already owns it); anyone else signed in is refused
    expect: { admin: 403, owner: 409, editor: 403, viewer: 403, stranger: 200, anonymous: 401 },
    prepare: async () => {
      // on a design of its own, so that the stranger stays a stranger to the others
      const r = await c.owner.post(`/api/v1/designs/${(await freshDesign()).id}/invitations`, { email: base.strangerEmail, role: 'viewer' });
      expect(r.status).toBe(201);
      const mail = await waitForMail(s.url, base.strangerEmail, 'Invitation');
      return { inviteToken: tokenFromLink(linkIn(mail.text), '/invitations/') };
    },
  },
  // shared links (the token is the key)
  { method: 'GET', file: 'api/v1/shared/[token].ts', path: '/api/v1/shared/:shareToken', expect: open(200) },
  { method: 'GET', file: 'api/v1/shared/[token]/summary.ts', path: '/api/v1/shared/:shareToken/summary', expect: open(200) },
  { method: 'POST', file: 'api/v1/shared/[token]/copy.ts', path: '/api/v1/shared/:shareToken/copy', expect: signedIn(201) },
  // the bench
  { method: 'GET', file: 'api/v1/designs/[id]/measurements/index.ts', path: '/api/v1/designs/:id/measurements', expect: read },
  {
    method: 'POST',
    file: 'api/v1/designs/[id]/measurements/index.ts',
    path: '/api/v1/designs/:id/measurements',
    expect: write(201),
    body: () => ({ kind: 'coupling', value: 0.12, measuredAt: '2026-11-30' }),
  },
  {
    method: 'DELETE',
    file: 'api/v1/designs/[id]/measurements/[measurementId].ts',
    path: '/api/v1/designs/:id/measurements/:measurementId',
    expect: write(204),
    prepare: async () => ({ measurementId: (await ownerPost(`/api/v1/designs/${base.id}/measurements`, { kind: 'coupling', value: 0.11, measuredAt: '2026-11-30' })).id }),
  },
  { method: 'GET', file: 'api/v1/designs/[id]/calibration.ts', path: '/api/v1/designs/:id/calibration', expect: read },
  { method: 'PUT', file: 'api/v1/designs/[id]/calibration.ts', path: '/api/v1/designs/:id/calibration', expect: write(200), body: () => ({ loadedFrequency: null }) },
  { method: 'GET', file: 'api/v1/designs/[id]/attachments/index.ts', path: '/api/v1/designs/:id/attachments', expect: read },
  { method: 'POST', file: 'api/v1/designs/[id]/attachments/index.ts', path: '/api/v1/designs/:id/attachments', expect: write(201), body: () => photo() },
  { method: 'GET', file: 'api/v1/attachments/[id]/index.ts', path: '/api/v1/attachments/:attachmentId', expect: read },
  { method: 'GET', file: 'api/v1/attachments/[id]/thumbnail.ts', path: '/api/v1/attachments/:attachmentId/thumbnail', expect: read },
  {
    method: 'DELETE',
    file: 'api/v1/attachments/[id]/index.ts',
    path: '/api/v1/attachments/:attachmentId',
    expect: write(204),
    prepare: async () => {
      const r = await c.owner.req('POST', `/api/v1/designs/${base.id}/attachments`, photo());
      expect(r.status).toBe(201);
      return { attachmentId: (await r.json()).id };
    },
  },
  // the winding session
  { method: 'GET', file: 'api/v1/designs/[id]/winding/index.ts', path: '/api/v1/designs/:id/winding', expect: read },
  { method: 'POST', file: 'api/v1/designs/[id]/winding/index.ts', path: '/api/v1/designs/:id/winding', expect: write(201), prepare: async () => ({ id: await withMembers() }), body: () => ({ rpm: 40 }) },
  { method: 'GET', file: 'api/v1/designs/[id]/winding/[sessionId]/index.ts', path: '/api/v1/designs/:id/winding/:sessionId', expect: read, note: 'a finished session' },
  { method: 'GET', file: 'api/v1/designs/[id]/winding/[sessionId]/export.csv.ts', path: '/api/v1/designs/:id/winding/:sessionId/export.csv', expect: read },
  { method: 'PUT', file: 'api/v1/designs/[id]/winding/[sessionId]/checklist.ts', path: '/api/v1/designs/:id/winding/:sessionId/checklist', expect: write(200), body: () => ({ coats: 3 }) },
  {
    method: 'POST',
    file: 'api/v1/designs/[id]/winding/[sessionId]/readings.ts',
    path: '/api/v1/designs/:id/winding/:sessionId/readings',
    expect: write(201),
    prepare: () => windingOn('running'),
    body: () => ({ id: randomUUID(), at: now(), counter: 12 }),
  },
  { method: 'POST', file: 'api/v1/designs/[id]/winding/[sessionId]/pause.ts', path: '/api/v1/designs/:id/winding/:sessionId/pause', expect: write(200), prepare: () => windingOn('running'), body: () => ({ reason: 'break', at: now() }) },
  { method: 'POST', file: 'api/v1/designs/[id]/winding/[sessionId]/resume.ts', path: '/api/v1/designs/:id/winding/:sessionId/resume', expect: write(200), prepare: () => windingOn('paused'), body: () => ({ at: now() }) },
  {
    method: 'POST',
    file: 'api/v1/designs/[id]/winding/[sessionId]/finish.ts',
    path: '/api/v1/designs/:id/winding/:sessionId/finish',
    expect: write(200),
    prepare: () => windingOn('running'),
    body: () => ({ at: now(), woundTurns: 1000, windingLength: 0.5 }),
  },
  { method: 'POST', file: 'api/v1/designs/[id]/winding/[sessionId]/adopt.ts', path: '/api/v1/designs/:id/winding/:sessionId/adopt', expect: write(200), prepare: () => windingOn('finished') },
  { method: 'GET', file: 'api/v1/shared/[token]/winding.ts', path: '/api/v1/shared/:shareToken/winding', expect: open(200) },
  { method: 'GET', file: 'designs/[id]/winding.astro', path: '/designs/:id/winding', expect: page },
  // groups and first-light reviews: pages and design-side reads here; the group routes themselves in their own matrix
  { method: 'GET', file: 'groups/index.astro', path: '/groups', expect: { ...signedIn(200), anonymous: 302 } },
  { method: 'GET', file: 'designs/[id]/review.astro', path: '/designs/:id/review', expect: page },
  { method: 'GET', file: 'api/v1/designs/[id]/reviews/index.ts', path: '/api/v1/designs/:id/reviews', expect: read },
  { method: 'GET', file: 'api/v1/designs/[id]/group.ts', path: '/api/v1/designs/:id/group', expect: read },
  // account and public
  { method: 'GET', file: 'api/v1/me.ts', path: '/api/v1/me', expect: signedIn(200) },
  { method: 'PATCH', file: 'api/v1/me.ts', path: '/api/v1/me', expect: signedIn(200), body: () => ({ unitSystem: 'metric' }) },
  { method: 'POST', file: 'api/v1/solve.ts', path: '/api/v1/solve', expect: open(200), body: () => design },
  { method: 'GET', file: 'api/v1/openapi.json.ts', path: '/api/v1/openapi.json', expect: open(200) },
  { method: 'GET', file: 'dev/mail.json.ts', path: '/dev/mail.json', expect: open(200), note: 'only without SMTP_URL (the local fake); 404 otherwise, tested elsewhere' },
  // pages
  { method: 'GET', file: 'designs/[id]/index.astro', path: '/designs/:id', expect: page },
  { method: 'GET', file: 'designs/[id]/bench.astro', path: '/designs/:id/bench', expect: page },
  { method: 'GET', file: 'designs/[id]/build.astro', path: '/designs/:id/build', expect: page },
  { method: 'GET', file: 'designs/[id]/compare.astro', path: '/designs/:id/compare?from=1&to=1', expect: page },
  { method: 'GET', file: 'designs/[id]/event.astro', path: '/designs/:id/event', expect: page },
  { method: 'GET', file: 'designs/[id]/history.astro', path: '/designs/:id/history', expect: page },
  { method: 'GET', file: 'designs/[id]/people.astro', path: '/designs/:id/people', expect: page },
  { method: 'GET', file: 'designs/[id]/revisions/[revision].astro', path: '/designs/:id/revisions/1', expect: page },
  { method: 'GET', file: 'designs/index.astro', path: '/designs', expect: { ...signedIn(200), anonymous: 302 } },
  { method: 'GET', file: 'designs/new.astro', path: '/designs/new', expect: open(200), note: 'the designer works signed out; saving needs an account' },
  { method: 'GET', file: 'account.astro', path: '/account', expect: { ...signedIn(200), anonymous: 302 } },
  { method: 'GET', file: 'admin/index.astro', path: '/admin', expect: { admin: 200, owner: 404, editor: 404, viewer: 404, stranger: 404, anonymous: 302 } },
  { method: 'GET', file: 'admin/users.astro', path: '/admin/users', expect: { admin: 200, owner: 404, editor: 404, viewer: 404, stranger: 404, anonymous: 302 } },
  { method: 'GET', file: 's/[token].astro', path: '/s/:shareToken', expect: open(200) },
  { method: 'GET', file: 'invitations/[token].astro', path: '/invitations/:openToken', expect: open(200) },
  { method: 'GET', file: 'dev/mail.astro', path: '/dev/mail', expect: open(200) },
  // a signed-in visitor is sent on from the sign-in and sign-up pages
  ...['sign-in.astro', 'sign-up.astro'].map((file): Row => ({ method: 'GET', file, path: `/${file.replace('.astro', '')}`, expect: { ...signedIn(302), anonymous: 200 } })),
  ...['index.astro', 'methods.astro', 'safety.astro', 'validation.astro', 'forgot-password.astro', 'reset-password.astro'].map(
    (file): Row => ({ method: 'GET', file, path: file === 'index.astro' ? '/' : `/${file.replace('.astro', '')}`, expect: open(200) }),
  ),
  { method: 'GET', file: '404.astro', path: '/no-such-page', expect: open(404) },
  { method: 'POST', file: 'sign-out.ts', path: '/sign-out', expect: open(303), note: 'signs the caller out: run last' },
];

/** Routes better-auth answers itself; its own tests and the account suites cover them. */
const EXEMPT = new Set(['ALL api/auth/[...all].ts']);

/**
 * Routes whose callers are a group's people (site admin, group admin, supervisor, member, outsider, anonymous)
 * rather than a design's: each is called by all six in the named test file's own table.
 */
const GROUP_MATRIX: Record<string, string[]> = {
  'tests/api/groups.test.ts': [
    'GET api/v1/groups/index.ts',
    'POST api/v1/groups/index.ts',
    'GET api/v1/groups/[groupId]/index.ts',
    'PATCH api/v1/groups/[groupId]/index.ts',
    'DELETE api/v1/groups/[groupId]/index.ts',
    'GET api/v1/groups/[groupId]/invitations/index.ts',
    'POST api/v1/groups/[groupId]/invitations/index.ts',
    'DELETE api/v1/groups/[groupId]/invitations/[invitationId].ts',
    'PATCH api/v1/groups/[groupId]/members/[userId].ts',
    'DELETE api/v1/groups/[groupId]/members/[userId].ts',
    'POST api/v1/groups/[groupId]/transfer.ts',
    'GET api/v1/group-invitations/[token].ts',
    'POST api/v1/group-invitations/[token]/accept.ts',
    'PUT api/v1/designs/[id]/group.ts',
    'GET group-invitations/[token].astro',
  ],
  'tests/api/reviews.test.ts': [
    'POST api/v1/designs/[id]/reviews/index.ts',
    'GET api/v1/designs/[id]/reviews/[reviewId]/index.ts',
    'POST api/v1/designs/[id]/reviews/[reviewId]/decision.ts',
  ],
};

function routeFiles(): string[] {
  const pages = resolve(import.meta.dirname, '../../src/pages');
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const e of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, e.name);
      if (e.isDirectory()) walk(p);
      else if (/\.(ts|astro)$/.test(e.name)) {
        const file = relative(pages, p).split(sep).join('/');
        if (file.endsWith('.astro')) out.push(`GET ${file}`);
        else for (const m of readFileSync(p, 'utf8').matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/g)) out.push(`${m[1]} ${file}`);
      }
    }
  };
  walk(pages);
  return out.sort();
}

describe('the access matrix covers every route', () => {
  it('has a row for each route file and method, and no row for a route that does not exist', () => {
    const have = new Set([...rows.map((r) => `${r.method} ${r.file}`), ...Object.values(GROUP_MATRIX).flat()]);
    for (const [file, routes] of Object.entries(GROUP_MATRIX)) {
      const text = readFileSync(resolve(import.meta.dirname, '../..', file), 'utf8');
      // that file calls each route's path with every kind of caller
      expect(text).toMatch(/everyone/);
      for (const r of routes) {
        const stem = r.split(' ')[1].replace(/\.(ts|astro)$/, '').replace(/\/index$/, '').split('/').filter((p) => !p.startsWith('['));
        expect(text, `${file} calls ${r}`).toContain(stem[stem.length - 1]);
      }
    }
    const routes = routeFiles().filter((r) => !EXEMPT.has(r));
    expect(routes.filter((r) => !have.has(r)), 'routes without a row in the access matrix').toEqual([]);
    expect([...have].filter((r) => !routes.includes(r)), 'rows for routes the app does not have').toEqual([]);
  });
});

describe('the access matrix against a running server', () => {
  beforeAll(async () => {
    s = await startServer({ COILWRIGHT_INVITE_RATE_LIMIT: '1000' });
    png = new Uint8Array(await sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 30, g: 90, b: 160 } } }).png().toBuffer());
    const o = await verifiedUser(s.url, 'Matrix Owner');
    editorAccount = await signUp(s.url, 'Matrix Editor');
    viewerAccount = await signUp(s.url, 'Matrix Viewer');
    const stranger = await signUp(s.url, 'Matrix Stranger');
    const admin = new Client(s.url);
    await admin.signIn(demoAccounts.admin.email, demoAccounts.admin.password);
    c = { admin, owner: o.c, editor: editorAccount.c, viewer: viewerAccount.c, stranger: stranger.c, anonymous: new Client(s.url) };
    base.strangerEmail = stranger.email;
    base.id = await withMembers();
    base.viewerId = viewerAccount.id;
    const got = (await (await c.owner.get(`/api/v1/designs/${base.id}`)).json()) as { design: unknown };
    design = got.design;
    exported = await (await c.owner.get(`/api/v1/designs/${base.id}/export`)).json();
    base.shareToken = (await ownerPost(`/api/v1/designs/${base.id}/share`)).token;
    const inv = await ownerPost(`/api/v1/designs/${base.id}/invitations`, { email: 'matrix-open@example.test', role: 'viewer' });
    const mail = await waitForMail(s.url, 'matrix-open@example.test', 'Invitation');
    expect(inv.id).toBeTruthy();
    base.openToken = tokenFromLink(linkIn(mail.text), '/invitations/');
    const up = await c.owner.req('POST', `/api/v1/designs/${base.id}/attachments`, photo());
    base.attachmentId = (await up.json()).id;
    const wound = (await ownerPost(`/api/v1/designs/${base.id}/winding`, { rpm: 60 })) as Session;
    await ownerPost(`/api/v1/designs/${base.id}/winding/${wound.id}/finish`, { at: now(), woundTurns: wound.plan.turns, windingLength: wound.plan.windingLength });
    base.sessionId = wound.id;
  }, 120_000);
  afterAll(async () => {
    await s?.stop();
  });

  for (const row of rows) {
    it(`${row.method} ${row.path}${row.note ? ` (${row.note})` : ''}`, async () => {
      const got: Partial<Record<Who, number>> = {};
      for (const who of everyone) {
        const p: Params = { ...base, ...(row.prepare ? await row.prepare(who) : {}) };
        const path = row.path.replace(/:([A-Za-z]+)/g, (_, k: string) => p[k] ?? `:${k}`);
        const body = row.body?.(p, who);
        const r = await c[who].req(row.method, path, body);
        got[who] = r.status;
        const text = await r.text();
        // a refused caller learns nothing: the contract's error shape on the API, never a stack trace
        if (r.status >= 400 && path.startsWith('/api/')) {
          expect(JSON.parse(text).error.code, `${who} ${path}`).toBeTruthy();
          expect(text).not.toMatch(/\n\s+at |node_modules|SQLITE|\/work\//);
        }
        if (r.status === 404 && who === 'stranger') expect(text).not.toContain('Matrix shared coil');
      }
      expect(got, `got ${JSON.stringify(got)}`).toEqual(row.expect);
    }, 120_000);
  }
});
