import { expect, test } from '@playwright/test';
import sharp from 'sharp';
import { exampleDesigns } from '../../src/lib/design/examples';

test('the bench page records a measurement with its error, uploads a photo to the gallery, and the build sheet shows the wire to buy', async ({ page }) => {
  const email = `bench-${Date.now()}@example.test`;
  const signUp = await page.request.post('/api/auth/sign-up/email', { data: { name: 'Ada Bench', email, password: 'wind-it-tight-42' } });
  expect(signUp.ok()).toBe(true);
  const design = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
  const created = await page.request.post('/api/v1/designs', { data: { name: 'Workbench coil', design } });
  expect(created.status()).toBe(201);
  const { id, result } = (await created.json()) as { id: string; result: { system: { resonantFrequency: number }; secondary: { wireLength: number } } };

  await page.goto(`/designs/${id}/bench`);
  await expect(page.getByRole('heading', { name: 'Bench log: Workbench coil' })).toBeVisible();

  // 5 % below the prediction, typed in kHz
  const measuredKHz = ((result.system.resonantFrequency * 0.95) / 1e3).toFixed(3);
  await page.getByLabel('What you measured').selectOption('loaded-frequency');
  await page.getByLabel('Value').fill(measuredKHz);
  await page.getByLabel('Unit').selectOption({ label: 'kHz' });
  await page.getByLabel('Date measured').fill('2026-03-14');
  await page.getByRole('button', { name: 'Record measurement' }).click();
  const row = page.getByTestId('bench-table').locator('tr[data-kind="loaded-frequency"]');
  await expect(row).toHaveCount(1);
  const expected = ((Number(measuredKHz) * 1e3) / result.system.resonantFrequency - 1) * 100;
  await expect(row.getByTestId('error-percent')).toHaveText(`−${Math.abs(expected).toFixed(1)} %`);

  // a bad value is named beside its field
  await page.getByLabel('Value').fill('abc');
  await page.getByRole('button', { name: 'Record measurement' }).click();
  await expect(page.getByText('Type the measured value as a number.')).toBeVisible();

  // adopt it: the calibrated tap appears beside the prediction
  await row.getByRole('button', { name: 'Adopt' }).click();
  await expect(page.getByTestId('calibration')).toContainText('set the tap at');

  // a photo made here, uploaded through the gallery
  const png = await sharp({ create: { width: 400, height: 300, channels: 3, background: { r: 30, g: 90, b: 200 } } }).png().toBuffer();
  await page.getByLabel('Photo or instrument file').setInputFiles({ name: 'first-light.png', mimeType: 'image/png', buffer: png });
  await page.getByRole('button', { name: 'Upload' }).click();
  const img = page.getByTestId('gallery').getByRole('img', { name: 'first-light.png' });
  await expect(img).toBeVisible();
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBe(320);

  // a refused upload says why
  await page.getByLabel('Photo or instrument file').setInputFiles({ name: 'notes.exe', mimeType: 'application/octet-stream', buffer: Buffer.from('MZ') });
  await page.getByRole('button', { name: 'Upload' }).click();
  await expect(page.getByRole('alert')).toContainText('not an accepted kind of file');

  // troubleshooting uses the bench log
  await page.getByLabel('Complaint').selectOption('short-sparks');
  await page.getByRole('button', { name: 'Check' }).click();
  await expect(page.locator('[data-rule="rf-ground"]')).toHaveAttribute('data-status', 'unknown');

  await page.goto(`/designs/${id}/build?rpm=40&margin=0.1&every=100`);
  await expect(page.locator('[data-section="secondary"]')).toContainText(`${(result.secondary.wireLength * 1.1).toFixed(1)} m`);
  await expect(page.locator('[data-section="primary"]')).toContainText('Tap for the adopted measurements');
  await page.goto(`/designs/${id}/build?rpm=fast`);
  await expect(page.locator('#sheet-rpm-error')).toContainText('rpm must be a number');
});

test('deleting a bench measurement asks first, and only the confirmed one goes', async ({ page }) => {
  const email = `bench-delete-${Date.now()}@example.test`;
  const signUp = await page.request.post('/api/auth/sign-up/email', { data: { name: 'Ada Bench', email, password: 'wind-it-tight-42' } });
  expect(signUp.ok()).toBe(true);
  const design = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
  const created = await page.request.post('/api/v1/designs', { data: { name: 'Bench delete coil', design } });
  expect(created.status()).toBe(201);
  const { id } = (await created.json()) as { id: string };
  for (const m of [
    { kind: 'bare-frequency', value: 310000, measuredAt: '2026-03-12' },
    { kind: 'secondary-inductance', value: 0.012, measuredAt: '2026-03-13' },
  ]) {
    const r = await page.request.post(`/api/v1/designs/${id}/measurements`, { data: m });
    expect(r.status()).toBe(201);
  }

  await page.goto(`/designs/${id}/bench`);
  const table = page.getByTestId('bench-table');
  await expect(table.locator('tbody tr[data-kind]')).toHaveCount(2);
  // the rows are rendered on the server; the buttons act once the bench log island has hydrated
  await expect(page.locator('astro-island:has([data-testid="bench-table"])')).not.toHaveAttribute('ssr', /.*/);

  // cancelling keeps the row, on the page and on the server
  await table.getByRole('button', { name: /^Delete Resonant frequency, bare secondary/ }).click();
  const dialog = page.getByRole('dialog', { name: 'Delete this measurement?' });
  await expect(dialog).toBeVisible();
  await expect(dialog).toContainText('2026-03-12');
  await dialog.getByRole('button', { name: 'Keep it' }).click();
  await expect(dialog).toBeHidden();
  await expect(table.locator('tbody tr[data-kind]')).toHaveCount(2);

  // confirming deletes that one measurement only
  await table.getByRole('button', { name: /^Delete Resonant frequency, bare secondary/ }).click();
  await dialog.getByRole('button', { name: 'Delete measurement' }).click();
  await expect(table.locator('tr[data-kind="bare-frequency"]')).toHaveCount(0);
  await expect(table.locator('tr[data-kind="secondary-inductance"]')).toHaveCount(1);
  await expect(page.getByRole('status').filter({ hasText: 'Deleted: Resonant frequency, bare secondary' })).toBeVisible();

  const stored = (await (await page.request.get(`/api/v1/designs/${id}/measurements`)).json()) as { measurements: Array<{ kind: string }> };
  expect(stored.measurements.map((m) => m.kind)).toEqual(['secondary-inductance']);
});
