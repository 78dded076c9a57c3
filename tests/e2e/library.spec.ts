import { expect, test, type APIRequestContext } from '@playwright/test';
import { exampleDesigns } from '../../src/lib/design/examples';
import { formatSi } from '../../src/lib/format';

function uniqueEmail(who: string) {
  return `${who}-${Date.now()}-${Math.random().toString(36).slice(2, 8)}@example.test`;
}

async function signUp(request: APIRequestContext, name: string) {
  const email = uniqueEmail(name.toLowerCase().replace(/\W+/g, '-'));
  const r = await request.post('/api/auth/sign-up/email', { data: { name, email, password: 'correct-horse-9' } });
  expect(r.status()).toBe(200);
  return email;
}

async function createDesign(request: APIRequestContext, name: string, design: unknown = exampleDesigns[1].design) {
  const r = await request.post('/api/v1/designs', { data: { name, design } });
  expect(r.status()).toBe(201);
  return (await r.json()) as { id: string; result: { system: { resonantFrequency: number } } };
}

test('share a design, open the link in a fresh browser, see its frequency, copy it into another account', async ({ browser }) => {
  const ownerCtx = await browser.newContext();
  const owner = await ownerCtx.newPage();
  await signUp(ownerCtx.request, 'Owner Oksana');
  const made = await createDesign(ownerCtx.request, 'Pier Street coil');
  const frequency = formatSi(made.result.system.resonantFrequency, 'Hz', 3);
  expect(frequency).toMatch(/^\d+(\.\d+)? kHz$/);

  await owner.goto('/designs');
  const row = owner.locator(`tr[data-design-id="${made.id}"]`);
  await expect(row).toContainText('Pier Street coil');
  await expect(row).toContainText(frequency);
  await row.getByRole('link', { name: /People/ }).click();
  await expect(owner.getByRole('heading', { name: 'People and sharing' })).toBeVisible();
  await owner.getByRole('button', { name: 'Make a read-only link' }).click();
  const shareItem = owner.locator('[data-share-url]').first();
  await expect(shareItem).toBeVisible();
  const url = (await shareItem.getAttribute('data-share-url'))!;
  expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{22,}$/);

  // A fresh context has no cookies: the link alone opens the design.
  const visitorCtx = await browser.newContext();
  const visitor = await visitorCtx.newPage();
  await visitor.goto(new URL(url).pathname);
  await expect(visitor.getByTestId('shared-name')).toHaveText('Pier Street coil');
  await expect(visitor.locator('[data-figure="loadedFrequency"]')).toHaveText(frequency);
  await expect(visitor.getByText('Stored energy can kill').first()).toBeVisible();
  await expect(visitor.getByTestId('design-viewer')).toBeVisible();
  await expect(visitor.locator('#main').getByRole('link', { name: 'Sign in' })).toBeVisible();

  // The visitor makes an account and copies the design into it.
  await signUp(visitorCtx.request, 'Visitor Viggo');
  await visitor.reload();
  await visitor.getByRole('button', { name: 'Copy into my designs' }).click();
  await visitor.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
  const copyId = visitor.url().split('/').pop()!;
  expect(copyId).not.toBe(made.id);
  await visitor.goto('/designs');
  const copyRow = visitor.locator(`tr[data-design-id="${copyId}"]`);
  await expect(copyRow).toContainText('Pier Street coil (copy)');
  await expect(copyRow).toContainText('Owner');
  await expect(copyRow).toContainText(frequency);

  // Revoking the link ends it for the visitor.
  await owner.getByRole('button', { name: 'Revoke' }).click();
  await expect(owner.getByText('No live links.')).toBeVisible();
  const gone = await visitor.goto(new URL(url).pathname);
  expect(gone?.status()).toBe(404);
  await expect(visitor.getByText('Pier Street coil', { exact: true })).toHaveCount(0);

  await ownerCtx.close();
  await visitorCtx.close();
});

test('library: search, role filter, rename and delete with a confirmation', async ({ browser }) => {
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  await signUp(ctx.request, 'Librarian Lin');
  const a = await createDesign(ctx.request, 'Garden shed coil');
  const b = await createDesign(ctx.request, 'Workbench sphere coil', exampleDesigns[0].design);
  await page.goto('/designs');
  await expect(page.locator('tbody tr[data-design-id]')).toHaveCount(2);

  await page.getByLabel('Search by name').fill('shed');
  await expect(page.locator('tbody tr[data-design-id]')).toHaveCount(1);
  await expect(page.locator(`tr[data-design-id="${a.id}"]`)).toBeVisible();
  await page.getByLabel('Search by name').fill('');
  await page.getByLabel('My role').selectOption('viewer');
  await expect(page.getByText('No design matches the search and role filter.')).toBeVisible();
  await page.getByLabel('My role').selectOption('owner');
  await expect(page.locator('tbody tr[data-design-id]')).toHaveCount(2);

  await page.locator(`tr[data-design-id="${a.id}"]`).getByRole('button', { name: /Rename/ }).click();
  const dialog = page.getByRole('dialog', { name: 'Rename design' });
  await dialog.getByLabel('New name').fill('   ');
  await dialog.getByRole('button', { name: 'Rename' }).click();
  await expect(dialog.getByText('Give the design a name.')).toBeVisible();
  await dialog.getByLabel('New name').fill('Garden shed coil, mk 2');
  await dialog.getByRole('button', { name: 'Rename' }).click();
  await expect(page.locator(`tr[data-design-id="${a.id}"]`)).toContainText('Garden shed coil, mk 2');
  const saved = await (await ctx.request.get(`/api/v1/designs/${a.id}`)).json();
  expect(saved).toMatchObject({ name: 'Garden shed coil, mk 2', revision: 2 });

  // Delete asks first; "Keep it" keeps it.
  await page.locator(`tr[data-design-id="${b.id}"]`).getByRole('button', { name: /Delete/ }).click();
  const confirm = page.getByRole('dialog', { name: 'Delete this design?' });
  await expect(confirm).toContainText('Workbench sphere coil');
  await confirm.getByRole('button', { name: 'Keep it' }).click();
  await expect(page.locator(`tr[data-design-id="${b.id}"]`)).toBeVisible();
  expect((await ctx.request.get(`/api/v1/designs/${b.id}`)).status()).toBe(200);
  await page.locator(`tr[data-design-id="${b.id}"]`).getByRole('button', { name: /Delete/ }).click();
  await confirm.getByRole('button', { name: 'Delete for good' }).click();
  await expect(page.locator(`tr[data-design-id="${b.id}"]`)).toHaveCount(0);
  expect((await ctx.request.get(`/api/v1/designs/${b.id}`)).status()).toBe(404);
  await ctx.close();
});

test('history: compare two revisions and restore the first', async ({ browser }) => {
  const ctx = await browser.newContext();
  const page = await ctx.newPage();
  await signUp(ctx.request, 'Historian Hedda');
  const d = await createDesign(ctx.request, 'Toroid swap coil');
  const bigger = { ...exampleDesigns[1].design, topload: { shape: 'toroid', majorDiameter: '24 in', minorDiameter: '6 in', elevation: '3 in' } };
  expect((await ctx.request.put(`/api/v1/designs/${d.id}`, { data: { design: bigger, revision: 1, message: 'bigger toroid' } })).status()).toBe(200);

  await page.goto(`/designs/${d.id}/history`);
  await expect(page.locator('tr[data-revision]')).toHaveCount(2);
  await page.getByLabel('Compare revision').selectOption('1');
  await page.getByLabel('with revision').selectOption('2');
  await page.getByRole('button', { name: 'Compare side by side' }).click();
  await expect(page.getByTestId('changed-inputs')).toContainText('Toroid overall diameter');
  await expect(page.getByTestId('changed-inputs')).toContainText('24 in');
  await expect(page.getByTestId('changed-results').locator('[data-figure="loadedFrequency"]')).toContainText('−');

  await page.goto(`/designs/${d.id}/history`);
  await page.locator('tr[data-revision="1"]').getByRole('button', { name: /Restore/ }).click();
  await expect(page.getByText('Restored as revision 3.')).toBeVisible();
  const now = await (await ctx.request.get(`/api/v1/designs/${d.id}`)).json();
  expect(now.revision).toBe(3);
  expect(now.design).toEqual(exampleDesigns[1].design);
  await ctx.close();
});
