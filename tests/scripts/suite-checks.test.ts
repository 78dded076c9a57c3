import { afterEach, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '../..');
const temps: string[] = [];
afterEach(() => {
  for (const t of temps.splice(0)) rmSync(t, { recursive: true, force: true });
});

/**
 * A PATH holding only node and the few tools test-all.sh uses, so no apt-get can be found: this process may
 * not install system packages. `extra` adds fake executables (name → shell script body).
 */
function fakePath(extra: Record<string, string> = {}): { dir: string; bin: string } {
  const dir = mkdtempSync(join(tmpdir(), 'coilwright-path-'));
  temps.push(dir);
  const bin = join(dir, 'bin');
  mkdirSync(bin);
  symlinkSync(process.execPath, join(bin, 'node'));
  for (const tool of ['dirname', 'mkdir', 'rm', 'tail', 'cat', 'chmod']) {
    const found = ['/usr/bin', '/bin'].map((d) => join(d, tool)).find((p) => existsSync(p));
    if (found) symlinkSync(found, join(bin, tool));
  }
  for (const [name, body] of Object.entries(extra)) {
    writeFileSync(join(bin, name), `#!/bin/sh\n${body}\n`);
    chmodSync(join(bin, name), 0o755);
  }
  return { dir, bin };
}

function run(cmd: string, args: string[], env: Record<string, string>) {
  const r = spawnSync(cmd, args, { cwd: root, env: { HOME: tmpdir(), ...env }, encoding: 'utf8', timeout: 60_000 });
  return { status: r.status, out: `${r.stdout}${r.stderr}` };
}

describe('scripts/check-browser.mjs', () => {
  it('check-browser with no browser and no way to install prints one line naming the command and exits 1', () => {
    const { dir, bin } = fakePath();
    const browser = join(dir, 'chromium');
    const r = run(process.execPath, ['scripts/check-browser.mjs'], { PATH: bin, COILWRIGHT_CHROMIUM: browser });
    expect(r.status).toBe(1);
    const lines = r.out.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(lines[0]).toContain(`${browser} is missing`);
    expect(lines[0]).toContain('apt-get install -y chromium fonts-dejavu-core');
  });

  it('test-all.sh with no browser skips the browser suite and counts it as failed in the final line', () => {
    const { dir, bin } = fakePath();
    const r = run('/bin/bash', ['scripts/test-all.sh'], {
      PATH: bin,
      COILWRIGHT_CHROMIUM: join(dir, 'chromium'),
      COILWRIGHT_STAGES: 'browser',
      PW_JSON: join(dir, 'pw.json'),
    });
    expect(r.status, r.out).toBe(1);
    expect(r.out).toContain('apt-get install -y chromium fonts-dejavu-core');
    expect(r.out).not.toContain('== browser tests (Playwright');
    expect(r.out.trim().split('\n').at(-1)).toBe('0 passed, 1 failed');
  });

  it('check-browser with the browser present proceeds without installing anything', () => {
    const calls = join(tmpdir(), `coilwright-apt-calls-${process.pid}`);
    temps.push(calls);
    const { dir, bin } = fakePath({ 'apt-get': `echo "$@" >> ${calls}` });
    const browser = join(dir, 'chromium');
    writeFileSync(browser, '#!/bin/sh\nexit 0\n');
    chmodSync(browser, 0o755);
    const r = run(process.execPath, ['scripts/check-browser.mjs'], { PATH: bin, COILWRIGHT_CHROMIUM: browser });
    expect(r.status, r.out).toBe(0);
    expect(r.out.trim()).toBe(`Browser: ${browser}`);
    expect(existsSync(calls)).toBe(false);
  });

  it('check-browser present as a plain file that cannot be run counts as missing', () => {
    const { dir, bin } = fakePath();
    const browser = join(dir, 'chromium');
    writeFileSync(browser, 'not a program');
    const r = run(process.execPath, ['scripts/check-browser.mjs'], { PATH: bin, COILWRIGHT_CHROMIUM: browser });
    expect(r.status).toBe(1);
    expect(r.out).toContain('is missing');
  });

  it.runIf(process.getuid?.() === 0)('check-browser as root with apt-get installs chromium and the fonts non-interactively, saying so', () => {
    const { dir, bin } = fakePath();
    const browser = join(dir, 'chromium');
    const calls = join(dir, 'apt-calls');
    // a fake apt-get that records its arguments and environment, and "installs" the browser
    writeFileSync(
      join(bin, 'apt-get'),
      `#!/bin/sh\necho "$DEBIAN_FRONTEND $@" >> ${calls}\ncase "$1" in install) printf '#!/bin/sh\\n' > ${browser}; chmod 755 ${browser};; esac\n`,
    );
    chmodSync(join(bin, 'apt-get'), 0o755);
    const r = run(process.execPath, ['scripts/check-browser.mjs'], { PATH: bin, COILWRIGHT_CHROMIUM: browser });
    expect(r.status, r.out).toBe(0);
    expect(r.out).toContain("installing Debian's chromium and fonts-dejavu-core");
    expect(readFileSync(calls, 'utf8').trim().split('\n')).toEqual([
      'noninteractive update -qq',
      'noninteractive install -y -qq chromium fonts-dejavu-core',
    ]);
  });
});

describe('scripts/check-node.mjs', () => {
  const satisfies = (version: string, range: string) =>
    run(process.execPath, ['--input-type=module', '-e', `import { satisfies } from './scripts/check-node.mjs'; console.log(satisfies(${JSON.stringify(version)}, ${JSON.stringify(range)}))`], {
      PATH: '',
    }).out.trim();

  it('check-node reads the engines range: 20.19 and later 20.x pass, 20.18 and 21 do not', () => {
    expect(satisfies('v20.19.0', '>=20.19 <21')).toBe('true');
    expect(satisfies('v20.20.2', '>=20.19 <21')).toBe('true');
    expect(satisfies('v20.18.3', '>=20.19 <21')).toBe('false');
    expect(satisfies('v21.0.0', '>=20.19 <21')).toBe('false');
    expect(satisfies('v18.20.0', '>=20.19 <21')).toBe('false');
  });

  it('check-node passes the Node.js running this suite, which package.json engines admits', () => {
    const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
    expect(pkg.engines.node).toBe('>=20.19 <21');
    expect(run(process.execPath, ['scripts/check-node.mjs'], { PATH: '' }).status).toBe(0);
  });
});
