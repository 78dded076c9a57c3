import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type TestServer } from '../helpers/server';
import { Client, linkIn, waitForMail } from '../helpers/client';
import { createDesign, signUp, uniqueEmail } from '../helpers/accounts';
import { addMember, tokenFromLink, toroidCoil, verifiedUser } from './designs-fixtures';

let s: TestServer;
beforeAll(async () => {
  s = await startServer();
});
afterAll(async () => {
  await s?.stop();
});


describe('invitations', () => {
  it('POST /api/v1/designs/:id/invitations from an unconfirmed owner is 403 email_not_verified and sends nothing', async () => {
    const owner = await signUp(s.url, 'Unconfirmed Uma');
    const { id } = await createDesign(owner.c, 'Unconfirmed owner coil');
    const to = uniqueEmail('nobody');
    const r = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: to, role: 'editor' });
    expect(r.status).toBe(403);
    expect((await r.json()).error.code).toBe('email_not_verified');
    const mail = (await (await fetch(`${s.url}/dev/mail.json`)).json()) as Array<{ to: string }>;
    expect(mail.some((m) => m.to.includes(to))).toBe(false);
    expect((await (await owner.c.get(`/api/v1/designs/${id}/invitations`)).json()).invitations).toEqual([]);
  });

  it('the mailed accept link works for a person who signs up only after being invited', async () => {
    const owner = await verifiedUser(s.url, 'Inviter Ines');
    const { id } = await createDesign(owner.c, 'Harbour coil for review');
    const to = uniqueEmail('newcomer');
    const r = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: to, role: 'editor' });
    expect(r.status).toBe(201);
    const mail = await waitForMail(s.url, to, 'Invitation');
    expect(mail.subject).toContain('Harbour coil for review');
    expect(mail.html).toContain('<a href=');
    const link = linkIn(mail.text);
    expect(link).toMatch(new RegExp(`^${s.url}/invitations/[A-Za-z0-9_-]{32,}$`));
    const token = tokenFromLink(link, '/invitations/');

    // Not signed in: the page offers sign-in and sign-up that come back here.
    const page = await fetch(link, { redirect: 'manual' });
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Harbour coil for review');
    expect(html).toContain(`/sign-up?next=${encodeURIComponent(`/invitations/${token}`)}`);
    expect(html).toContain(`/sign-in?next=${encodeURIComponent(`/invitations/${token}`)}`);
    expect((await new Client(s.url).post(`/api/v1/invitations/${token}/accept`)).status).toBe(401);

    // A forwarded link does not work for another account, and stays usable for the invited address.
    const forwarded = await signUp(s.url, 'Forwarded Finn');
    const refused = await forwarded.c.post(`/api/v1/invitations/${token}/accept`);
    expect(refused.status).toBe(403);
    expect((await refused.json()).error.message).toContain('another e-mail address');
    const pageForOther = await (await forwarded.c.get(`/invitations/${token}`)).text();
    expect(pageForOther).toContain('only that address can accept it');
    expect(pageForOther).not.toContain('AcceptInvitation');
    expect((await forwarded.c.get(`/api/v1/designs/${id}`)).status).toBe(404);

    const newcomer = new Client(s.url);
    await newcomer.signUp('Newcomer Nils', to);
    expect((await newcomer.get(`/api/v1/designs/${id}`)).status).toBe(404);
    const a = await newcomer.post(`/api/v1/invitations/${token}/accept`);
    expect(a.status).toBe(200);
    expect(await a.json()).toMatchObject({ designId: id, role: 'editor' });
    const d = await (await newcomer.get(`/api/v1/designs/${id}`)).json();
    expect(d.role).toBe('editor');
    // An editor saves revisions.
    expect((await newcomer.put(`/api/v1/designs/${id}`, { design: toroidCoil, revision: d.revision, message: 'checked' })).status).toBe(200);
    // The link is single-use.
    const again = await new Client(s.url).get(`/api/v1/invitations/${token}`);
    expect(again.status).toBe(404);
    const stranger = await signUp(s.url, 'Forwarded Fay');
    expect((await stranger.c.post(`/api/v1/invitations/${token}/accept`)).status).toBe(404);
    expect((await stranger.c.get(`/api/v1/designs/${id}`)).status).toBe(404);
    // Accepted invitations leave the open list.
    expect((await (await owner.c.get(`/api/v1/designs/${id}/invitations`)).json()).invitations).toEqual([]);
  });

  it('only a hash of the invitation token is stored: the raw token is not in the database file', async () => {
    const owner = await verifiedUser(s.url, 'Hash Hal');
    const { id } = await createDesign(owner.c, 'Hash check coil');
    const to = uniqueEmail('hashcheck');
    await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: to, role: 'viewer' });
    const token = tokenFromLink(linkIn((await waitForMail(s.url, to, 'Invitation')).text), '/invitations/');
    const { createHash } = await import('node:crypto');
    const { readFileSync, readdirSync } = await import('node:fs');
    const { join } = await import('node:path');
    const db = readdirSync(s.dataDir)
      .filter((f) => f.startsWith('test.db'))
      .map((f) => readFileSync(join(s.dataDir, f)).toString('latin1'))
      .join('');
    expect(db).not.toContain(token);
    expect(db).toContain(createHash('sha256').update(token).digest('hex'));
  });

  it('a viewer reads but cannot save (403) and the design is unchanged', async () => {
    const owner = await verifiedUser(s.url, 'Owner Olga');
    const { id } = await createDesign(owner.c, 'Viewer check coil');
    const viewer = await signUp(s.url, 'Viewer Vala');
    await addMember(s.url, owner.c, id, viewer, 'viewer');
    expect((await (await viewer.c.get(`/api/v1/designs/${id}`)).json()).role).toBe('viewer');
    const r = await viewer.c.put(`/api/v1/designs/${id}`, { name: 'Viewer was here', design: toroidCoil, revision: 1 });
    expect(r.status).toBe(403);
    expect((await r.json()).error.code).toBe('forbidden');
    expect(await (await owner.c.get(`/api/v1/designs/${id}`)).json()).toMatchObject({ name: 'Viewer check coil', revision: 1 });
  });

  it('inviting someone who already has a role is 409; a bad role or address is 400 naming the field', async () => {
    const owner = await verifiedUser(s.url, 'Owner Oda');
    const { id } = await createDesign(owner.c, 'Duplicate invite coil');
    const member = await signUp(s.url, 'Member Max');
    await addMember(s.url, owner.c, id, member, 'viewer');
    const dup = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: member.email.toUpperCase(), role: 'editor' });
    expect(dup.status).toBe(409);
    expect((await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: owner.email, role: 'editor' })).status).toBe(409);
    const badRole = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: uniqueEmail('x'), role: 'owner' });
    expect(badRole.status).toBe(400);
    expect((await badRole.json()).error.issues[0].path).toBe('role');
    const badMail = await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: 'not an address', role: 'viewer' });
    expect(badMail.status).toBe(400);
    expect((await badMail.json()).error.issues[0].path).toBe('email');
  });

  it('DELETE /api/v1/designs/:id/invitations/:invitationId withdraws an invitation; its link stops working', async () => {
    const owner = await verifiedUser(s.url, 'Owner Wim');
    const { id } = await createDesign(owner.c, 'Withdrawn invite coil');
    const to = uniqueEmail('withdrawn');
    const inv = await (await owner.c.post(`/api/v1/designs/${id}/invitations`, { email: to, role: 'viewer' })).json();
    const token = tokenFromLink(linkIn((await waitForMail(s.url, to, 'Invitation')).text), '/invitations/');
    expect((await owner.c.del(`/api/v1/designs/${id}/invitations/${inv.id}`)).status).toBe(204);
    const late = new Client(s.url);
    await late.signUp('Late Lea', to);
    expect((await late.post(`/api/v1/invitations/${token}/accept`)).status).toBe(404);
    expect((await late.get(`/api/v1/designs/${id}`)).status).toBe(404);
    expect((await fetch(`${s.url}/invitations/${token}`)).status).toBe(404);
  });
});

describe('members and ownership', () => {
  it('PATCH /api/v1/designs/:id/members/:userId turns a viewer into an editor who can then save', async () => {
    const owner = await verifiedUser(s.url, 'Owner Pia');
    const { id } = await createDesign(owner.c, 'Promote coil');
    const m = await signUp(s.url, 'Member Mats');
    await addMember(s.url, owner.c, id, m, 'viewer');
    expect((await m.c.put(`/api/v1/designs/${id}`, { design: toroidCoil, revision: 1 })).status).toBe(403);
    const r = await owner.c.patch(`/api/v1/designs/${id}/members/${m.id}`, { role: 'editor' });
    expect(r.status).toBe(200);
    expect((await m.c.put(`/api/v1/designs/${id}`, { design: toroidCoil, revision: 1 })).status).toBe(200);
    const bad = await owner.c.patch(`/api/v1/designs/${id}/members/${m.id}`, { role: 'admin' });
    expect(bad.status).toBe(400);
    expect((await owner.c.patch(`/api/v1/designs/${id}/members/${owner.id}`, { role: 'viewer' })).status).toBe(400);
    expect((await owner.c.patch(`/api/v1/designs/${id}/members/no-such-user`, { role: 'viewer' })).status).toBe(404);
  });

  it('GET /api/v1/designs/:id/members shows addresses to the owner only', async () => {
    const owner = await verifiedUser(s.url, 'Owner Ravn');
    const { id } = await createDesign(owner.c, 'Members coil');
    const m = await signUp(s.url, 'Member Mira');
    const other = await signUp(s.url, 'Member Mo');
    await addMember(s.url, owner.c, id, m, 'editor');
    await addMember(s.url, owner.c, id, other, 'viewer');
    const asOwner = (await (await owner.c.get(`/api/v1/designs/${id}/members`)).json()).members;
    expect(asOwner).toEqual([
      expect.objectContaining({ userId: owner.id, role: 'owner', email: owner.email }),
      expect.objectContaining({ userId: m.id, role: 'editor', email: m.email, name: 'Member Mira' }),
      expect.objectContaining({ userId: other.id, role: 'viewer', email: other.email }),
    ]);
    const asMember = (await (await m.c.get(`/api/v1/designs/${id}/members`)).json()).members;
    expect(asMember.find((p: { userId: string }) => p.userId === other.id).email).toBeNull();
  });

  it('DELETE /api/v1/designs/:id/members/:userId removes a member, who then gets 404; a member may leave', async () => {
    const owner = await verifiedUser(s.url, 'Owner Sig');
    const { id } = await createDesign(owner.c, 'Removal coil 8802');
    const m = await signUp(s.url, 'Member Rolf');
    const leaver = await signUp(s.url, 'Member Lene');
    await addMember(s.url, owner.c, id, m, 'editor');
    await addMember(s.url, owner.c, id, leaver, 'viewer');
    expect((await owner.c.del(`/api/v1/designs/${id}/members/${m.id}`)).status).toBe(204);
    const r = await m.c.get(`/api/v1/designs/${id}`);
    expect(r.status).toBe(404);
    expect(await r.text()).not.toContain('Removal coil 8802');
    expect((await (await m.c.get('/api/v1/designs')).json()).designs).toEqual([]);
    expect((await leaver.c.del(`/api/v1/designs/${id}/members/${leaver.id}`)).status).toBe(204);
    expect((await leaver.c.get(`/api/v1/designs/${id}`)).status).toBe(404);
    expect((await owner.c.del(`/api/v1/designs/${id}/members/${owner.id}`)).status).toBe(400);
  });

  it('POST /api/v1/designs/:id/transfer hands the design to a member; the old owner becomes an editor', async () => {
    const owner = await verifiedUser(s.url, 'Owner Tove');
    const { id } = await createDesign(owner.c, 'Transfer coil');
    const heir = await signUp(s.url, 'Heir Hugo');
    const outsider = await signUp(s.url, 'Outsider Ola');
    const notMember = await owner.c.post(`/api/v1/designs/${id}/transfer`, { userId: outsider.id });
    expect(notMember.status).toBe(400);
    expect((await notMember.json()).error.issues[0].path).toBe('userId');
    await addMember(s.url, owner.c, id, heir, 'viewer');
    const r = await owner.c.post(`/api/v1/designs/${id}/transfer`, { userId: heir.id });
    expect(r.status).toBe(200);
    expect((await (await heir.c.get(`/api/v1/designs/${id}`)).json()).role).toBe('owner');
    expect((await (await owner.c.get(`/api/v1/designs/${id}`)).json()).role).toBe('editor');
    // The old owner lost the owner's rights.
    expect((await owner.c.del(`/api/v1/designs/${id}`)).status).toBe(403);
    expect((await owner.c.post(`/api/v1/designs/${id}/share`)).status).toBe(403);
    const people = (await (await heir.c.get(`/api/v1/designs/${id}/members`)).json()).members;
    expect(people.map((p: { userId: string; role: string }) => [p.userId, p.role])).toEqual([
      [heir.id, 'owner'],
      [owner.id, 'editor'],
    ]);
  });
});
