import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

export type TestServer = {
  url: string;
  dataDir: string;
  /** the server process (for CPU figures in benches) */
  pid: number;
  stop: () => Promise<void>;
  /** SIGKILL to the server and everything it started, as a power cut would; the data folder is kept. */
  kill: () => Promise<void>;
  output: () => string;
};

export type StartOptions = {
  /** Reuse this data folder (and its database) instead of a fresh one, e.g. to restart after a kill. */
  dataDir?: string;
  /** Leave the data folder in place on stop. */
  keepData?: boolean;
  /** Node.js flags for the server process itself (e.g. --cpu-prof when profiling a bench) */
  nodeArgs?: string[];
};

export async function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const s = createServer();
    s.once('error', fail);
    s.listen(0, '127.0.0.1', () => {
      const a = s.address();
      const port = typeof a === 'object' && a ? a.port : 0;
      s.close(() => ok(port));
    });
  });
}

/** Starts the built app through the real start script, on a free port with a fresh file database. */
export async function startServer(extraEnv: Record<string, string> = {}, opts: StartOptions = {}): Promise<TestServer> {
  const root = resolve(import.meta.dirname, '../..');
  const dataDir = opts.dataDir ?? mkdtempSync(join(tmpdir(), 'coilwright-test-'));
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  let log = '';
  const child: ChildProcess = spawn(process.execPath, [...(opts.nodeArgs ?? []), join(root, 'scripts/start.mjs')], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: `file:${join(dataDir, 'test.db')}`,
      DATA_DIR: dataDir,
      COILWRIGHT_SKIP_BUILD: '1',
      COILWRIGHT_AUTH_RATE_LIMIT: '1000',
      // tests render the shared pages when they ask for them; benches and Lighthouse warm them as npm start does
      COILWRIGHT_WARM_PAGES: '0',
      SMTP_URL: '',
      S3_ENDPOINT: '',
      BETTER_AUTH_URL: '',
      BETTER_AUTH_SECRET: '',
      ...extraEnv,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true,
  });
  child.stdout!.on('data', (d) => (log += d));
  child.stderr!.on('data', (d) => (log += d));
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${log}`);
    try {
      const r = await fetch(`${url}/`);
      if (r.status < 500) break;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error(`server did not start in 60 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    dataDir,
    pid: child.pid!,
    output: () => log,
    kill: async () => {
      if (child.exitCode !== null || child.signalCode !== null) return;
      const exited = new Promise((r) => child.once('exit', r));
      try {
        process.kill(-child.pid!, 'SIGKILL');
      } catch {
        /* already gone */
      }
      await exited;
    },
    stop: async () => {
      if (child.exitCode === null && child.signalCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        try {
          process.kill(-child.pid!, 'SIGTERM');
        } catch {
          /* already gone */
        }
        await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
        if (child.exitCode === null) process.kill(-child.pid!, 'SIGKILL');
      }
      if (!opts.keepData) rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
