import { beforeAll, describe, expect, it } from 'vitest';
import { spawn } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { exampleDesigns, parseDesign } from '../../src/lib/design';
import { solve } from '../../src/solver';

const root = join(__dirname, '..', '..');
const dir = mkdtempSync(join(tmpdir(), 'coilwright-cli-'));

interface Run {
  code: number | null;
  stdout: string;
  stderr: string;
}

function run(args: string[], stdin?: string): Promise<Run> {
  return new Promise((resolve, reject) => {
    const child = spawn('npx', ['tsx', 'scripts/solve.ts', ...args], { cwd: root });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (b: Buffer) => (stdout += b.toString()));
    child.stderr.on('data', (b: Buffer) => (stderr += b.toString()));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(stdin ?? '');
  });
}

const design = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design;
const expected = (() => {
  const p = parseDesign(design);
  if (!p.ok) throw new Error('invalid example');
  return solve(p.design);
})();

// every case is its own tsx process; they start together because each takes seconds to boot
const runs: Record<string, Run> = {};
beforeAll(async () => {
  const file = join(dir, 'design.json');
  writeFileSync(file, JSON.stringify(design));
  const bad = { ...design, secondary: { ...design.secondary, formDiameter: '3 kg', turn: 5 } };
  const cases: Record<string, Promise<Run>> = {
    file: run([file]),
    stdin: run(['-'], JSON.stringify(design)),
    invalid: run(['-'], JSON.stringify(bad)),
    notJson: run(['-'], '{ secondary: '),
    missing: run([join(dir, 'nope.json')]),
    usage: run([]),
  };
  for (const [k, p] of Object.entries(cases)) runs[k] = await p;
}, 240000);

describe('scripts/solve.ts (npm run -s solve)', () => {
  it('prints the result JSON, and only that, for a file', () => {
    expect(runs.file.code).toBe(0);
    expect(JSON.parse(runs.file.stdout)).toEqual(expected);
  });

  it('reads the design from stdin with "-"', () => {
    expect(runs.stdin.code).toBe(0);
    expect(JSON.parse(runs.stdin.stdout)).toEqual(expected);
  });

  it('exits 1 with "path: message" lines on stderr for an invalid design, nothing on stdout', () => {
    const r = runs.invalid;
    expect(r.code).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr).toContain('secondary.formDiameter: expected a length such as "4 in" or "0.1 m", got a mass');
    expect(r.stderr).toContain('secondary.turn: is not a known field');
    expect(r.stderr).not.toMatch(/at .*\.ts:\d+/);
  });

  it('exits 1 with a clear message for text that is not JSON', () => {
    expect(runs.notJson.code).toBe(1);
    expect(runs.notJson.stderr).toMatch(/not valid JSON/);
  });

  it('exits 1 with a clear message for a missing file', () => {
    expect(runs.missing.code).toBe(1);
    expect(runs.missing.stderr).toMatch(/no such file/);
  });

  it('prints its usage without an argument', () => {
    expect(runs.usage.code).toBe(1);
    expect(runs.usage.stderr).toMatch(/usage/);
  });
});
