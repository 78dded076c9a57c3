import { expect } from 'vitest';
import { linkIn, waitForMail, type Client } from '../helpers/client';
import { signUp } from '../helpers/accounts';
import { exampleDesigns } from '../../src/lib/design/examples';

export const toroidCoil = exampleDesigns[1].design;
export const sphereCoil = exampleDesigns[0].design;

/** A new account whose address is confirmed through the real mailed link. */
export async function verifiedUser(base: string, name: string) {
  const u = await signUp(base, name);
  const mail = await waitForMail(base, u.email, 'Confirm');
  const r = await fetch(linkIn(mail.text), { redirect: 'manual' });
  expect([200, 302]).toContain(r.status);
  const me = await (await u.c.get('/api/v1/me')).json();
  expect(me.user.emailVerified).toBe(true);
  return u;
}

export function tokenFromLink(link: string, prefix: string): string {
  const at = link.indexOf(prefix);
  expect(at).toBeGreaterThan(-1);
  return link.slice(at + prefix.length).replace(/[^A-Za-z0-9_-].*$/, '');
}

/** Invites by e-mail and accepts with the invited person's own session, through the mailed link. */
export async function addMember(base: string, owner: Client, designId: string, member: { c: Client; email: string }, role: 'editor' | 'viewer') {
  const r = await owner.post(`/api/v1/designs/${designId}/invitations`, { email: member.email, role });
  expect(r.status).toBe(201);
  const mail = await waitForMail(base, member.email, 'Invitation');
  const token = tokenFromLink(linkIn(mail.text), '/invitations/');
  const a = await member.c.post(`/api/v1/invitations/${token}/accept`);
  expect(a.status).toBe(200);
  return token;
}
