import { expect, test } from '@playwright/test';

test.use({ javaScriptEnabled: false });

const pages = [
  { link: 'Validation', path: '/validation', heading: 'Validation' },
  { link: 'Methods', path: '/methods', heading: 'Methods' },
  { link: 'Safety', path: '/safety', heading: 'Safety' },
];

for (const p of pages) {
  test(`GET ${p.path} opens from the navigation without JavaScript and ships no script`, async ({ page }) => {
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto('/');
    await page.getByRole('navigation', { name: 'Main' }).first().getByRole('link', { name: p.link, exact: true }).click();
    await expect(page).toHaveURL(new RegExp(`${p.path}$`));
    await expect(page.getByRole('heading', { level: 1 })).toHaveText(p.heading);
    expect(await page.locator('script').count()).toBe(0);
    const html = await (await page.request.get(p.path)).text();
    expect(html).not.toMatch(/<script\b/i);
    expect(html).not.toMatch(/astro-island/);
  });
}

test('GET /validation shows every check passing and links each row to its method note', async ({ page }) => {
  await page.goto('/validation');
  const rows = page.locator('[data-case-id]');
  const count = await rows.count();
  expect(count).toBeGreaterThanOrEqual(25);
  await expect(page.locator('[data-case-id][data-status="fail"]')).toHaveCount(0);
  const href = await rows.first().locator('a[href^="/methods#"]').first().getAttribute('href');
  expect(href).toMatch(/^\/methods#[a-z-]+$/);
  await page.goto(href!);
  await expect(page.locator(href!.slice('/methods'.length))).toBeAttached();
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Methods');
});

test('GET /safety has an anchor for each hazard', async ({ page }) => {
  await page.goto('/safety');
  for (const id of ['stored-energy', 'supply', 'rf-burns', 'ozone', 'uv', 'fire', 'noise', 'implants', 'interference', 'audience']) {
    await expect(page.locator(`section#${id} h2`)).toBeVisible();
  }
  await expect(page.getByRole('main').getByText('Coilwright gives estimates, not safety certification.')).toBeVisible();
});
