import { expect, test } from '@playwright/test';

test('designer: the field model shows the lumped and field frequencies, the shielding, three modes and the voltage along the winding', async ({ page }) => {
  await page.goto('/designs/new?example=sign-transformer-toroid');
  await expect(page.getByTestId('solve-state')).toHaveText('up to date');
  const field = parseFloat((await page.locator('[data-result="system.resonantFrequency.field"]').textContent())!);
  const lumped = parseFloat((await page.locator('[data-result="system.lumpedResonantFrequency"]').textContent())!);
  // the coil and the toroid shield each other: the structure resonates above the lumped estimate
  expect(field).toBeGreaterThan(lumped * 1.05);
  await expect(page.locator('[data-result="system.fieldCapacitance.interaction"]')).toHaveText(/^−\d+(\.\d)? pF$/);
  await expect(page.locator('[data-result="system.modes"]')).toHaveText(/^\S+ k?Hz, \S+ [kM]?Hz, \S+ [kM]?Hz$/);
  const chart = page.getByTestId('voltage-profile-chart');
  await expect(chart).toBeVisible();
  // the plot is drawn once the chart comes near the screen
  await chart.scrollIntoViewIfNeeded();
  await expect(chart.locator('.recharts-line')).toHaveCount(2);
  // a denser former lowers the frequency
  await page.getByLabel('Form relative permittivity').fill('4');
  await page.getByLabel('Form wall thickness').fill('2 in');
  await expect(page.getByTestId('solve-state')).toHaveText('up to date');
  await expect
    .poll(async () => parseFloat((await page.locator('[data-result="system.resonantFrequency.field"]').textContent())!))
    .toBeLessThan(field);
});
