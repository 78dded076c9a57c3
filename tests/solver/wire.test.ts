import { describe, expect, it } from 'vitest';
import { COPPER_RESISTIVITY_20C, MU_0 } from '../../src/solver/constants';
import { awgDiameter, awgFromDiameter } from '../../src/solver/wire/awg';
import { FILM_BUILD_TABLE, INSULATION_SOURCE, insulatedDiameter } from '../../src/solver/wire/insulation';
import { helixWireLength } from '../../src/solver/wire/length';
import { copperMass } from '../../src/solver/wire/mass';
import { acResistanceRoundWire, copperResistance, skinDepth, skinEffectRatio } from '../../src/solver/wire/resistance';
import { assertClose } from '../helpers/assertClose';
import skin from './fixtures/skin-effect.json';

describe('awgDiameter', () => {
  // ASTM B258 tabulated diameters (4 significant figures in inches; B258-02 rounding rule, confirmed via a secondary source).
  const astm: Array<[number, number]> = [
    [30, 0.2546e-3],
    [22, 0.6438e-3],
    [10, 2.588e-3],
  ];
  it('awgDiameter(n) matches ASTM B258 tabulated values to their 4 significant figures', () => {
    for (const [n, d] of astm) assertClose(awgDiameter(n), d, 2e-4, `awgDiameter(${n})`);
  });

  it('awgDiameter(n) is 0.005 in at AWG 36 and 0.46 in at 0000 (−3) by definition', () => {
    assertClose(awgDiameter(36), 0.127e-3, 1e-15, 'awgDiameter(36)');
    assertClose(awgDiameter(-3), 0.46 * 0.0254, 1e-14, 'awgDiameter(-3) = 0.46 in');
  });

  it('awgDiameter(n) steps by 92^(1/39) between gauges and inverts with awgFromDiameter', () => {
    assertClose(awgDiameter(20) / awgDiameter(21), Math.pow(92, 1 / 39), 1e-14, 'gauge ratio');
    assertClose(awgFromDiameter(awgDiameter(17.5)), 17.5, 1e-13, 'awgFromDiameter round trip');
  });

  it('awgDiameter(n) rejects gauges outside −3…56', () => {
    expect(() => awgDiameter(-4)).toThrow(RangeError);
    expect(() => awgDiameter(57)).toThrow(/AWG/);
    expect(() => awgDiameter(Number.NaN)).toThrow(RangeError);
  });
});

describe('insulatedDiameter', () => {
  it('insulatedDiameter(bare, build) adds the tabulated film build for whole AWG sizes', () => {
    const row = FILM_BUILD_TABLE.find((r) => r.awg === 24);
    expect(row).toBeDefined();
    const bare = awgDiameter(24);
    assertClose(insulatedDiameter(bare, 'heavy'), bare + (row?.heavy ?? 0) * 0.0254, 1e-12, 'AWG 24 heavy');
    assertClose(insulatedDiameter(bare, 'single'), bare + (row?.single ?? 0) * 0.0254, 1e-12, 'AWG 24 single');
    expect(insulatedDiameter(bare, 'bare')).toBe(bare);
  });

  it('insulatedDiameter(bare, build) orders bare < single < heavy and says where its table comes from', () => {
    for (const n of [4, 12, 27.5, 44]) {
      const bare = awgDiameter(n);
      expect(insulatedDiameter(bare, 'single')).toBeGreaterThan(bare);
      expect(insulatedDiameter(bare, 'heavy')).toBeGreaterThan(insulatedDiameter(bare, 'single'));
    }
    expect(INSULATION_SOURCE).toMatch(/from memory/);
  });
});

describe('copperResistance', () => {
  it('copperResistance(1 m, 1 mm²) is 1/58 Ω at 20 °C (IEC 60028 definition)', () => {
    const d = Math.sqrt(4e-6 / Math.PI);
    assertClose(copperResistance(1, d), 1 / 58, 1e-4, 'copperResistance(1 m, 1 mm²)');
  });

  it('copperResistance(l, d, T) rises by 0.393 %/K from 20 °C', () => {
    assertClose(copperResistance(10, 1e-3, 70) / copperResistance(10, 1e-3), 1 + 0.00393 * 50, 1e-14, 'ratio 70 °C / 20 °C');
  });
});

describe('skinDepth', () => {
  it('skinDepth(f) for copper is 0.2090 mm at 100 kHz and 66.09 µm at 1 MHz (√(ρ/(π f μ0)), Ramo, Whinnery & Van Duzer 1994 §3.16, from memory; ρ per IEC 60028, from memory)', () => {
    assertClose(skinDepth(100e3), 0.209e-3, 5e-4, 'skinDepth(100 kHz)');
    assertClose(skinDepth(1e6), 66.09e-6, 2e-4, 'skinDepth(1 MHz)');
    assertClose(skinDepth(50e3), 0.2955e-3, 2e-4, 'skinDepth(50 kHz)');
  });

  it('skinDepth(f, ρ) equals √(ρ/(π f μ0)) (closed form)', () => {
    assertClose(skinDepth(12345, 2.65e-8), Math.sqrt(2.65e-8 / (Math.PI * 12345 * MU_0)), 1e-15, 'aluminium-like resistivity');
  });
});

describe('skinEffectRatio', () => {
  it('skinEffectRatio(d, f) matches the Bessel-function solution (scipy/mpmath) for a/δ = 0.1…100', () => {
    for (const { radiusOverSkinDepth: q, ratio } of skin.values) {
      // choose f so that a/δ = q for a 1 mm wire
      const a = 0.5e-3;
      const f = (COPPER_RESISTIVITY_20C * q * q) / (Math.PI * MU_0 * a * a);
      assertClose(skinEffectRatio(2 * a, f), ratio, 1e-9, `skinEffectRatio(a/δ=${q})`);
    }
  });

  it('skinEffectRatio(d, f) tends to 1 at DC and is continuous across the series/asymptote switch', () => {
    expect(skinEffectRatio(1e-3, 0)).toBe(1);
    const a = 0.5e-3;
    const fAt = (q: number) => (COPPER_RESISTIVITY_20C * q * q) / (Math.PI * MU_0 * a * a);
    assertClose(skinEffectRatio(2 * a, fAt(20 * (1 + 1e-12))), skinEffectRatio(2 * a, fAt(20)), 1e-12, 'switch at a/δ = 20');
  });

  it('acResistanceRoundWire(l, d, f) approaches ρl/(π d δ) when d ≫ δ', () => {
    const d = 6.35e-3;
    const f = 10e6;
    const thin = (COPPER_RESISTIVITY_20C * 2) / (Math.PI * d * skinDepth(f));
    assertClose(acResistanceRoundWire(2, d, f), thin, 0.01, 'acResistanceRoundWire(2 m, 6.35 mm, 10 MHz)');
  });
});

describe('copperMass', () => {
  it('copperMass(1 km, 1 mm²) is 8.89 kg (density 8.89 g/cm³)', () => {
    assertClose(copperMass(1000, Math.sqrt(4e-6 / Math.PI)), 8.89, 1e-12, 'copperMass(1 km, 1 mm²)');
  });
});

describe('helixWireLength', () => {
  it('helixWireLength(N, D, ℓ) is N·πD for a close helix and √((NπD)² + ℓ²) in general', () => {
    assertClose(helixWireLength(1, 0.1, 0), Math.PI * 0.1, 1e-15, 'one flat turn');
    assertClose(helixWireLength(1000, 0.1, 0.5), Math.hypot(1000 * Math.PI * 0.1, 0.5), 1e-14, '1000 turns');
  });
});
