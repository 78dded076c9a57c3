/**
 * npm start: builds when needed, migrates, seeds, starts the local fake mail and S3 servers when no real ones
 * are configured, then serves the app on HOST:PORT. Ctrl-C stops everything it started.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { startFakeMail } from './dev/fake-mail';
import { startFakeS3 } from './dev/fake-s3';

const root = process.env.COILWRIGHT_ROOT || resolve(import.meta.dirname, '..');
process.chdir(root);
process.env.ASTRO_TELEMETRY_DISABLED = '1';
process.env.HOST ||= '127.0.0.1';
process.env.PORT ||= '4321';
// React and the other packages pick their production builds from this, read when they are first imported.
process.env.NODE_ENV ||= 'production';
// The front server below listens; the adapter's entry only hands over its request handler.
process.env.ASTRO_NODE_AUTOSTART = 'disabled';

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const s = statSync(path);
  if (!s.isDirectory()) return s.mtimeMs;
  let newest = 0;
  for (const e of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, e)));
  return newest;
}

// Another build folder may be named for side-by-side work; the default is dist/.
const distDir = join(root, process.env.COILWRIGHT_DIST || 'dist');

function buildIfStale() {
  const entry = join(distDir, 'server/entry.mjs');
  const sources = ['src', 'public', 'astro.config.mjs', 'package.json', 'tsconfig.json'].map((p) => newestMtime(join(root, p)));
  const built = existsSync(entry) ? statSync(entry).mtimeMs : 0;
  if (built > Math.max(...sources)) return;
  console.log('[start] building the app (sources are newer than the build)…');
  const r = spawnSync(process.execPath, [join(root, 'node_modules/astro/astro.js'), 'build', '--outDir', distDir], { stdio: 'inherit', env: process.env });
  if (r.status !== 0) {
    console.error('[start] the build failed; see the messages above.');
    process.exit(1);
  }
}

async function main() {
  if (process.env.COILWRIGHT_SKIP_BUILD !== '1') buildIfStale();

  const stops: Array<() => Promise<void>> = [];
  if (!process.env.SMTP_URL) {
    const mail = await startFakeMail(Number(process.env.COILWRIGHT_DEV_SMTP_PORT || 0));
    process.env.COILWRIGHT_DEV_SMTP_PORT = String(mail.port);
    stops.push(mail.stop);
    console.log(`[start] no SMTP_URL: local fake mail server on 127.0.0.1:${mail.port}; caught mail at /dev/mail`);
  }
  if (!process.env.S3_ENDPOINT) {
    const s3 = await startFakeS3(Number(process.env.COILWRIGHT_DEV_S3_PORT || 0), resolve(process.env.DATA_DIR || 'data', 's3'));
    process.env.COILWRIGHT_DEV_S3_ENDPOINT = s3.endpoint;
    stops.push(s3.stop);
    console.log(`[start] no S3_ENDPOINT: local fake S3 server at ${s3.endpoint}`);
  }

  // Migrate and seed before listening; the app reuses this database through globalThis.
  const { getDb, dbReady } = await import('../src/server/db/index');
  await dbReady();
  const { seedDemo } = await import('./seed-demo');
  await seedDemo(getDb());

  let stopping = false;
  const stopAll = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[start] ${signal}: stopping`);
    await Promise.allSettled(stops.map((s) => s()));
    process.exit(0);
  };
  process.on('SIGINT', () => void stopAll('SIGINT'));
  process.on('SIGTERM', () => void stopAll('SIGTERM'));

  const { env } = await import('../src/server/env');
  const { frontHandler, listen } = await import('./serve/front');
  // The adapter imports a route's module, the actions module and the middleware with import() on every
  // request; each is loaded once, so keep the first promise. The entry puts the actions and middleware
  // loaders on the shared manifest object (Object.assign) and the adapter's pipeline copies them when the
  // entry is evaluated, so they are wrapped by setters placed on the manifest before the entry loads.
  const once = (load: () => Promise<unknown>) => {
    let loaded: Promise<unknown> | undefined;
    return () => (loaded ??= load());
  };
  const manifestFile = readdirSync(join(distDir, 'server')).find((f) => /^manifest_.*\.mjs$/.test(f));
  if (manifestFile) {
    const { manifest } = (await import(pathToFileURL(join(distDir, 'server', manifestFile)).href)) as { manifest?: Record<string, unknown> };
    for (const key of ['actions', 'middleware'] as const) {
      if (!manifest) break;
      let value: unknown = manifest[key];
      Object.defineProperty(manifest, key, {
        configurable: true,
        enumerable: true,
        get: () => value,
        set: (v: unknown) => {
          value = typeof v === 'function' ? once(v as () => Promise<unknown>) : v;
        },
      });
    }
  }
  const entry = (await import(pathToFileURL(join(distDir, 'server/entry.mjs')).href)) as {
    handler: Parameters<typeof frontHandler>[0];
    pageMap?: Map<string, () => Promise<unknown>>;
  };
  for (const [route, load] of entry.pageMap ?? []) entry.pageMap!.set(route, once(load));
  await listen(frontHandler(entry.handler, join(distDir, 'client'), env().TRUSTED_PROXIES), env().HOST, env().PORT);
  console.log(`[start] Coilwright is serving on http://${process.env.HOST}:${process.env.PORT}`);
  if (env().COILWRIGHT_WARM_PAGES === 1 && !process.env.SERVER_CERT_PATH) void warmSharedPages(env().HOST, env().PORT);
}

/**
 * Renders the pages that are the same for every visitor without a session (home, methods, safety, validation)
 * once, in each encoding the page cache keeps, so that no visitor waits for the first render (the validation
 * page computes every reference check).
 */
async function warmSharedPages(host: string, port: number) {
  const { SHARED_PAGES } = await import('../src/server/security/page-cache');
  const name = host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host.includes(':') ? `[${host}]` : host;
  const base = `http://${name}:${port}`;
  try {
    for (const path of SHARED_PAGES) {
      for (const encoding of ['br', 'gzip', 'identity']) await (await fetch(base + path, { headers: { 'accept-encoding': encoding } })).arrayBuffer();
    }
  } catch (e) {
    console.error('[start] could not render the shared pages ahead:', e instanceof Error ? e.message : e);
  }
}

main().catch((e) => {
  console.error('[start] could not start:', e instanceof Error ? e.message : e);
  process.exit(1);
});
