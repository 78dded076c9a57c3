// Checks the running Node.js against package.json "engines.node" before `npm start` and `npm test`.
// Plain JavaScript with no dependencies, so it runs before anything else is loaded. Understands ranges of
// space-separated comparators such as ">=20.19 <21".
import { readFileSync } from 'node:fs';

const pkg = JSON.parse(readFileSync(new URL('../package.json', import.meta.url), 'utf8'));
const range = pkg.engines?.node;

/** "20.19" → [20, 19, 0] */
function parts(version) {
  const [a = 0, b = 0, c = 0] = String(version).replace(/^v/, '').split('.').map((n) => Number.parseInt(n, 10) || 0);
  return [a, b, c];
}

function compare(x, y) {
  for (let i = 0; i < 3; i++) if (x[i] !== y[i]) return x[i] < y[i] ? -1 : 1;
  return 0;
}

/** True when `version` satisfies every comparator of `spec`. */
export function satisfies(version, spec) {
  const v = parts(version);
  return spec
    .trim()
    .split(/\s+/)
    .every((comparator) => {
      const m = /^(>=|<=|>|<|=)?v?([\d.]+)$/.exec(comparator);
      if (!m) throw new Error(`package.json engines.node: cannot read "${comparator}"`);
      const c = compare(v, parts(m[2]));
      switch (m[1] ?? '=') {
        case '>=': return c >= 0;
        case '<=': return c <= 0;
        case '>': return c > 0;
        case '<': return c < 0;
        default: return c === 0;
      }
    });
}

if (range && !satisfies(process.version, range)) {
  console.error(`Coilwright needs Node.js ${range} (package.json "engines"); this is Node.js ${process.version}. Install a matching Node.js 20 release and run the command again.`);
  process.exit(1);
}
