import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { ESLint, type Linter } from 'eslint';

// The layer boundaries are enforced by ESLint (eslint.config.js, run by `npm test`). These tests prove the
// configuration catches each kind of violation, planted in files that do not exist on disk (lintText with a
// filePath inside the layer) or, for an import cycle, in real files under an ignored temporary folder.

const root = resolve(import.meta.dirname, '../..');
const BOUNDARY_RULES = [
  'import-x/no-restricted-paths',
  'import-x/no-cycle',
  'no-restricted-imports',
  'no-restricted-globals',
  'no-restricted-syntax',
];

let eslint: ESLint;
let cycleDir: string;

beforeAll(() => {
  eslint = new ESLint({ cwd: root, overrideConfigFile: join(root, 'eslint.config.js') });
  // Under the repository so the project's resolver and config apply; the folder name matches the config's
  // ignore pattern '.tmp-*/**', so a concurrent `eslint .` or tsc never sees it.
  cycleDir = mkdtempSync(join(root, '.tmp-boundaries-'));
});
afterAll(() => {
  if (cycleDir) rmSync(cycleDir, { recursive: true, force: true });
});

/** The boundary messages ESLint gives for `code` placed at `file` (relative to the repository). */
async function boundaryMessages(file: string, code: string): Promise<Linter.LintMessage[]> {
  const [result] = await eslint.lintText(code, { filePath: join(root, file) });
  expect(result, `${file} was linted`).toBeDefined();
  expect(result.messages.filter((m) => m.fatal), `${file} parses`).toEqual([]);
  return result.messages.filter((m) => m.ruleId && BOUNDARY_RULES.includes(m.ruleId));
}

function describeMessages(ms: Linter.LintMessage[]): string {
  return ms.map((m) => `${m.line}:${m.column} ${m.ruleId}: ${m.message}`).join('\n') || '(none)';
}

describe('layer boundaries (eslint.config.js)', () => {
  const planted: Array<{ what: string; file: string; code: string; rule: string; says: RegExp }> = [
    {
      what: 'src/lib importing src/server by a relative path',
      file: 'src/lib/design/planted-boundary.ts',
      code: "import { db } from '../../server/db';\nexport const x = db;\n",
      rule: 'import-x/no-restricted-paths',
      says: /never imports src\/server/,
    },
    {
      what: 'an island importing the server through the ~ alias',
      file: 'src/islands/designer/PlantedBoundary.tsx',
      code: "import { db } from '~/server/db';\nexport const x = db;\n",
      rule: 'import-x/no-restricted-paths',
      says: /never imports src\/server/,
    },
    {
      what: 'a component importing the server',
      file: 'src/components/planted-boundary.ts',
      code: "export { db } from '../server/db';\n",
      rule: 'import-x/no-restricted-paths',
      says: /never imports src\/server/,
    },
    {
      what: 'the solver importing react',
      file: 'src/solver/planted-boundary.ts',
      code: "import { useState } from 'react';\nexport const x = useState;\n",
      rule: 'no-restricted-imports',
      says: /only its own modules and pure math packages/,
    },
    {
      what: 'the solver importing src/lib',
      file: 'src/solver/planted-boundary.ts',
      code: "import { safeNext } from '../lib/safe-next';\nexport const x = safeNext;\n",
      rule: 'import-x/no-restricted-paths',
      says: /The solver is pure/,
    },
    {
      what: 'the solver reading the clock',
      file: 'src/solver/secondary/planted-boundary.ts',
      code: 'export const stamp = (): number => Date.now();\n',
      rule: 'no-restricted-syntax',
      says: /no clock, randomness/,
    },
    {
      what: 'the solver drawing random numbers',
      file: 'src/solver/planted-boundary.ts',
      code: 'export const jitter = (): number => Math.random();\n',
      rule: 'no-restricted-syntax',
      says: /no clock, randomness/,
    },
    {
      what: 'the solver calling the network',
      file: 'src/solver/planted-boundary.ts',
      code: "export const load = () => fetch('/x');\n",
      rule: 'no-restricted-globals',
      says: /no clock, randomness/,
    },
    {
      what: 'an endpoint importing the database directly',
      file: 'src/pages/api/v1/planted-boundary.ts',
      code: "import { db } from '../../../server/db';\nexport const GET = () => new Response(String(Boolean(db)));\n",
      rule: 'import-x/no-restricted-paths',
      says: /reach storage only through src\/server\/services/,
    },
    {
      what: 'the server importing a component',
      file: 'src/server/planted-boundary.ts',
      code: "export * from '../components/ui/useHydrated';\n",
      rule: 'import-x/no-restricted-paths',
      says: /does not import UI code/,
    },
  ];

  it.each(planted.map((p) => [p.what, p] as const))('ESLint fails on %s', async (_what, p) => {
    const ms = await boundaryMessages(p.file, p.code);
    const hit = ms.filter((m) => m.ruleId === p.rule && m.severity === 2);
    expect(hit.length, `${p.file}: expected ${p.rule}, got\n${describeMessages(ms)}`).toBeGreaterThan(0);
    expect(hit[0].message).toMatch(p.says);
  });

  it('ESLint passes the allowed imports: lib from the solver, the solver from its own modules and @stdlib', async () => {
    expect(await boundaryMessages('src/lib/design/planted-boundary.ts', "export { solve } from '../../solver';\n")).toEqual([]);
    expect(
      await boundaryMessages(
        'src/solver/secondary/planted-boundary.ts',
        "import ellipk from '@stdlib/math-base-special-ellipk';\nimport { MU_0 } from '../constants';\nexport const k = (m: number): number => MU_0 * ellipk(m);\n",
      ),
    ).toEqual([]);
    expect(await boundaryMessages('src/pages/api/v1/planted-boundary.ts', "export * from '../../../server/http';\n")).toEqual([]);
  });

  it('ESLint fails on a two-file import cycle', async () => {
    writeFileSync(join(cycleDir, 'first.ts'), "import { second } from './second';\nexport const first = (): number => second() + 1;\n");
    writeFileSync(join(cycleDir, 'second.ts'), "import { first } from './first';\nexport const second = (): number => (first.length > 0 ? 1 : 0);\n");
    // The folder is ignored by the project's config (so nobody else lints it); lint it here with ignores off.
    const linter = new ESLint({ cwd: root, overrideConfigFile: join(root, 'eslint.config.js'), ignore: false });
    const results = await linter.lintFiles([cycleDir]);
    expect(results.map((r) => relative(cycleDir, r.filePath)).sort()).toEqual(['first.ts', 'second.ts']);
    for (const r of results) {
      const cycles = r.messages.filter((m) => m.ruleId === 'import-x/no-cycle');
      expect(cycles.length, `${r.filePath}:\n${describeMessages(r.messages)}`).toBe(1);
      expect(cycles[0].severity).toBe(2);
    }
  });

  it('src/solver, src/lib and src/islands have no boundary or cycle errors', async () => {
    const results = await eslint.lintFiles(['src/solver', 'src/lib', 'src/islands']);
    const folders = new Set(results.map((r) => relative(root, r.filePath).split('/').slice(0, 2).join('/')));
    expect([...folders].sort()).toEqual(['src/islands', 'src/lib', 'src/solver']);
    expect(results.length).toBeGreaterThan(50);
    const bad = results.flatMap((r) =>
      r.messages
        .filter((m) => m.fatal || (m.ruleId && BOUNDARY_RULES.includes(m.ruleId)))
        .map((m) => `${relative(root, r.filePath)}:${m.line} ${m.ruleId ?? 'parse'}: ${m.message}`),
    );
    expect(bad).toEqual([]);
  });
});
