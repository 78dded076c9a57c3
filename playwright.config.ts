import { defineConfig } from '@playwright/test';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const port = Number(process.env.E2E_PORT ?? 4391);
const dataDir = mkdtempSync(join(tmpdir(), 'coilwright-e2e-'));
export const baseURL = `http://127.0.0.1:${port}`;

export default defineConfig({
  testDir: 'tests/e2e',
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  workers: 1,
  // One retry absorbs a dropped keep-alive connection on a loaded machine; a real failure fails twice.
  retries: 1,
  outputDir: 'test-results/playwright-artifacts',
  reporter: [['list'], ['json', { outputFile: process.env.PW_JSON ?? 'test-results/playwright.json' }]],
  use: {
    baseURL,
    trace: 'off',
    launchOptions: {
      executablePath: process.env.COILWRIGHT_CHROMIUM || '/usr/bin/chromium',
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
    },
  },
  webServer: {
    command: 'node scripts/start.mjs',
    url: `${baseURL}/`,
    timeout: 120_000,
    reuseExistingServer: false,
    stdout: 'ignore',
    stderr: 'pipe',
    env: {
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: `file:${join(dataDir, 'e2e.db')}`,
      DATA_DIR: dataDir,
      COILWRIGHT_SKIP_BUILD: '1',
      COILWRIGHT_AUTH_RATE_LIMIT: '1000',
      BETTER_AUTH_URL: `http://127.0.0.1:${port}`,
    },
  },
});
