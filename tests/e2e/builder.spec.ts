import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { exampleDesigns } from '../../src/lib/design/examples';

const EXAMPLE = '/designs/new?example=sign-transformer-toroid';
const exampleDesign = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;

const loaded = (page: Page) => page.locator('[data-result="system.resonantFrequency"]');
const upToDate = (page: Page) => expect(page.getByTestId('solve-state')).toHaveText('up to date');

async function openDesigner(page: Page, url = EXAMPLE) {
  await page.goto(url);
  await expect(loaded(page)).toHaveText(/\d+(\.\d+)? kHz/);
  await upToDate(page);
}

/** Runs the sweep; a click that lands while the charts below are still moving the page is made again. */
async function runSweep(page: Page, expectChart = true) {
  const button = page.getByRole('button', { name: 'Run sweep' });
  if (!expectChart) return button.click();
  await expect(async () => {
    await button.click();
    await expect(page.getByTestId('sweep-chart')).toBeVisible({ timeout: 5_000 });
  }).toPass({ timeout: 40_000 });
}

async function signUp(request: APIRequestContext, who: string) {
  const email = `${who}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@example.test`;
  const r = await request.post('/api/auth/sign-up/email', { data: { name: `Builder ${who}`, email, password: 'wind-it-tight-42' } });
  expect(r.status(), await r.text()).toBe(200);
}

async function createDesign(request: APIRequestContext, name: string, design: unknown = exampleDesign) {
  const r = await request.post('/api/v1/designs', { data: { name, design } });
  expect(r.status(), await r.text()).toBe(201);
  return (await r.json()) as { id: string; result: { system: { resonantFrequency: number }; tuning: { tapTurns: number } } };
}

test.describe('input', () => {
  test('typing "1,000" in Secondary turns gives 1000 turns, the same as typing 1000', async ({ page }) => {
    await openDesigner(page);
    const turns = page.getByLabel('Secondary turns');
    await turns.fill('1000');
    await upToDate(page);
    const plain = await loaded(page).textContent();
    await turns.fill('900');
    await expect(loaded(page)).not.toHaveText(plain!);
    await turns.fill('1,000');
    await upToDate(page);
    await expect(loaded(page)).toHaveText(plain!);
    await expect(page.locator('[data-error-for="secondary.turns"]')).toHaveCount(0);
    // the rule is stated beside the field
    await expect(page.locator('#f-secondary-turns-hint')).toContainText('1,000');
  });

  test('"1,00,0" in Secondary turns is refused beside the field, naming what is wrong', async ({ page }) => {
    await openDesigner(page);
    await page.getByLabel('Secondary turns').fill('1,00,0');
    await expect(page.locator('[data-error-for="secondary.turns"]')).toContainText('1,00,0');
  });

  test('switching to imperial rounds lengths to the precision entered, not to six figures', async ({ page }) => {
    await openDesigner(page, '/designs/new');
    await page.getByLabel('Form outer diameter').fill('100 mm');
    await page.getByText('Imperial (in, ft)').click();
    await expect(page.getByLabel('Form outer diameter')).toHaveValue('3.94 in');
  });

  test('the primary inner diameter follows a 6.6 in form and does not fail at once; errors speak inches in imperial', async ({ page }) => {
    await openDesigner(page, '/designs/new');
    await page.getByText('Imperial (in, ft)').click();
    await page.getByLabel('Form outer diameter').fill('6.6 in');
    await page.getByLabel('Include a primary').check();
    await expect(page.getByLabel('Innermost turn diameter')).toHaveValue('8.75 in');
    await upToDate(page);
    await expect(page.locator('[data-error-for="primary.innerDiameter"]')).toHaveCount(0);
    // a value out of bounds is reported in inches
    await page.getByLabel('Innermost turn diameter').fill('0.1 in');
    const error = page.locator('[data-error-for="primary.innerDiameter"]');
    await expect(error).toContainText(' in');
    await expect(error).not.toContainText(' mm');
  });

  test('imperial hints say no metric lengths', async ({ page }) => {
    await openDesigner(page, '/designs/new');
    await page.getByText('Imperial (in, ft)').click();
    const form = page.getByRole('form', { name: 'Design' });
    await expect(form).not.toContainText('0.5 m');
    await expect(form).toContainText('19.7 in');
  });

  test('each label is used by one input only', async ({ page }) => {
    await openDesigner(page);
    const labels = await page.locator('label').allTextContents();
    const seen = labels.map((l) => l.trim()).filter(Boolean);
    const twice = seen.filter((l, i) => seen.indexOf(l) !== i);
    expect(twice).toEqual([]);
  });

  test('points to check name fields by their labels, never by a path', async ({ page }) => {
    await openDesigner(page);
    const list = page.locator('[aria-labelledby="res-warnings"]');
    if ((await list.count()) > 0) {
      await expect(list).not.toContainText(/\b[a-z]+\.[a-z][A-Za-z]+\b/);
    }
    await page.getByLabel('Winding length').fill('0.5 mm');
    await expect(page.getByRole('complementary', { name: 'Results' })).not.toContainText('secondary.windingLength');
  });

  test('an import that lacks its design names the part by name, in plain words', async ({ page }) => {
    await signUp(page.request, 'importer');
    await page.goto('/designs');
    // the file input acts once the library island has hydrated (a file set before that raises no change event)
    await expect(page.locator('astro-island[ssr]')).toHaveCount(0);
    await page.getByLabel('Design file to import').setInputFiles({ name: 'broken.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify({ name: 'Broken' })) });
    const alert = page.getByRole('alert').filter({ hasText: /Design/ });
    await expect(alert).toBeVisible();
    await expect(alert).not.toContainText('nonoptional');
    await expect(alert).not.toContainText('received undefined');
  });
});

test.describe('the main answer', () => {
  test('adopting a measured frequency makes the calibrated tap the answer on the design page, the library and the share page', async ({ page, browser }) => {
    await signUp(page.request, 'bench');
    const made = await createDesign(page.request, 'Harbour Lane calibrated coil');
    const predicted = made.result.tuning.tapTurns;
    const measured = made.result.system.resonantFrequency * 0.94;
    const put = await page.request.put(`/api/v1/designs/${made.id}/calibration`, { data: { loadedFrequency: measured } });
    expect(put.status(), await put.text()).toBe(200);
    const calibrated = ((await put.json()) as { calibrated: { tapTurns: number } }).calibrated.tapTurns;
    expect(Math.abs(calibrated - predicted)).toBeGreaterThan(0.05);

    await page.goto(`/designs/${made.id}`);
    await expect(page.locator('[data-result="tap"]')).toHaveText(`${calibrated.toFixed(2)} turns`);
    await expect(page.locator('[data-result="tap-predicted"]')).toContainText(predicted.toFixed(2));

    await page.goto('/designs');
    const row = page.locator(`tr[data-design-id="${made.id}"]`);
    await expect(row.locator('[data-tap="calibrated"]')).toHaveText(`${Number(calibrated.toFixed(2))} turns`);
    await expect(row).toContainText(`predicted ${Number(predicted.toFixed(2))} turns`);

    const share = await page.request.post(`/api/v1/designs/${made.id}/share`);
    expect(share.status()).toBe(201);
    const { token } = (await share.json()) as { token: string };
    const visitor = await (await browser.newContext()).newPage();
    await visitor.goto(`/s/${token}`);
    await expect(visitor.locator('[data-figure="tapTurns"]')).toHaveText(`${Number(calibrated.toFixed(2))} turns`);
    await expect(visitor.locator('[data-figure="tapTurns-predicted"]')).toContainText(`${Number(predicted.toFixed(2))} turns`);

    const summary = await page.request.get(`/api/v1/designs/${made.id}/summary?format=markdown`);
    const first = (await summary.text()).split('\n')[0];
    expect(first).toContain(`tap ${Number(calibrated.toFixed(2))} turns (from the bench measurement; predicted ${Number(predicted.toFixed(2))} turns)`);
  });

  test('the "likely between" band sits under the streamer-loaded target it belongs to, and contains it', async ({ page }) => {
    await openDesigner(page);
    await page.getByLabel('Streamer capacitance allowance').fill('5 pF');
    await upToDate(page);
    const band = page.locator('[data-band-for]');
    await expect(band).toHaveCount(1);
    await expect(band).toHaveAttribute('data-band-for', 'targetFrequency');
    const row = page.locator('[data-result="tuning.targetFrequency"]').locator('..');
    await expect(row.locator('[data-band-for]')).toHaveCount(1);
    const target = parseFloat((await page.locator('[data-result="tuning.targetFrequency"]').textContent())!);
    const [low, high] = ((await band.textContent())!.match(/[\d.]+ kHz/g) ?? []).map((t) => parseFloat(t));
    expect(low).toBeLessThanOrEqual(target);
    expect(high).toBeGreaterThanOrEqual(target);
  });
});

test.describe('results', () => {
  test('results are grouped by what the builder does, led by the figures that decide the build', async ({ page }) => {
    await openDesigner(page);
    const panel = page.getByTestId('results-panel');
    const headings = await panel.locator('h3').allTextContents();
    const order = ['Decides the build', 'What to buy', 'What to set', 'What to expect when measuring', 'What can hurt'];
    const at = order.map((h) => headings.indexOf(h));
    expect(at.every((i) => i >= 0), headings.join(' | ')).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    await expect(panel.locator('[data-result-group="buy"]')).toContainText('Secondary wire length');
    await expect(panel.locator('[data-result-group="hurt"]')).toContainText('Supply peak voltage');
    // the quarter-wave comparison is on the methods page, not among the results
    await expect(panel).not.toContainText('Quarter-wave');
    await page.goto('/methods');
    await expect(page.getByText(/quarter-wave/i).first()).toBeVisible();
  });
});

test.describe('no console errors', () => {
  // a reader far from the server's locale and time zone: any text formatted differently on the two sides shows up
  test.use({ locale: 'de-DE', timezoneId: 'Pacific/Auckland' });
  test('the main pages load with no console error, hydration errors included', async ({ page }) => {
    const errors: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(`${page.url()}: ${m.text()}`);
    });
    page.on('pageerror', (e) => errors.push(`${page.url()}: ${e.message}`));
    await signUp(page.request, 'pages');
    const made = await createDesign(page.request, 'Console check coil');
    const share = await page.request.post(`/api/v1/designs/${made.id}/share`);
    const { token } = (await share.json()) as { token: string };
    for (const path of ['/', '/methods', '/validation', '/safety', '/designs', EXAMPLE, `/designs/${made.id}`, `/designs/${made.id}/build`, `/designs/${made.id}/bench`, `/designs/${made.id}/history`, `/designs/${made.id}/event`, `/s/${token}`]) {
      await page.goto(path);
      await page.waitForLoadState('networkidle');
    }
    expect(errors).toEqual([]);
  });
});

test.describe('goal helper for the tank', () => {
  test('with a bank, asking for a tap proposes strings of the same units, says what it changed, and undo puts it back', async ({ page }) => {
    await openDesigner(page);
    // the example's tank is a bank of 100 nF units, 20 in each string, 2 strings
    await expect(page.getByLabel('Tank capacitor', { exact: true })).toHaveValue('bank');
    await page.getByLabel('Tap at (turns from the inner end)').fill('9');
    await page.getByRole('button', { name: 'Fill in the tank' }).click();
    const status = page.locator('[data-goal-status="tap"]');
    await expect(status).toContainText(/Changed: .*(Strings in parallel|Capacitors in each string) \d+ → \d+/);
    // the bank stays a bank
    await expect(page.getByLabel('Tank capacitor', { exact: true })).toHaveValue('bank');
    await expect(page.getByLabel('Capacitance of each capacitor')).toHaveValue('100 nF');
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByLabel('Strings in parallel')).toHaveValue('2');
    await expect(page.getByLabel('Capacitors in each string')).toHaveValue('20');
  });

  test('a tap no tank can reach is refused with the reason, and nothing changes', async ({ page }) => {
    await openDesigner(page);
    await page.getByLabel('Tank capacitor', { exact: true }).selectOption('single');
    await page.getByLabel('Tank capacitance').fill('10 nF');
    await upToDate(page);
    const before = await page.getByLabel('Tank capacitance').inputValue();
    await page.getByLabel('Tap at (turns from the inner end)').fill('0.03');
    await page.getByRole('button', { name: 'Fill in the tank' }).click();
    await expect(page.locator('[data-goal-status="tap"]')).toContainText(/outside what a tank can be|No tank capacitance/);
    await expect(page.getByLabel('Tank capacitance')).toHaveValue(before);
  });
});

test.describe('claims', () => {
  test('the home page says only what the validation page has: published sources beside predictions, not measured coils', async ({ page }) => {
    await page.goto('/');
    const claim = page.locator('p', { hasText: 'validation page' });
    await expect(claim).not.toContainText('compares predictions with coils that were built and measured');
    await expect(claim).toContainText('not coils we built and measured');
    await page.goto('/validation');
    await expect(page.getByText(/Medhurst/).first()).toBeVisible();
  });
});

test.describe('sweeps and charts', () => {
  test('a sweep of the primary inner diameter through the secondary marks those points not buildable, with the form\'s reason', async ({ page }) => {
    await openDesigner(page);
    // the winding starts on the primary plane, so a primary narrower than the form runs through it
    await page.getByLabel('Winding bottom above primary plane').fill('0 in');
    await upToDate(page);
    await page.getByLabel('Input to vary').selectOption('primary.innerDiameter');
    await page.getByLabel('From', { exact: true }).fill('100 mm');
    await page.getByLabel('To', { exact: true }).fill('300 mm');
    await page.getByLabel('Number of points').fill('21');
    await runSweep(page);
    const note = page.getByTestId('sweep-unbuildable');
    await expect(note).toContainText('not buildable');
    await expect(note).toContainText('would run through the secondary winding');
    await expect(page.getByTestId('sweep-chart').getByText('not buildable').first()).toBeVisible();
  });

  test('a sweep from a negative length is refused naming the field, and the old chart goes', async ({ page }) => {
    await openDesigner(page);
    await page.getByLabel('Input to vary').selectOption('primary.innerDiameter');
    await page.getByLabel('From', { exact: true }).fill('200 mm');
    await page.getByLabel('To', { exact: true }).fill('300 mm');
    await runSweep(page);
    await page.getByLabel('From', { exact: true }).fill('-100 mm');
    await runSweep(page, false);
    await expect(page.getByRole('alert').filter({ hasText: 'Innermost turn diameter' })).toContainText('must be between 5 mm and 10 m');
    await expect(page.getByTestId('sweep-chart')).toHaveCount(0);
  });

  test('charts have accessible names and data tables, legends outside the plot, and instructions that name line styles', async ({ page }) => {
    await openDesigner(page);
    await page.getByLabel('Input to vary').selectOption('secondary.turns');
    await runSweep(page);
    const apps = page.locator('[role="application"]');
    for (const el of await apps.all()) expect(await el.getAttribute('aria-label')).toBeTruthy();
    const figures = page.locator('figure[role="group"]');
    expect(await figures.count()).toBeGreaterThan(0);
    for (const f of await figures.all()) {
      expect(await f.getAttribute('aria-label')).toBeTruthy();
      await expect(f.locator('details summary')).toContainText('Data table');
    }
    const tuning = page.getByTestId('tuning-chart');
    if ((await tuning.count()) > 0) {
      await expect(tuning).not.toContainText(/blue|copper curve|red/i);
      await expect(tuning).toContainText('solid');
    }
  });
});

test.describe('sheets and consistency', () => {
  test('the build sheet has a topload section, the primary with its diameters, gap and elevation, and the bleeder voltage checked', async ({ page }) => {
    await signUp(page.request, 'sheet');
    const made = await createDesign(page.request, 'Harbour Lane sheet coil');
    await page.goto(`/designs/${made.id}/build`);
    await expect(page.locator('[data-section="topload"]')).toContainText('Overall diameter');
    const primary = page.locator('[data-section="primary"]');
    for (const label of ['Innermost turn diameter', 'Gap between turns', 'Outside diameter', 'Innermost turn above the primary plane']) await expect(primary).toContainText(label);
    await expect(page.locator('[data-section="tank"]')).toContainText('Bleeder voltage check');
    await expect(page.locator('[data-section="supply"]')).not.toContainText('on a 9 kV transformer.');
  });

  test('the trail ends on the page itself, tabs and headings use one word, and the drawing gives the table\'s primary diameter', async ({ page }) => {
    await signUp(page.request, 'trail');
    const made = await createDesign(page.request, 'Harbour Lane trail coil');
    await page.goto(`/designs/${made.id}/build`);
    await expect(page.getByTestId('trail').locator('[aria-current="page"]')).toHaveText('Build sheet');
    await page.goto(`/designs/${made.id}/bench`);
    await expect(page.getByTestId('trail').locator('[aria-current="page"]')).toHaveText('Bench log');
    await page.goto(`/designs/${made.id}/history`);
    const tab = page.getByRole('navigation', { name: 'This design' }).locator('[aria-current="page"]');
    await expect(page.getByRole('heading', { level: 1 })).toHaveText((await tab.textContent())!.trim());
    await expect(page).toHaveTitle(/^Revisions/);
    await page.goto(`/designs/${made.id}`);
    await upToDate(page);
    const table = (await page.locator('[data-result="primary.outerDiameter"]').textContent())!.trim();
    await expect(page.locator('svg').getByText(`primary outside ⌀ ${table}`)).toHaveCount(1);
  });
});
