import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { energyExchange, splitFrequencies, transferTime } from '../../src/solver';

// Closed form for a tuned lossless pair ("Electronics" lecture notes §2.7, eqs. 2.99–2.123, confirmed; P. Drude, Ann. Phys. 13, 1904, from memory): with y = √L·q,
// y1 = y0 cos(ω_B t/2) cos(ω̄ t), y2 = y0 sin(ω_B t/2) sin(ω̄ t).
function closedForm(L1: number, C1: number, L2: number, k: number, t: number, v0 = 1) {
  const w0 = 1 / Math.sqrt(L1 * C1);
  const wLo = w0 / Math.sqrt(1 + k);
  const wHi = w0 / Math.sqrt(1 - k);
  const y0 = Math.sqrt(L1) * C1 * v0;
  const y1 = 0.5 * y0 * (Math.cos(wLo * t) + Math.cos(wHi * t));
  const y2 = 0.5 * y0 * (Math.cos(wLo * t) - Math.cos(wHi * t));
  const d1 = -0.5 * y0 * (wLo * Math.sin(wLo * t) + wHi * Math.sin(wHi * t));
  const d2 = -0.5 * y0 * (wLo * Math.sin(wLo * t) - wHi * Math.sin(wHi * t));
  const C2 = 1 / (w0 * w0 * L2);
  const q1 = y1 / Math.sqrt(L1);
  const q2 = y2 / Math.sqrt(L2);
  const i1 = d1 / Math.sqrt(L1);
  const i2 = d2 / Math.sqrt(L2);
  return { e1: 0.5 * L1 * i1 * i1 + (q1 * q1) / (2 * C1), e2: 0.5 * L2 * i2 * i2 + (q2 * q2) / (2 * C2) };
}

describe('splitFrequencies(f0, k)', () => {
  it('gives f0/√(1+k) and f0/√(1−k) ("Electronics" lecture notes §2.7, eqs. 2.99–2.123): 100 kHz, k = 0.2 → 91.287 and 111.803 kHz', () => {
    const { fLow, fHigh } = splitFrequencies(100e3, 0.2);
    assertClose(fLow, 100e3 / Math.sqrt(1.2), 1e-14, 'f_lo');
    assertClose(fHigh, 100e3 / Math.sqrt(0.8), 1e-14, 'f_hi');
    assertClose(fLow, 91287.09, 1e-6, 'f_lo value');
    assertClose(fHigh, 111803.4, 1e-6, 'f_hi value');
  });
  it('collapses to f0 without coupling', () => {
    expect(splitFrequencies(1e5, 0)).toEqual({ fLow: 1e5, fHigh: 1e5 });
  });
});

describe('transferTime(f0, k)', () => {
  it('is 1/(2(f_hi − f_lo)) ("Electronics" lecture notes §2.7, eqs. 2.99–2.123)', () => {
    const { fLow, fHigh } = splitFrequencies(100e3, 0.2);
    assertClose(transferTime(100e3, 0.2), 1 / (2 * (fHigh - fLow)), 1e-14, 't1');
  });
  it('approaches 1/(2 k f0), about 1/k half-cycles, for small k ("Electronics" lecture notes §2.7, eqs. 2.99–2.123; Tesla Coil Mailing List, July 1998, common practice)', () => {
    assertClose(transferTime(100e3, 0.01), 1 / (2 * 0.01 * 100e3), 1e-4, 'small k');
    assertClose(transferTime(100e3, 0.2) * 2 * 100e3, 1 / 0.2, 0.03, 'half-cycles at k = 0.2');
  });
});

describe('energyExchange(pair)', () => {
  const L1 = 50e-6;
  const C1 = 20e-9;
  const L2 = 40e-3;
  const f0 = 1 / (2 * Math.PI * Math.sqrt(L1 * C1));
  const C2 = 1 / ((2 * Math.PI * f0) ** 2 * L2);

  it('matches the closed-form tuned-pair energies at every sample ("Electronics" lecture notes §2.7, eqs. 2.99–2.123), k = 0.15', () => {
    const k = 0.15;
    const run = energyExchange({ L1, C1, L2, C2, k }, { points: 101, stepsPerCycle: 400 });
    const e0 = run.initialEnergy;
    run.t.forEach((t, i) => {
      const exact = closedForm(L1, C1, L2, k, t);
      expect(Math.abs(run.primaryEnergy[i] - exact.e1) / e0, `primary at t=${t}`).toBeLessThan(1e-6);
      expect(Math.abs(run.secondaryEnergy[i] - exact.e2) / e0, `secondary at t=${t}`).toBeLessThan(1e-6);
    });
  });

  it('conserves primary + secondary + mutual energy', () => {
    const run = energyExchange({ L1, C1, L2, C2, k: 0.3 }, { points: 50 });
    run.t.forEach((_, i) => {
      const total = run.primaryEnergy[i] + run.secondaryEnergy[i] + run.mutualEnergy[i];
      expect(Math.abs(total / run.initialEnergy - 1)).toBeLessThan(1e-6);
    });
  });

  it('empties the primary completely at t1 for k = 5/13, where f_hi/f_lo = √((1+k)/(1−k)) = 3/2 (normal modes, independent computation)', () => {
    const k = 5 / 13;
    const run = energyExchange({ L1, C1, L2, C2, k }, { points: 2, stepsPerCycle: 400 });
    expect(run.residualPrimaryEnergy!).toBeLessThan(1e-6);
    assertClose(run.firstPrimaryMinimum!, transferTime(f0, k), 1e-3, 'minimum at t1');
  });

  it('leaves a little energy behind for other k, its minimum within a quarter cycle of t1 (about 7e-4 at k = 0.1 by the closed form of the tuned pair, "Electronics" lecture notes §2.7)', () => {
    const run = energyExchange({ L1, C1, L2, C2, k: 0.1 }, { points: 2, stepsPerCycle: 400 });
    expect(Math.abs(run.firstPrimaryMinimum! - transferTime(f0, 0.1))).toBeLessThanOrEqual(0.25 / f0);
    expect(run.residualPrimaryEnergy!).toBeGreaterThan(1e-5);
    expect(run.residualPrimaryEnergy!).toBeLessThan(2e-3);
  });

  it('returns the requested number of samples from 0 to the duration', () => {
    const run = energyExchange({ L1, C1, L2, C2, k: 0.2 }, { points: 300, duration: 1e-4 });
    expect(run.t.length).toBe(300);
    expect(run.t[0]).toBe(0);
    assertClose(run.t[run.t.length - 1], 1e-4, 1e-9, 'last sample');
  });
});
