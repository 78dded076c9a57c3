// npm run lighthouse: Lighthouse 12.2.3 in Debian's Chromium against a fresh server (built app, temp database):
// home, the designer (/designs/new, signed in), a read-only share page and /validation, on the mobile and the
// desktop settings. Prints the performance and accessibility scores, the layout shift, and every audit of
// those two categories that scored below 1. Asserts nothing.
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import lighthouse from 'lighthouse';
import desktopConfig from 'lighthouse/core/config/desktop-config.js';
import { freePort, startServer } from '../tests/helpers/server';
import { Client } from '../tests/helpers/client';
import { exampleDesigns } from '../src/lib/design/examples';

const CHROME = process.env.CHROME_PATH || '/usr/bin/chromium';
// The flags of playwright.config.ts.
const FLAGS = ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];

type Lhr = {
  categories: Record<string, { score: number | null; auditRefs: Array<{ id: string; weight: number }> }>;
  audits: Record<string, { id: string; title: string; score: number | null; scoreDisplayMode: string; displayValue?: string; numericValue?: number }>;
};

async function launchChrome(): Promise<{ port: number; stop: () => void }> {
  const port = await freePort();
  const profile = mkdtempSync(join(tmpdir(), 'coilwright-lh-'));
  const child = spawn(CHROME, [...FLAGS, `--remote-debugging-port=${port}`, `--user-data-dir=${profile}`, 'about:blank'], { stdio: 'ignore', detached: true });
  const deadline = Date.now() + 20_000;
  for (;;) {
    try {
      if ((await fetch(`http://127.0.0.1:${port}/json/version`)).ok) break;
    } catch {
      /* not up yet */
    }
    if (Date.now() > deadline) throw new Error('Chromium did not open its debugging port');
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    port,
    stop: () => {
      try {
        process.kill(-child.pid!, 'SIGKILL');
      } catch {
        /* gone */
      }
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

function belowOne(lhr: Lhr, category: string): string[] {
  return lhr.categories[category].auditRefs
    .map((ref) => ({ ref, a: lhr.audits[ref.id] }))
    .filter(({ a }) => a && a.score !== null && a.score < 1 && (a.scoreDisplayMode === 'numeric' || a.scoreDisplayMode === 'binary' || a.scoreDisplayMode === 'metricSavings'))
    .map(({ ref, a }) => `${a.id} ${a.score!.toFixed(2)}${a.displayValue ? ` (${a.displayValue})` : ''}${ref.weight ? ` w${ref.weight}` : ''}`);
}

async function main() {
  const server = await startServer({ COILWRIGHT_SOLVE_RATE_LIMIT: '100000', COILWRIGHT_WARM_PAGES: '1' });
  const chrome = await launchChrome();
  try {
    const c = new Client(server.url);
    await c.signUp('Lighthouse Lis', `lighthouse-${process.pid}@example.test`);
    const { id } = (await (await c.post('/api/v1/designs', { name: 'Harbour Lane show coil', design: exampleDesigns[1].design })).json()) as { id: string };
    const { token } = (await (await c.post(`/api/v1/designs/${id}/share`)).json()) as { token: string };
    const cookie = [...c.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    const pages = [
      { name: 'home', path: '/', cookie: false },
      { name: 'designer (signed in)', path: '/designs/new', cookie: true },
      { name: 'share page', path: `/s/${token}`, cookie: false },
      { name: 'validation', path: '/validation', cookie: false },
    ];
    console.log(`Lighthouse 12.2.3, ${CHROME}, ${server.url}`);
    for (const p of pages) {
      for (const form of ['mobile', 'desktop'] as const) {
        const flags = {
          port: chrome.port,
          output: 'json' as const,
          logLevel: 'error' as const,
          onlyCategories: ['performance', 'accessibility'],
          extraHeaders: p.cookie ? { Cookie: cookie } : undefined,
        };
        const result = await lighthouse(server.url + p.path, flags, form === 'desktop' ? desktopConfig : undefined);
        const lhr = result?.lhr as unknown as Lhr | undefined;
        if (!lhr) {
          console.log(`${p.name} ${form}: no result`);
          continue;
        }
        const score = (k: string) => Math.round((lhr.categories[k].score ?? 0) * 100);
        const cls = lhr.audits['cumulative-layout-shift']?.numericValue ?? NaN;
        console.log(`${p.name} (${p.path.startsWith('/s/') ? '/s/:token' : p.path}), ${form}: performance ${score('performance')}, accessibility ${score('accessibility')}, CLS ${cls.toFixed(3)}`);
        const low = [...belowOne(lhr, 'performance'), ...belowOne(lhr, 'accessibility')];
        if (low.length) console.log(`  below 1: ${low.join('; ')}`);
      }
    }
  } finally {
    chrome.stop();
    await server.stop();
  }
}

await main();
if (resolve(process.argv[1] ?? '') === resolve(import.meta.filename)) process.exit(0);
