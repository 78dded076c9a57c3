import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { exampleDesigns } from '../../src/lib/design/examples';

type Mail = { to: string; subject: string; text: string };

function uniqueEmail(who: string) {
  return `${who}-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

async function signUp(request: APIRequestContext, name: string) {
  const email = uniqueEmail(name.toLowerCase().replace(/\W+/g, '-'));
  const r = await request.post('/api/auth/sign-up/email', { data: { name, email, password: 'correct-horse-9' } });
  expect(r.status()).toBe(200);
  return email;
}

/** Waits for a mail to `to` whose subject contains `subject`, in the local fake's list. */
async function mailTo(request: APIRequestContext, to: string, subject: string): Promise<Mail> {
  let found: Mail | undefined;
  await expect
    .poll(async () => {
      const list = (await (await request.get('/dev/mail.json')).json()) as Mail[];
      found = list.find((m) => m.to.includes(to) && m.subject.includes(subject));
      return Boolean(found);
    })
    .toBe(true);
  return found!;
}

const linkIn = (text: string, path: string) => {
  const m = text.match(new RegExp(`https?://\\S+${path}\\S*`));
  expect(m, text).not.toBeNull();
  return new URL(m![0]);
};

const upToDate = (page: Page) => expect(page.getByTestId('solve-state')).toHaveText('up to date');

/** Changes the secondary turns on the design page and saves a new revision. */
async function saveTurns(page: Page, turns: string, revision: number) {
  await upToDate(page);
  await page.getByLabel('Secondary turns').fill(turns);
  await expect(page.getByTestId('save-state')).toContainText('Unsaved changes');
  await upToDate(page);
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByTestId('save-state')).toContainText(`revision ${revision}`);
}

test('first light: a member asks, the supervisor asks for a change, the member fixes it and asks again, the supervisor signs off; a later edit dates the sign-off', async ({ browser }) => {
  // The group's admin confirms their address, makes the group and invites a supervisor and a member by e-mail.
  const adminCtx = await browser.newContext();
  const adminEmail = await signUp(adminCtx.request, 'Admin Aurelie');
  const confirm = await mailTo(adminCtx.request, adminEmail, 'Confirm');
  await adminCtx.request.get(linkIn(confirm.text, '/api/auth/verify-email').href);
  const admin = await adminCtx.newPage();
  await admin.goto('/groups');
  await admin.getByLabel('Group name').fill('Dockside coil club');
  await admin.getByRole('button', { name: 'Create group' }).click();
  await expect(admin.getByTestId('group-name')).toHaveText('Dockside coil club');

  const supCtx = await browser.newContext();
  const memberCtx = await browser.newContext();
  const supEmail = await signUp(supCtx.request, 'Supervisor Siri');
  const memberEmail = await signUp(memberCtx.request, 'Member Matteo');
  for (const [email, role, ctx] of [[supEmail, 'supervisor', supCtx], [memberEmail, 'member', memberCtx]] as const) {
    await admin.getByLabel('E-mail address').fill(email);
    await admin.getByLabel('Role', { exact: true }).selectOption(role);
    await admin.getByRole('button', { name: 'Send invitation' }).click();
    await expect(admin.getByText(`Invitation sent to ${email}.`)).toBeVisible();
    const invite = await mailTo(ctx.request, email, 'Invitation to the group');
    const p = await ctx.newPage();
    await p.goto(linkIn(invite.text, '/group-invitations/').pathname);
    await p.getByRole('button', { name: 'Join “Dockside coil club”' }).click();
    await p.waitForURL(/\/groups$/);
    await expect(p.getByTestId('group-name')).toHaveText('Dockside coil club');
    await p.close();
  }

  // The member's design goes into the group from its People page.
  const member = await memberCtx.newPage();
  const made = await memberCtx.request.post('/api/v1/designs', { data: { name: 'Dockside spark coil', design: exampleDesigns[1].design } });
  expect(made.status()).toBe(201);
  const { id } = (await made.json()) as { id: string };
  await member.goto(`/designs/${id}/people`);
  await member.getByRole('combobox', { name: 'Group', exact: true }).selectOption({ label: 'Dockside coil club' });
  await expect(member.getByText('The design now belongs to Dockside coil club.')).toBeVisible();
  await expect(member.getByTestId('group-people')).toContainText('Supervisor Siri');

  // The member asks for a review of revision 1.
  await member.goto(`/designs/${id}/review`);
  await expect(member.getByTestId('review-state')).toContainText('Not reviewed for first light');
  await expect(member.getByLabel('Revision to review')).toHaveValue('1');
  await member.getByRole('button', { name: 'Ask for review' }).click();
  await expect(member.getByText('Review of revision 1 requested')).toBeVisible();

  // The supervisor gets the mail and opens the checklist from it.
  const asked = await mailTo(supCtx.request, supEmail, 'First-light review requested: “Dockside spark coil” revision 1');
  const sup = await supCtx.newPage();
  await sup.goto(linkIn(asked.text, '/review').pathname + linkIn(asked.text, '/review').search);
  const checklist = sup.getByTestId('checklist');
  await expect(checklist).toContainText('First-light checklist: revision 1');
  await expect(checklist.locator('[data-item]')).toHaveCount(9);
  const bleeders = checklist.locator('[data-item="bleeders"]');
  await bleeders.getByLabel('Needs a change').check();
  await bleeders.getByLabel('Finding for “Bleeders on the tank capacitors”').fill('Two capacitors have no bleeder resistor');
  await sup.getByRole('button', { name: 'Request changes' }).click();
  await expect(sup.getByText('Changes requested on revision 1')).toBeVisible();

  // The member reads the decision, fixes the design (revision 2) and asks again.
  const changes = await mailTo(memberCtx.request, memberEmail, 'Changes requested: “Dockside spark coil” revision 1');
  expect(changes.text).toContain('Two capacitors have no bleeder resistor');
  await member.goto(`/designs/${id}`);
  await expect(member.getByTestId('review-state')).toContainText('Changes requested on revision 1');
  await saveTurns(member, '1010', 2);
  await member.goto(`/designs/${id}/review`);
  await expect(member.getByLabel('Revision to review')).toHaveValue('2');
  await member.getByRole('button', { name: 'Ask for review' }).click();
  await expect(member.getByText('Review of revision 2 requested')).toBeVisible();

  // The supervisor checks every item and signs revision 2 off.
  const again = await mailTo(supCtx.request, supEmail, 'First-light review requested: “Dockside spark coil” revision 2');
  const url = linkIn(again.text, '/review');
  await sup.goto(url.pathname + url.search);
  await expect(checklist).toContainText('First-light checklist: revision 2');
  for (const item of await checklist.locator('[data-item]').all()) await item.getByLabel('Checked').check();
  await sup.getByRole('button', { name: 'Sign off revision 2' }).click();
  await expect(sup.getByText('Revision 2 is signed off for first light.')).toBeVisible();
  await mailTo(memberCtx.request, memberEmail, 'Signed off for first light: “Dockside spark coil” revision 2');

  await member.goto(`/designs/${id}`);
  await expect(member.getByTestId('review-state')).toContainText('Signed off for first light: revision 2');
  // Any later edit leaves the sign-off behind, on the design page and on the event sheet.
  await saveTurns(member, '1020', 3);
  await member.reload();
  await expect(member.getByTestId('review-state')).toContainText('Signed off revision 2; changed since');
  await expect(member.getByTestId('review-state')).toHaveAttribute('data-review-state', 'changed_since');
  await member.goto(`/designs/${id}/event`);
  await expect(member.getByTestId('review-state')).toContainText('Signed off revision 2; changed since');
  await sup.goto(`/designs/${id}/build`);
  await expect(sup.getByTestId('review-state')).toContainText('Signed off revision 2; changed since');

  // The supervisor's library lists the group's design under the group, and the group filter keeps it.
  const other = await supCtx.request.post('/api/v1/designs', { data: { name: 'Siri’s own coil', design: exampleDesigns[0].design } });
  expect(other.status()).toBe(201);
  await sup.goto('/designs');
  const row = sup.locator(`tr[data-design-id="${id}"]`);
  await expect(row).toContainText('Dockside coil club');
  await sup.getByLabel('Group', { exact: true }).selectOption({ label: 'Dockside coil club' });
  await expect(row).toBeVisible();
  await expect(sup.getByRole('link', { name: 'Siri’s own coil', exact: true })).toHaveCount(0);
  await sup.getByLabel('Group', { exact: true }).selectOption({ label: 'No group' });
  await expect(row).toHaveCount(0);
  await expect(sup.getByRole('link', { name: 'Siri’s own coil', exact: true })).toBeVisible();

  await Promise.all([adminCtx.close(), supCtx.close(), memberCtx.close()]);
});
