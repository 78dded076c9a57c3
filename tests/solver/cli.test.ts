import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { exampleDesigns, parseDesign } from '../../src/lib/design';
import { solve } from '../../src/solver';

const root = join(__dirname, '..', '..');
const dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-'));

function run(args: string[], stdin?: string) {
  const r = spawnSync('npx', ['tsx', 'scripts/solve.ts', ...args], { cwd: root, input: stdin, encoding: 'utf8', timeout: 60000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

const design = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
const expected = (() => {
  const p = parseDesign(design);
  if (!p.ok) throw new Error('invalid example');
  return solve(p.design);
})();

// each case starts a fresh tsx process, which takes seconds on a loaded machine
describe('scripts/solve.ts (npm run -s solve)', { timeout: 90000 }, () => {
  it('prints the result JSON, and only that, for a file', () => {
    const file = join(dir, 'design.json');
    writeFileSync(file, JSON.stringify(design));
    const r = run([file]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual(expected);
  });

  it('reads the design from stdin with "-"', () => {
    const r = run(['-'], JSON.stringify(design));
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout).tuning.tapTurns).toBe(expected.tuning!.tapTurns);
  });

  it('exits 1 with "path: message" lines on stderr for an invalid design, nothing on stdout', () => {
    const bad = { ...design, secondary: { ...design.secondary, formDiameter: '3 kg', turn: 5 } };
    const r = run(['-'], JSON.stringify(bad));
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('secondary.formDiameter: expected a length such as "4 in" or "0.1 m", got a mass');
    expect(r.stderr).toContain('secondary.turn: is not a known field');
    expect(r.stderr).not.toMatch(/at .*\.ts:\d+/);
  });

  it('exits 1 with a clear message for text that is not JSON', () => {
    const r = run(['-'], '{ secondary: ');
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/not valid JSON/);
  });

  it('exits 1 with a clear message for a missing file', () => {
    const r = run([join(dir, 'nope.json')]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/no such file/);
  });

  it('prints its usage without an argument', () => {
    const r = run([]);
    expect(r.code).toBe(1);
    expect(r.stderr).toMatch(/usage/);
  });
});
