// Usage: npm run -s solve -- FILE.json   (or "-" for stdin)
// Prints the solver's result as JSON on stdout; invalid input exits 1 with the reasons on stderr.
import { readFileSync } from 'node:fs';
import { formatIssues, parseDesign } from '../src/lib/design';
import { solve } from '../src/solver';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

function readInput(arg: string | undefined): string {
  if (!arg) fail('usage: npm run -s solve -- FILE.json   (or "-" to read the design from stdin)');
  try {
    return arg === '-' ? readFileSync(0, 'utf8') : readFileSync(arg, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    fail(code === 'ENOENT' ? `cannot read ${arg}: no such file` : `cannot read ${arg === '-' ? 'stdin' : arg}: ${(e as Error).message}`);
  }
}

const text = readInput(process.argv[2]);
let json: unknown;
try {
  json = JSON.parse(text);
} catch (e) {
  fail(`invalid design: the input is not valid JSON (${(e as Error).message})`);
}
const parsed = parseDesign(json);
if (!parsed.ok) fail(`invalid design:\n${formatIssues(parsed.issues).replace(/^/gm, '  ')}`);
process.stdout.write(`${JSON.stringify(solve(parsed.design), null, 2)}\n`);
