import { expect, test } from '@playwright/test';
import { demoAccounts } from '../../scripts/seed-demo';

test('a site admin changes a member’s role and disables then enables the account; the member is refused while disabled', async ({ page, browser }) => {
  const email = `member-${Date.now()}@example.test`;
  const member = await browser.newContext();
  const mp = await member.newPage();
  const signUp = await mp.request.post('/api/auth/sign-up/email', { data: { name: 'Rota Member', email, password: 'member-pass-77' } });
  expect(signUp.ok()).toBe(true);
  expect((await mp.request.get('/admin/users', { maxRedirects: 0 })).status()).toBe(404);

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(demoAccounts.admin.email);
  await page.getByLabel('Password').fill(demoAccounts.admin.password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));

  await page.goto('/admin/users');
  await page.getByLabel('Find by e-mail').fill(email);
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  const role = page.getByLabel(`Role of ${email}`);
  await expect(role).toHaveValue('member');
  await role.selectOption('admin');
  await expect(page.getByText(`${email} is now an administrator.`)).toBeVisible();

  await page.getByRole('button', { name: `Disable ${email}` }).click();
  await expect(page.getByText(`${email} is disabled and signed out.`)).toBeVisible();
  const refused = await (await browser.newContext()).request.post('/api/auth/sign-in/email', { data: { email, password: 'member-pass-77' } });
  expect(refused.ok()).toBe(false);

  await page.getByRole('button', { name: `Enable ${email}` }).click();
  await expect(page.getByText(`${email} can sign in again.`)).toBeVisible();
  await page.reload();
  await page.getByLabel('Find by e-mail').fill(email);
  await page.getByRole('button', { name: 'Search', exact: true }).click();
  await expect(page.getByLabel(`Role of ${email}`)).toHaveValue('admin');
  await member.close();
});
