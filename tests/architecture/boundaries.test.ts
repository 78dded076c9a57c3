import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';

const root = resolve(import.meta.dirname, '../..');

function files(dir: string): string[] {
  const abs = join(root, dir);
  return readdirSync(abs).flatMap((e) => {
    const p = join(dir, e);
    return statSync(join(root, p)).isDirectory() ? files(p) : /\.(ts|tsx)$/.test(e) ? [p] : [];
  });
}

function imports(file: string): string[] {
  const src = readFileSync(join(root, file), 'utf8');
  return [...src.matchAll(/(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map((m) => m[1] ?? m[2]);
}

describe('module boundaries', () => {
  it('src/solver imports nothing of the web, the server, node:* or the network', () => {
    const bad: string[] = [];
    // pure math packages only, as in eslint.config.js (SOLVER_PACKAGES)
    const allowedPackages = /^(@stdlib\/|ml-matrix$)/;
    for (const f of files('src/solver')) {
      for (const spec of imports(f)) {
        const relative = spec.startsWith('.');
        if (relative) {
          const target = resolve(join(root, f, '..'), spec);
          if (!target.startsWith(join(root, 'src/solver'))) bad.push(`${f} → ${spec}`);
        } else if (!allowedPackages.test(spec)) bad.push(`${f} → ${spec}`);
      }
      const src = readFileSync(join(root, f), 'utf8');
      if (/\b(fetch|document|window|Math\.random|Date\.now|new Date)\b/.test(src.replace(/\/\*[\s\S]*?\*\/|\/\/.*$/gm, ''))) bad.push(`${f} uses a clock, randomness, the DOM or the network`);
    }
    expect(bad).toEqual([]);
  });

  it('islands import nothing of the server', () => {
    const bad: string[] = [];
    for (const f of files('src/islands')) {
      for (const spec of imports(f)) {
        if (spec.includes('/server/') || spec.startsWith('node:') || spec === 'drizzle-orm' || spec.startsWith('@libsql')) bad.push(`${f} → ${spec}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it('the boundary check itself sees real imports', () => {
    expect(files('src/solver').length).toBeGreaterThan(5);
    expect(imports('src/server/db/client.ts')).toContain('@libsql/client');
  });
});
