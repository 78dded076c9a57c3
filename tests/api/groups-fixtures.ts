import { expect } from 'vitest';
import { Client, linkIn, waitForMail } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { demoAccounts } from '../../scripts/seed-demo';
import { tokenFromLink, verifiedUser } from './designs-fixtures';

/** The six kinds of caller every group and review route is tried with. */
export type Who = 'siteAdmin' | 'groupAdmin' | 'supervisor' | 'member' | 'outsider' | 'anonymous';
export const everyone: Who[] = ['siteAdmin', 'groupAdmin', 'supervisor', 'member', 'outsider', 'anonymous'];

export type Person = { c: Client; email: string; id: string };

/** Invites by e-mail and accepts through the mailed link with the invitee's own session. */
export async function joinGroup(base: string, admin: Client, groupId: string, who: { c: Client; email: string }, role: 'member' | 'supervisor') {
  const r = await admin.post(`/api/v1/groups/${groupId}/invitations`, { email: who.email, role });
  expect(r.status, await r.clone().text()).toBe(201);
  const mail = await waitForMail(base, who.email, 'Invitation to the group');
  const token = tokenFromLink(linkIn(mail.text), '/group-invitations/');
  const a = await who.c.post(`/api/v1/group-invitations/${token}/accept`);
  expect(a.status, await a.clone().text()).toBe(200);
  return token;
}

/** A group with an admin, a supervisor and a member, a design of the admin's in it, a site admin and an outsider. */
export async function groupScene(base: string, groupName: string, designName: string) {
  const groupAdmin = await verifiedUser(base, 'Admin Ada');
  const supervisor = await signUp(base, 'Supervisor Sol');
  const member = await signUp(base, 'Member Mo');
  const outsider = await signUp(base, 'Outsider Ott');
  const siteAdmin = new Client(base);
  await siteAdmin.signIn(demoAccounts.admin.email, demoAccounts.admin.password);
  const g = await groupAdmin.c.post('/api/v1/groups', { name: groupName });
  expect(g.status).toBe(201);
  const groupId = (await g.json()).id as string;
  await joinGroup(base, groupAdmin.c, groupId, supervisor, 'supervisor');
  await joinGroup(base, groupAdmin.c, groupId, member, 'member');
  const designId = await groupDesign(groupAdmin.c, groupId, designName);
  const c: Record<Who, Client> = { siteAdmin, groupAdmin: groupAdmin.c, supervisor: supervisor.c, member: member.c, outsider: outsider.c, anonymous: new Client(base) };
  return { groupId, designId, c, people: { groupAdmin, supervisor, member, outsider } };
}

/** A new design of `owner`'s, put in the group. */
export async function groupDesign(owner: Client, groupId: string, name: string): Promise<string> {
  const { id } = await createDesign(owner, name);
  const r = await owner.put(`/api/v1/designs/${id}/group`, { groupId });
  expect(r.status, await r.clone().text()).toBe(200);
  return id;
}

/** Calls a route as each kind of caller; refused callers must not see `secret`, and 401/404 carry the contract's code. */
export async function matrix(call: (who: Who) => Promise<Response>, secret?: string, order: Who[] = everyone) {
  const got: Partial<Record<Who, number>> = {};
  for (const who of order) {
    const r = await call(who);
    got[who] = r.status;
    const text = await r.text();
    if (r.status >= 400) {
      const body = JSON.parse(text);
      expect(body.error.code, `${who}: ${text}`).toBe({ 400: 'validation_failed', 401: 'unauthorized', 403: body.error.code === 'email_not_verified' ? 'email_not_verified' : 'forbidden', 404: 'not_found', 409: 'conflict' }[r.status as 400]);
      if (secret && (r.status === 404 || r.status === 401)) expect(text, `${who} got ${r.status} with the secret in it`).not.toContain(secret);
    }
  }
  return got;
}

export async function caughtMail(base: string): Promise<Array<{ to: string; subject: string; text: string }>> {
  return (await fetch(`${base}/dev/mail.json`)).json();
}
