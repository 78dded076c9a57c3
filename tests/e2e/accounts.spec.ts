import { expect, test, type Page } from '@playwright/test';

type Mail = { to: string; subject: string; text: string };

async function mailFor(page: Page, to: string, subject: string): Promise<Mail> {
  for (let i = 0; i < 60; i++) {
    const list = (await (await page.request.get('/dev/mail.json')).json()) as Mail[];
    const m = list.find((x) => x.to.includes(to) && x.subject.includes(subject));
    if (m) return m;
    await page.waitForTimeout(200);
  }
  throw new Error(`no "${subject}" mail for ${to}`);
}

test('a newcomer signs up, confirms the address from the caught mail, signs out and in, and sets units', async ({ page }) => {
  const email = `newcomer-${Date.now()}@example.test`;
  const password = 'wind-it-tight-42';
  const external: string[] = [];
  page.on('request', (r) => {
    const u = new URL(r.url());
    if (!['127.0.0.1', 'localhost'].includes(u.hostname) && u.protocol.startsWith('http')) external.push(r.url());
  });

  await page.goto('/sign-up');
  await page.getByLabel('Name').fill('Lena Newcomer');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: /create|sign up/i }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-up'));
  await expect(page.getByRole('banner')).toContainText('Lena Newcomer');

  const mail = await mailFor(page, email, 'Confirm');
  const link = mail.text.match(/https?:\/\/\S+/)![0];
  await page.goto(link);
  await page.goto('/account');
  await expect(page.getByText(/confirmed|verified/i).first()).toBeVisible();

  await page.getByRole('button', { name: 'Sign out' }).first().click();
  await page.waitForURL('/');
  await expect(page.getByRole('link', { name: 'Sign in' }).first()).toBeVisible();

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('not-my-password');
  await page.getByRole('button', { name: /sign in/i }).click();
  await expect(page.getByText(/wrong e-mail or password/i)).toBeVisible();

  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));

  await page.goto('/account');
  await page.getByLabel(/imperial/i).check();
  await page.getByRole('button', { name: 'Save units' }).click();
  await expect(page.getByText(/imperial units/i)).toBeVisible();
  await page.reload();
  await expect(page.getByLabel(/imperial/i)).toBeChecked();

  const font = await page.evaluate(async () => {
    await document.fonts.ready;
    return document.fonts.check('16px "IBM Plex Sans"');
  });
  expect(font).toBe(true);
  expect(external).toEqual([]);
});

test('a protected page sends a signed-out visitor to sign-in and back', async ({ page }) => {
  await page.goto('/account');
  await expect(page).toHaveURL(/\/sign-in\?next=%2Faccount/);
});
