import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  couplingCoefficient,
  couplingVsElevation,
  mutualInductanceRingSheet,
  mutualPrimarySecondary,
} from '../../src/solver/coupling/mutual';
import { primaryRings, primaryRingsAtTap, type PrimaryGeometry } from '../../src/solver/primary/geometry';
import { inductancePrimary, mutualInductanceLoops } from '../../src/solver/primary/inductance';
import { inductanceSolenoidLorenz } from '../../src/solver/secondary/inductance';
import { assertClose } from '../helpers/assertClose';
import library from '../../src/lib/validation/fixtures/physics-library.json';

const primary: PrimaryGeometry = { shape: 'flat', innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 };
const secondary = { radius: 0.05, z0: 0.01, length: 0.5, turns: 1000 };

function filamentSum(ringR: number, ringZ: number, s: typeof secondary): number {
  let m = 0;
  for (let i = 0; i < s.turns; i++) m += mutualInductanceLoops(ringR, s.radius, s.z0 + ((i + 0.5) * s.length) / s.turns - ringZ);
  return m;
}

describe('mutualInductanceRingSheet', () => {
  it('mutualInductanceRingSheet(...) matches nested quadrature of Neumann integrals (mpmath) to 1e-8', () => {
    for (const c of library.ringSheet) {
      assertClose(
        mutualInductanceRingSheet(c.ringR, c.ringZ, c.sheetRadius, c.z0, c.length, c.turns),
        c.M,
        1e-8,
        `ring (${c.ringR}, ${c.ringZ}) sheet (${c.sheetRadius}, ${c.z0}, ${c.length}, ${c.turns})`,
      );
    }
  });

  it('mutualInductanceRingSheet(...) is within 0.1 % of the turn-by-turn filament sum for 1000 turns', () => {
    for (const [r, z] of [[0.1, 0], [0.24, 0], [0.07, 0.005], [0.06, 0.3], [0.3, -0.2]]) {
      assertClose(mutualInductanceRingSheet(r, z, 0.05, 0.01, 0.5, 1000), filamentSum(r, z, secondary), 1e-3, `ring r=${r} z=${z}`);
    }
  });

  it('mutualInductanceRingSheet(...) is finite for a ring lying on the sheet itself', () => {
    const m = mutualInductanceRingSheet(0.05, 0.2, 0.05, 0, 0.5, 1000);
    expect(Number.isFinite(m) && m > 0).toBe(true);
    assertClose(m, mutualInductanceRingSheet(0.05 * (1 + 1e-7), 0.2, 0.05, 0, 0.5, 1000), 1e-5, 'continuity at the sheet');
  });

  it('mutualInductanceRingSheet(...) is positive and finite for rings anywhere around the coil (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.5, noNaN: true }), fc.double({ min: -0.5, max: 1, noNaN: true }), (r, z) => {
        const m = mutualInductanceRingSheet(r, z, 0.05, 0, 0.5, 1000);
        expect(Number.isFinite(m) && m > 0).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});

describe('mutualPrimarySecondary', () => {
  it('mutualPrimarySecondary(rings, sheet) is within 0.1 % of the double filament sum (12 × 1000 turns)', () => {
    const rings = primaryRings(primary);
    const direct = rings.reduce((s, ring) => s + filamentSum(ring.r, ring.z, secondary), 0);
    assertClose(mutualPrimarySecondary(rings, secondary), direct, 1e-3, 'flat primary vs 1000-turn secondary');
  });

  it('mutualPrimarySecondary(rings, sheet) weights a partial turn linearly', () => {
    const full = mutualPrimarySecondary(primaryRingsAtTap(primary, 3), secondary);
    const next = mutualPrimarySecondary(primaryRingsAtTap(primary, 4), secondary);
    assertClose(mutualPrimarySecondary(primaryRingsAtTap(primary, 3.5), secondary), 0.5 * (full + next), 1e-12, 'tap 3.5');
  });
});

describe('couplingCoefficient', () => {
  it('couplingCoefficient(M, L1, L2) is M/√(L1L2) and lies in (0, 1) for a real primary and secondary', () => {
    assertClose(couplingCoefficient(2, 1, 16), 0.5, 1e-15, 'k = 2/4');
    const rings = primaryRings(primary);
    const L1 = inductancePrimary(primary);
    const L2 = inductanceSolenoidLorenz(1000, 0.05, 0.5);
    const k = couplingCoefficient(mutualPrimarySecondary(rings, secondary), L1, L2);
    expect(k).toBeGreaterThan(0.05);
    expect(k).toBeLessThan(0.5);
  });

  it('couplingVsElevation(...) falls as the secondary is raised', () => {
    const rings = primaryRings(primary);
    const L1 = inductancePrimary(primary);
    const L2 = inductanceSolenoidLorenz(1000, 0.05, 0.5);
    const ks = couplingVsElevation(rings, secondary, L1, L2, [0, 0.05, 0.1, 0.2]);
    for (let i = 1; i < ks.length; i++) expect(ks[i]).toBeLessThan(ks[i - 1]);
    expect(() => couplingCoefficient(1, 0, 1)).toThrow(RangeError);
  });
});
