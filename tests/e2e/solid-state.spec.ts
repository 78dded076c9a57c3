import { expect, test } from '@playwright/test';

test('a builder picks a solid-state supply, enters bus voltage and on-time, and sees the burst instead of spark-gap figures', async ({ page }) => {
  await page.goto('/designs/new?example=sign-transformer-toroid');
  await expect(page.locator('[data-result="system.resonantFrequency"]')).toHaveText(/\d+(\.\d+)? kHz/);
  // the spark-gap coil shows its firing energy and bleeders to begin with
  await expect(page.locator('[data-result="supply.energyPerBang"]')).toBeVisible();

  await page.locator('#part-supply select').first().selectOption('solid-state');
  await expect(page.getByLabel('Interrupter on-time')).toBeVisible();
  await page.getByLabel('DC bus voltage').fill('340 V');
  await page.getByLabel('Interrupter on-time').fill('80 us');
  await expect(page.getByTestId('solve-state')).toHaveText('up to date');

  const peak = page.locator('[data-result="drive.peakPrimaryCurrent"]');
  await expect(peak).toHaveText(/\d+(\.\d+)? k?A$/);
  await expect(page.locator('[data-result="drive.capacitorPeakVoltage"]')).toHaveText(/V$/);
  await expect(page.locator('[data-result="drive.secondaryPeakVoltage"]')).toBeVisible();
  await expect(page.locator('[data-safety="bus"]').first()).toBeVisible();

  // no ½CV² of the bus, no charged-bank bleeders, no rating over the bus
  await expect(page.locator('[data-result="supply.energyPerBang"]')).toHaveCount(0);
  await expect(page.getByText('Energy per firing')).toHaveCount(0);
  await expect(page.locator('[data-result="tank.bleeder"]')).toHaveCount(0);
  await expect(page.getByText('Bleeder across each capacitor')).toHaveCount(0);
  await expect(page.locator('[data-result="tank.ratingMargin"]')).toHaveCount(0);

  // a longer on-time grows the current
  const before = parseFloat((await peak.textContent())!);
  await page.getByLabel('Interrupter on-time').fill('120 us');
  await expect.poll(async () => parseFloat((await peak.textContent()) ?? '0')).toBeGreaterThan(before);

  await page.getByRole('heading', { name: 'Charts' }).scrollIntoViewIfNeeded();
  const chart = page.getByTestId('burst-chart');
  await chart.scrollIntoViewIfNeeded();
  await expect(chart.locator('svg.recharts-surface').first()).toBeVisible({ timeout: 20_000 });
  await expect(page.getByTestId('peak-current-chart').locator('svg.recharts-surface')).toBeVisible();
});
