// Designer page figures in a real browser: first-view JavaScript (gzipped, worker included), JavaScript on
// static pages, and keystroke-to-result latency for a 1000-turn design. Prints figures; asserts nothing.
// Run: COILWRIGHT_DIST=dist npx tsx scripts/bench/designer.ts   (needs a build in that folder)
import { gzipSync } from 'node:zlib';
import { pathToFileURL } from 'node:url';
import { chromium, type Browser, type Page } from 'playwright-core';
import { startServer } from '../../tests/helpers/server';

const CHROMIUM_ARGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const DESIGNER = '/designs/new?example=sign-transformer-toroid';
const STATIC_PAGES = ['/', '/safety', '/methods'];
const KEYSTROKES = 20;

interface JsLoad {
  files: Array<{ url: string; raw: number; gzip: number }>;
  raw: number;
  gzip: number;
}

/** Every JavaScript response a fresh visit loads (page scripts, lazy chunks fetched so far, the worker). */
async function jsOnFirstView(browser: Browser, url: string, ready: (p: Page) => Promise<void>): Promise<JsLoad> {
  const context = await browser.newContext();
  const page = await context.newPage();
  const pending: Array<Promise<{ url: string; raw: number; gzip: number } | null>> = [];
  context.on('response', (res) => {
    const type = res.headers()['content-type'] ?? '';
    if (!/javascript/.test(type) && !/\.m?js(\?|$)/.test(res.url())) return;
    pending.push(
      res.body().then(
        (b) => ({ url: new URL(res.url()).pathname, raw: b.length, gzip: gzipSync(b, { level: 9 }).length }),
        () => null,
      ),
    );
  });
  await page.goto(url, { waitUntil: 'load' });
  await ready(page);
  await page.waitForLoadState('networkidle');
  const files = (await Promise.all(pending)).filter((f): f is NonNullable<typeof f> => f !== null);
  await context.close();
  return { files, raw: files.reduce((a, f) => a + f.raw, 0), gzip: files.reduce((a, f) => a + f.gzip, 0) };
}

async function designerReady(page: Page) {
  await page.waitForSelector('[data-testid="solve-state"]:text("up to date")', { timeout: 30_000 });
}

/** Milliseconds from a key press in the turns field to the loaded frequency on screen changing. */
async function keystrokeLatency(browser: Browser, base: string): Promise<{ samples: number[]; worker: number[] }> {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(base + DESIGNER);
  await designerReady(page);
  const input = page.getByLabel('Secondary turns');
  await input.fill('1000');
  await designerReady(page);
  await input.focus();
  await page.keyboard.press('End');
  const samples: number[] = [];
  const worker: number[] = [];
  for (let i = 0; i < KEYSTROKES; i++) {
    // select the last digit first, so the timed key press is the one that changes the turns (1000 ↔ 1001)
    await page.keyboard.press('Shift+ArrowLeft');
    await page.evaluate(() => {
      const w = window as unknown as { __bench: { t0: number; t1: number; done: Promise<void> } };
      const target = document.querySelector('[data-result="system.resonantFrequency"]')!;
      const field = document.getElementById('f-secondary-turns')!;
      const start = target.textContent;
      let resolve!: () => void;
      w.__bench = { t0: 0, t1: 0, done: new Promise<void>((r) => (resolve = r)) };
      field.addEventListener('keydown', (e) => (w.__bench.t0 = e.timeStamp), { once: true, capture: true });
      const mo = new MutationObserver(() => {
        if (target.textContent !== start) {
          w.__bench.t1 = performance.now();
          mo.disconnect();
          resolve();
        }
      });
      mo.observe(target, { childList: true, characterData: true, subtree: true });
    });
    await page.keyboard.press(i % 2 === 0 ? '1' : '0');
    const ms = await page.evaluate(async () => {
      const w = window as unknown as { __bench: { t0: number; t1: number; done: Promise<void> } };
      await w.__bench.done;
      return w.__bench.t1 - w.__bench.t0;
    });
    samples.push(ms);
    worker.push(Number(await page.getByTestId('solve-state').getAttribute('data-solve-ms')));
    // start each keystroke from idle, past the 150 ms coalescing window
    await page.waitForTimeout(250);
  }
  await context.close();
  return { samples, worker };
}

function stats(xs: number[]): string {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return `median ${at(0.5).toFixed(1)} ms, p90 ${at(0.9).toFixed(1)} ms, max ${s[s.length - 1].toFixed(1)} ms (${s.length} keystrokes)`;
}

const kb = (n: number) => `${(n / 1024).toFixed(1)} KB`;

export async function runDesignerBench(): Promise<void> {
  const server = await startServer();
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: CHROMIUM_ARGS });
  try {
    console.log('designer: first-view JavaScript of /designs/new (gzip -9 of each file, worker included; budget 200 KB)');
    const first = await jsOnFirstView(browser, server.url + DESIGNER, designerReady);
    for (const f of [...first.files].sort((a, b) => b.gzip - a.gzip)) console.log(`  ${kb(f.gzip).padStart(9)}  (${kb(f.raw)} raw)  ${f.url}`);
    console.log(`  total ${kb(first.gzip)} gzipped, ${kb(first.raw)} raw, ${first.files.length} files`);

    console.log('designer: JavaScript loaded by static pages (budget 0)');
    for (const p of STATIC_PAGES) {
      const r = await jsOnFirstView(browser, server.url + p, async () => {});
      console.log(`  ${p.padEnd(10)} ${r.files.length} files, ${kb(r.gzip)} gzipped${r.files.length ? `: ${r.files.map((f) => f.url).join(', ')}` : ''}`);
    }

    console.log('designer: keystroke to updated loaded frequency, 1000-turn design (budget: median 20 ms, p90 33 ms)');
    const lat = await keystrokeLatency(browser, server.url);
    console.log(`  ${stats(lat.samples)}`);
    console.log(`  of which parse + solve inside the worker: ${stats(lat.worker)}`);
  } finally {
    await browser.close();
    await server.stop();
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  runDesignerBench().catch((e) => {
    console.error(e instanceof Error ? e.message : e);
    process.exit(1);
  });
}
