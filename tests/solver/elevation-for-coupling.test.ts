import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { parseDesign } from '../../src/lib/design';
import { elevationForCoupling } from '../../src/solver';
import { evaluateCoupling, evaluatePrimary } from '../../src/solver/system/primary';
import { evaluateSecondary } from '../../src/solver/system/secondary';

type Case = { label: string; design: unknown; targetK: number; elevation: number | null };
const fixture = JSON.parse(readFileSync(resolve(import.meta.dirname, 'fixtures/elevation-for-coupling.json'), 'utf8')) as { cases: Case[] };

describe('elevationForCoupling (root-finder on the tabulated ring–sheet model, Newton-polished)', () => {
  it('gives the recorded all-quadrature answers within 1e-4 m, and null exactly where they were null', () => {
    expect(fixture.cases.length).toBeGreaterThan(100);
    let worst = 0;
    for (const c of fixture.cases) {
      const parsed = parseDesign(c.design as never);
      if (!parsed.ok) throw new Error(c.label);
      const got = elevationForCoupling(parsed.design, c.targetK);
      if (c.elevation === null) {
        expect(got, `${c.label} k=${c.targetK}`).toBeNull();
        continue;
      }
      expect(got, `${c.label} k=${c.targetK}`).not.toBeNull();
      worst = Math.max(worst, Math.abs(got! - c.elevation));
      expect(Math.abs(got! - c.elevation), `${c.label} k=${c.targetK}`).toBeLessThan(1e-4);
    }
    expect(worst).toBeLessThan(1e-4);
  });

  it('puts k at the target with the full model at the elevation it returns', () => {
    for (const c of fixture.cases.filter((x) => x.elevation !== null).slice(0, 40)) {
      const parsed = parseDesign(c.design as never);
      if (!parsed.ok) throw new Error(c.label);
      const d = parsed.design;
      const e = elevationForCoupling(d, c.targetK)!;
      const k = evaluateCoupling(d.primary!, { ...d.secondary, elevation: e }, evaluatePrimary(d.primary!).inductance, evaluateSecondary(d.secondary).inductance).k;
      expect(Math.abs(k - c.targetK), c.label).toBeLessThan(1e-9);
    }
  });
});
