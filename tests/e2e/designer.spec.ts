import { readFileSync } from 'node:fs';
import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import AxeBuilder from '@axe-core/playwright';

const EXAMPLE = '/designs/new?example=sign-transformer-toroid';

async function signUp(request: APIRequestContext, who: string): Promise<string> {
  const email = `${who}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.test`;
  const r = await request.post('/api/auth/sign-up/email', { data: { name: `Builder ${who}`, email, password: 'wind-it-tight-42' } });
  expect(r.status(), await r.text()).toBe(200);
  return email;
}

const loaded = (page: Page) => page.locator('[data-result="system.resonantFrequency"]');
const upToDate = (page: Page) => expect(page.getByTestId('solve-state')).toHaveText('up to date');

async function openDesigner(page: Page, url: string) {
  await page.goto(url);
  await expect(loaded(page)).toHaveText(/\d+(\.\d+)? kHz/);
  await upToDate(page);
}

test('/designs/new: typing the secondary turns changes the loaded frequency', async ({ page }) => {
  await openDesigner(page, EXAMPLE);
  const before = await loaded(page).textContent();
  await page.getByLabel('Secondary turns').fill('1400');
  await expect(loaded(page)).not.toHaveText(before!);
  await upToDate(page);
  const after = parseFloat((await loaded(page).textContent())!);
  // more turns on the same form: more inductance, a lower loaded frequency
  expect(after).toBeLessThan(parseFloat(before!));
  // a bad value is named beside the field, and the results wait for it
  await page.getByLabel('Secondary turns').fill('12.5');
  await expect(page.locator('[data-error-for="secondary.turns"]')).toContainText('whole number');
});

test('/designs/new: a length in a unit the plain reader does not know (yards) is read by the unit library the worker loads', async ({ page }) => {
  const errors: string[] = [];
  page.on('console', (m) => {
    if (m.type() === 'error') errors.push(m.text());
  });
  await openDesigner(page, EXAMPLE);
  const before = await loaded(page).textContent();
  await page.getByLabel('Form outer diameter').fill('0.15 yd');
  await expect(loaded(page)).not.toHaveText(before!);
  await upToDate(page);
  // 0.15 yd = 137 mm, wider than the example's 4.5 in form: more inductance, a lower loaded frequency
  expect(parseFloat((await loaded(page).textContent())!)).toBeLessThan(parseFloat(before!));
  expect(errors).toEqual([]);
});

test('/designs/new: switching units shows the same lengths in the other system', async ({ page }) => {
  await openDesigner(page, EXAMPLE);
  const form = page.getByLabel('Form outer diameter');
  await expect(form).toHaveValue('114.3 mm');
  await expect(page.locator('[data-result="secondary.windingDiameter"]')).toHaveText(/mm$/);
  await page.getByText('Imperial (in, ft)').click();
  await expect(form).toHaveValue('4.5 in');
  await expect(page.getByLabel('Toroid overall diameter')).toHaveValue('20 in');
  await expect(page.locator('[data-result="secondary.windingDiameter"]')).toHaveText(/in$/);
  await upToDate(page);
  const freq = await loaded(page).textContent();
  await page.getByText('Metric (mm, m)').click();
  await expect(form).toHaveValue('114.3 mm');
  await upToDate(page);
  await expect(loaded(page)).toHaveText(freq!);
});

test('sweep: a chart with one point per step, and its CSV', async ({ page }) => {
  await openDesigner(page, EXAMPLE);
  await page.getByLabel('Input to vary').selectOption('secondary.turns');
  await page.getByLabel('From', { exact: true }).fill('600');
  await page.getByLabel('To', { exact: true }).fill('1400');
  await page.getByLabel('Number of points').fill('21');
  await page.getByRole('button', { name: 'Run sweep' }).click();
  const chart = page.getByTestId('sweep-resonantFrequency');
  await expect(chart.locator('.recharts-line-curve')).toHaveCount(1);
  await expect(chart.locator('.recharts-line-dots circle')).toHaveCount(21);
  await expect(chart.getByText('loaded frequency (kHz)')).toBeVisible();
  const path = await chart.locator('.recharts-line-curve').getAttribute('d');
  expect(path && path.length).toBeGreaterThan(50);

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('sweep-chart').getByRole('button', { name: /Download CSV/ }).click()]);
  expect(download.suggestedFilename()).toBe('sweep-secondary-turns.csv');
  const text = readFileSync((await download.path())!, 'utf8');
  const lines = text.trim().split(/\r\n/);
  expect(lines[0]).toBe('secondary turns (1),loaded frequency (Hz),secondary inductance (H),self-capacitance (F),coupling k (1)');
  expect(lines).toHaveLength(22);
  const first = lines[1].split(',').map(Number);
  const last = lines[21].split(',').map(Number);
  expect(first[0]).toBe(600);
  expect(last[0]).toBe(1400);
  expect(first[1]).toBeGreaterThan(last[1]);
});

test('save: a signed-in builder saves, reloads and sees the same values', async ({ page }) => {
  await signUp(page.request, 'saver');
  await openDesigner(page, EXAMPLE);
  await page.getByLabel('Design name').fill('Garage coil');
  await page.getByLabel('Secondary turns').fill('1111');
  await upToDate(page);
  const freq = await loaded(page).textContent();
  await page.getByRole('button', { name: 'Save design' }).click();
  await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
  await expect(page.getByLabel('Secondary turns')).toHaveValue('1111');
  await page.reload();
  await expect(page.getByLabel('Design name')).toHaveValue('Garage coil');
  await expect(page.getByLabel('Secondary turns')).toHaveValue('1111');
  await expect(page.getByLabel('Form outer diameter')).toHaveValue('114.3 mm');
  await upToDate(page);
  await expect(loaded(page)).toHaveText(freq!);
  await expect(page.getByTestId('save-state')).toContainText('All changes saved (revision 1)');

  // a second save goes through PUT with the revision and moves it on
  await page.getByLabel('Secondary turns').fill('1112');
  await expect(page.getByTestId('save-state')).toContainText('Unsaved changes');
  await page.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(page.getByTestId('save-state')).toContainText('revision 2');
  const id = new URL(page.url()).pathname.split('/').pop();
  const stored = await (await page.request.get(`/api/v1/designs/${id}`)).json();
  expect(stored.design.secondary.turns).toBe(1112);
  expect(stored.revision).toBe(2);
});

test('save: a stale revision from a second tab is a conflict and neither edit is lost', async ({ page, context }) => {
  await signUp(page.request, 'twotabs');
  const created = await page.request.post('/api/v1/designs', {
    data: { name: 'Shared bench coil', design: { secondary: { formDiameter: '4 in', turns: 900, wire: { awg: 24, insulation: 'heavy' } } } },
  });
  expect(created.status()).toBe(201);
  const { id } = await created.json();
  const a = page;
  const b = await context.newPage();
  await openDesigner(a, `/designs/${id}`);
  await openDesigner(b, `/designs/${id}`);

  await a.getByLabel('Secondary turns').fill('950');
  await a.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(a.getByTestId('save-state')).toContainText('revision 2');

  await b.getByLabel('Form outer diameter').fill('110 mm');
  await b.getByRole('button', { name: 'Save', exact: true }).click();
  const dialog = b.getByRole('dialog', { name: 'Someone saved a newer revision' });
  await expect(dialog).toBeVisible();
  await dialog.getByRole('button', { name: 'Save mine as a copy' }).click();
  await b.waitForURL((u) => /\/designs\/[0-9a-f-]{36}$/.test(u.pathname) && !u.pathname.endsWith(id));
  await expect(b.getByLabel('Design name')).toHaveValue('Shared bench coil (copy)');
  await expect(b.getByLabel('Form outer diameter')).toHaveValue('110 mm');
  const original = await (await a.request.get(`/api/v1/designs/${id}`)).json();
  expect(original.revision).toBe(2);
  expect(original.design.secondary.turns).toBe(950);
  expect(original.design.secondary.formDiameter).toBe('101.6 mm');

  // the other way out: take the latest, with my version kept aside to bring back
  await b.goto(`/designs/${id}`);
  await upToDate(b);
  await b.getByLabel('Secondary turns').fill('960');
  await b.getByRole('button', { name: 'Save', exact: true }).click();
  await expect(b.getByTestId('save-state')).toContainText('revision 3');

  await a.getByLabel('Form outer diameter').fill('120 mm');
  await a.getByRole('button', { name: 'Save', exact: true }).click();
  await a.getByRole('dialog').getByRole('button', { name: 'Reload the latest' }).click();
  await expect(a.getByLabel('Secondary turns')).toHaveValue('960');
  await expect(a.getByLabel('Form outer diameter')).toHaveValue('101.6 mm');
  await expect(a.getByTestId('save-state')).toContainText('revision 3');
  await a.getByRole('button', { name: 'Bring back my version' }).click();
  await expect(a.getByLabel('Form outer diameter')).toHaveValue('120 mm');
  const latest = await (await a.request.get(`/api/v1/designs/${id}`)).json();
  expect(latest.revision).toBe(3);
  expect(latest.design.secondary.turns).toBe(960);
});

test('axe: the designer has no serious or critical accessibility violation', async ({ page }) => {
  await openDesigner(page, EXAMPLE);
  await page.getByRole('button', { name: 'Run sweep' }).click();
  // The chart code and the unit parser load on first use; give a cold server room.
  await expect(page.getByTestId('sweep-chart')).toBeVisible({ timeout: 30_000 });
  await page.getByRole('heading', { name: 'Energy exchange between primary and secondary' }).scrollIntoViewIfNeeded();
  await expect(page.getByTestId('exchange-chart')).toBeVisible({ timeout: 30_000 });
  const results = await new AxeBuilder({ page }).analyze();
  const bad = results.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  expect(bad.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
});

async function tabTo(page: Page, test: () => Promise<boolean>, max = 120) {
  for (let i = 0; i < max; i++) {
    if (await test()) return;
    await page.keyboard.press('Tab');
  }
  throw new Error('could not reach the element with Tab');
}

test('keyboard: a design can be filled and saved with the keyboard alone', async ({ page }) => {
  await signUp(page.request, 'keys');
  await page.goto('/designs/new');
  await upToDate(page);
  const activeId = () => page.evaluate(() => document.activeElement?.id ?? '');
  await tabTo(page, async () => (await activeId()) === 'f-name');
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.type('Keyboard coil');
  await tabTo(page, async () => (await activeId()) === 'f-secondary-turns');
  await page.keyboard.press('ControlOrMeta+a');
  await page.keyboard.type('950');
  await tabTo(page, async () => (await activeId()) === 'f-topload-shape');
  await page.keyboard.press('ArrowDown');
  await expect(page.getByLabel('Toroid overall diameter')).toBeVisible();
  await tabTo(page, async () => (await page.evaluate(() => document.activeElement?.textContent ?? '')) === 'Save design');
  await page.keyboard.press('Enter');
  await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
  await expect(page.getByLabel('Design name')).toHaveValue('Keyboard coil');
  await expect(page.getByLabel('Secondary turns')).toHaveValue('950');
  await expect(page.getByLabel('Topload shape')).toHaveValue('toroid');
});

test('/designs/:id of a stranger is the 404 page, and signed-out visitors are sent to sign in', async ({ browser }) => {
  const owner = await browser.newContext();
  const op = await owner.newPage();
  await signUp(op.request, 'owner');
  const created = await op.request.post('/api/v1/designs', {
    data: { name: 'Private coil', design: { secondary: { formDiameter: '4 in', turns: 900, wire: { awg: 24, insulation: 'heavy' } } } },
  });
  const { id } = await created.json();
  const stranger = await browser.newContext();
  const sp = await stranger.newPage();
  await sp.goto(`/designs/${id}`);
  await expect(sp).toHaveURL(/\/sign-in\?next=/);
  await signUp(sp.request, 'stranger');
  const r = await sp.goto(`/designs/${id}`);
  expect(r?.status()).toBe(404);
  await expect(sp.getByText('Private coil')).toHaveCount(0);
  await owner.close();
  await stranger.close();
});

test('solver: a worker that fails to start shows an error with Retry, and Retry computes the results', async ({ page }) => {
  // the worker's script cannot be fetched, so the worker dies before its first answer
  await page.route(/solver\.worker[^/]*\.js/, (route) => route.abort());
  await page.goto(EXAMPLE);
  const failed = page.getByTestId('solve-failed');
  await expect(failed).toContainText('The results could not be computed.');
  await expect(page.getByTestId('solve-state')).toHaveText('stopped');
  await expect(loaded(page)).toHaveCount(0);

  await page.unroute(/solver\.worker[^/]*\.js/);
  await failed.getByRole('button', { name: 'Retry' }).click();
  await expect(loaded(page)).toHaveText(/\d+(\.\d+)? kHz/);
  await upToDate(page);
  await expect(failed).toHaveCount(0);
});
