import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import {
  inductanceForResonance,
  capacitanceForResonance,
  inductancePrimary,
  resonantFrequencyLC,
  solveTap,
  streamerCapacitanceForLength,
  STREAMER_CAPACITANCE_PER_FOOT_RANGE,
} from '../../src/solver';

describe('streamerCapacitanceForLength(length)', () => {
  it('allows 1 pF per foot (T. Fritz, Tesla Coil Mailing List, May 2002; common practice, single source): 2.5 ft → 2.5 pF', () => {
    assertClose(streamerCapacitanceForLength(2.5 * 0.3048), 2.5e-12, 1e-12, '2.5 ft');
  });
  it('takes another figure per foot, e.g. the 0.8–2 pF/ft range (T. Fritz, Tesla Coil Mailing List, July 2005; Spark Discharge, CRC Press)', () => {
    assertClose(streamerCapacitanceForLength(0.3048, STREAMER_CAPACITANCE_PER_FOOT_RANGE.high), 2e-12, 1e-12, '2 pF/ft');
  });
});

describe('inductanceForResonance / capacitanceForResonance', () => {
  it('invert f = 1/(2π√(LC)) (Thomson)', () => {
    const L = inductanceForResonance(200e3, 20e-9);
    assertClose(resonantFrequencyLC(L, 20e-9), 200e3, 1e-12, 'f from L');
    assertClose(capacitanceForResonance(200e3, L), 20e-9, 1e-12, 'C from L');
  });
});

describe('solveTap(L(t), L_required, min, max)', () => {
  it('finds the exact root of L = a t² (closed form t = √(L/a))', () => {
    const a = 0.4e-6;
    const r = solveTap((t) => a * t * t, 30e-6, 0.25, 12);
    expect(r.inRange).toBe(true);
    assertClose(r.tapTurns!, Math.sqrt(30e-6 / a), 1e-9, 'tap');
  });
  it('finds the root of a curve that is not a power law (L = a t^1.7 + b t)', () => {
    const L = (t: number) => 1e-6 * t ** 1.7 + 2e-7 * t;
    const r = solveTap(L, 20e-6, 0.25, 20);
    assertClose(L(r.tapTurns!), 20e-6, 1e-9, 'L at tap');
  });
  it('returns null and inRange false outside the primary', () => {
    expect(solveTap((t) => 1e-6 * t * t, 1e-3, 0.25, 12)).toEqual({ tapTurns: null, inRange: false });
    expect(solveTap((t) => 1e-6 * t * t, 1e-9, 0.25, 12)).toEqual({ tapTurns: null, inRange: false });
  });
  it('accepts the end points themselves', () => {
    expect(solveTap((t) => 1e-6 * t * t, 144e-6, 0.25, 12).tapTurns).toBe(12);
  });
  it('tunes a real ring-model primary to a target within 1e-8 (fractional taps, ring model)', () => {
    const p = { shape: 'flat' as const, innerDiameter: 0.2, turns: 12, conductorDiameter: 0.00635, spacing: 0.00635, elevation: 0 };
    const C = 20e-9;
    const target = 230e3;
    const r = solveTap((t) => inductancePrimary(p, t), inductanceForResonance(target, C), 0.25, 12);
    expect(r.tapTurns! % 1).not.toBe(0);
    assertClose(resonantFrequencyLC(inductancePrimary(p, r.tapTurns!), C), target, 1e-8, 'primary at tap');
  });
});
