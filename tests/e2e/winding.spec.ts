import { expect, test, type Page } from '@playwright/test';
import { exampleDesigns } from '../../src/lib/design/examples';

type Result = { secondary: { windingLength: number; inductance: number }; system: { resonantFrequency: number } };
type Session = { id: string; status: string; readings: Array<{ counter: number; flag: { correctedCount: number } | null }>; pauses: Array<{ reason: string; endedAt: string | null }> };

const OFFSET_MM = 38.1; // the default bare form below the first turn, 1.5 in

async function numberIn(page: Page, testId: string): Promise<number> {
  return Number((await page.getByTestId(testId).innerText()).replace(/[^\d.]/g, ''));
}

async function record(page: Page, counter: number, heightMm?: number, datum?: 'from the end of the form' | 'from the first turn') {
  await page.getByLabel('Counter reading').fill(String(counter));
  if (heightMm !== undefined) {
    await page.getByLabel('Measured height (mm)').fill(heightMm.toFixed(1));
    await page.getByRole('radio', { name: datum }).check();
  }
  await page.getByRole('button', { name: 'Record reading' }).click();
}

test('a winding session at 40 rpm catches a counter missing counts, keeps a reading through a dropped connection, and the wound turns become a new revision', async ({ page, context }) => {
  const email = `winder-${Date.now()}@example.test`;
  expect((await page.request.post('/api/auth/sign-up/email', { data: { name: 'Wren Winder', email, password: 'wind-it-tight-42' } })).ok()).toBe(true);
  const design = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
  const created = await page.request.post('/api/v1/designs', { data: { name: 'Jig coil', design } });
  expect(created.status()).toBe(201);
  const { id, result } = (await created.json()) as { id: string; result: Result };
  const pitchMm = (result.secondary.windingLength * 1000) / 1000; // close-wound, 1000 turns
  const sessions = async () => ((await (await page.request.get(`/api/v1/designs/${id}/winding`)).json()) as { sessions: Session[] }).sessions;

  await page.clock.install();
  await page.goto(`/designs/${id}/winding`);
  await expect(page.getByRole('link', { name: 'Winding', exact: true })).toHaveAttribute('aria-current', 'page');

  // start at 40 rpm with 400 m on the spool
  await page.getByLabel('Winder speed (rpm)').fill('40');
  await page.getByLabel('Wire on the spool (m)').fill('400');
  await page.getByRole('button', { name: 'Start winding' }).click();
  await expect(page.getByTestId('live-session')).toBeVisible();
  await expect(page.getByTestId('fig-time-left')).toHaveText(/^2[45] min/); // 1000 turns / 40 rpm = 25 min

  // five minutes at 40 rpm: about 200 turns
  await page.clock.fastForward('05:00');
  await expect.poll(() => numberIn(page, 'fig-turns')).toBeGreaterThanOrEqual(200);
  expect(await numberIn(page, 'fig-turns')).toBeLessThan(215);
  await record(page, 198, 200 * pitchMm, 'from the first turn');
  await expect(page.getByRole('status').filter({ hasText: 'Reading 198 stored.' })).toBeVisible();
  await expect(page.getByTestId('count-agrees')).toContainText('agrees with the height (200');

  // five minutes more: the counter shows 385 while the height, from the form end, holds 410 turns
  await page.clock.fastForward('05:00');
  await record(page, 385, OFFSET_MM + 410 * pitchMm, 'from the end of the form');
  const flag = page.getByTestId('count-flag');
  await expect(flag).toBeVisible();
  await expect(flag).toContainText('Counter 385, but the height holds 410 ±');
  await expect(page.getByTestId('corrected-count')).toHaveText('Corrected count: 410');
  await expect(flag).toContainText('missing counts');
  await expect(flag).toContainText('dwell');

  // pause for a splice: the winding time stands still, then runs again after resuming
  await page.getByRole('button', { name: 'Pause: splice' }).click();
  await expect(page.getByTestId('paused')).toContainText('Paused: Splice');
  // once the server has the pause, its start is fixed: from then on the winding time stands still
  await expect(page.getByTestId('live-session')).toHaveAttribute('data-status', 'paused');
  await page.clock.fastForward('00:05');
  const before = await page.getByTestId('fig-elapsed').innerText();
  await page.clock.fastForward('03:00');
  await expect(page.getByTestId('fig-elapsed')).toHaveText(before);
  await page.getByRole('button', { name: 'Resume winding' }).click();
  await expect(page.getByTestId('live-session')).toHaveAttribute('data-status', 'running');
  await page.clock.fastForward('02:00');
  await expect(page.getByTestId('fig-elapsed')).not.toHaveText(before);

  // the connection drops: the reading is kept on the device
  await context.setOffline(true);
  await record(page, 500);
  await expect(page.getByRole('status').filter({ hasText: 'No connection: reading 500 is kept on this device' })).toBeVisible();
  await expect(page.getByTestId('pending-readings')).toContainText('1 reading is waiting for the connection');
  expect((await sessions())[0].readings.map((r) => r.counter)).toEqual([198, 385]);

  // back online: sent once, and sending again adds nothing
  await context.setOffline(false);
  await expect(page.getByTestId('pending-readings')).toHaveCount(0);
  await expect(page.getByTestId('readings-table').locator('tr[data-reading]')).toHaveCount(3);
  await page.evaluate(() => window.dispatchEvent(new Event('online')));
  await page.clock.fastForward('00:30');
  const afterOnline = (await sessions())[0];
  expect(afterOnline.readings.map((r) => r.counter)).toEqual([198, 385, 500]);
  expect(afterOnline.pauses).toEqual([expect.objectContaining({ reason: 'splice', endedAt: expect.any(String) })]);

  // the last turn: counter 1000, the height holds 1030
  await page.clock.fastForward('15:00');
  await record(page, 1000, 1030 * pitchMm, 'from the first turn');
  await expect(page.getByTestId('corrected-count')).toHaveText('Corrected count: 1030');

  // finish with what was wound, then adopt it
  await page.getByLabel('Turns wound').fill('1030');
  await page.getByLabel('Winding length, measured (mm)').fill((1030 * pitchMm + 3).toFixed(1));
  await page.getByRole('button', { name: 'Finish session' }).click();
  const done = page.getByTestId('finished-session');
  await expect(done).toBeVisible();
  await expect(done.getByRole('heading', { level: 3 })).toContainText('1030 turns over');
  await expect(page.getByTestId('finished-flags')).toContainText('counter 385, height 410');
  await expect(done.getByRole('link', { name: 'Export CSV' })).toHaveAttribute('href', /\/export\.csv$/);

  await done.getByRole('button', { name: 'Adopt into a new revision' }).click();
  await expect(page.getByTestId('adopted')).toContainText('revision 2');
  const table = page.getByTestId('adopt-results');
  const freq = table.locator('tr[data-figure="loaded-frequency"] td');
  await expect(freq).toHaveCount(2);
  expect(await freq.nth(0).innerText()).not.toBe(await freq.nth(1).innerText());

  const latest = (await (await page.request.get(`/api/v1/designs/${id}`)).json()) as { revision: number; design: { secondary: { turns: number } }; result: Result };
  expect(latest.revision).toBe(2);
  expect(latest.design.secondary.turns).toBe(1030);
  expect(latest.result.secondary.inductance).toBeGreaterThan(result.secondary.inductance);
  expect(latest.result.system.resonantFrequency).toBeLessThan(result.system.resonantFrequency);
  const log = (await (await page.request.get(`/api/v1/designs/${id}/measurements`)).json()) as { measurements: Array<{ kind: string; value: number }> };
  expect(log.measurements.find((m) => m.kind === 'wound-turns')?.value).toBe(1030);
});
