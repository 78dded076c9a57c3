// Makes sure the browser the Playwright suite drives is present before that suite starts.
// Looks for Debian's Chromium at /usr/bin/chromium (COILWRIGHT_CHROMIUM names another location). When it is
// missing and this process may install system packages (root, apt-get on PATH), installs Debian's `chromium`
// and the fonts the tests use; otherwise prints one line naming the command to run and exits 1.
// Never downloads a browser of its own.
import { accessSync, constants } from 'node:fs';
import { delimiter, join } from 'node:path';
import { spawnSync } from 'node:child_process';

const PACKAGES = ['chromium', 'fonts-dejavu-core'];
const browser = process.env.COILWRIGHT_CHROMIUM || '/usr/bin/chromium';

function executable(path) {
  try {
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** The first `name` on PATH that can be run, or null. */
function onPath(name) {
  for (const dir of (process.env.PATH ?? '').split(delimiter)) {
    if (dir && executable(join(dir, name))) return join(dir, name);
  }
  return null;
}

function run(cmd, args) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  return r.status === 0;
}

if (executable(browser)) {
  console.log(`Browser: ${browser}`);
  process.exit(0);
}

const aptGet = onPath('apt-get');
const root = typeof process.getuid === 'function' && process.getuid() === 0;
if (root && aptGet) {
  console.log(`Browser: ${browser} is missing; installing Debian's ${PACKAGES.join(' and ')} (apt-get update, then apt-get install -y ${PACKAGES.join(' ')}).`);
  const ok = run(aptGet, ['update', '-qq']) && run(aptGet, ['install', '-y', '-qq', ...PACKAGES]);
  if (ok && executable(browser)) {
    console.log(`Browser: installed, ${browser}`);
    process.exit(0);
  }
  console.log(`Browser: installing ${PACKAGES.join(' ')} did not give ${browser}; the browser tests cannot run (counted as failed).`);
  process.exit(1);
}

console.log(
  `Browser: ${browser} is missing. Run \`sudo apt-get install -y ${PACKAGES.join(' ')}\` and then \`npm test\` again; the browser tests are skipped and counted as failed.`,
);
process.exit(1);
