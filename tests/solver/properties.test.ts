import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseDesign, type DesignInput } from '../../src/lib/design';
import { solve, type Result } from '../../src/solver';

const mm = (x: number) => x / 1000;

// Lengths as SI numbers or as strings in mm or inches, so both input forms are exercised.
const lengthInput = (metres: number, form: number): number | string =>
  form === 0 ? metres : form === 1 ? `${metres * 1000} mm` : `${metres / 0.0254} in`;

const wireArb = fc.oneof(
  fc.record({ awg: fc.integer({ min: 14, max: 36 }), insulation: fc.constantFrom('bare' as const, 'single' as const, 'heavy' as const) }),
  fc.record({ d: fc.double({ min: 0.1, max: 2, noNaN: true }), f: fc.double({ min: 1, max: 1.15, noNaN: true }) }).map(({ d, f }) => ({
    diameter: mm(d),
    insulatedDiameter: mm(d * f),
  })),
);

const designArb = fc
  .record({
    form: fc.double({ min: 20, max: 600, noNaN: true }),
    units: fc.integer({ min: 0, max: 2 }),
    turns: fc.integer({ min: 50, max: 3000 }),
    wire: wireArb,
    lengthFactor: fc.option(fc.double({ min: 1.01, max: 2.5, noNaN: true }), { nil: undefined }),
    elevation: fc.double({ min: 0, max: 0.1, noNaN: true }),
    groundClearance: fc.option(fc.double({ min: 0.06, max: 1.5, noNaN: true }), { nil: undefined }),
    topload: fc.oneof(
      fc.constant(null),
      fc.record({ major: fc.double({ min: 0.1, max: 1.5, noNaN: true }), ratio: fc.double({ min: 0.1, max: 0.45, noNaN: true }), extra: fc.double({ min: 0, max: 0.2, noNaN: true }) }).map(
        ({ major, ratio, extra }) => ({ shape: 'toroid' as const, majorDiameter: major, minorDiameter: major * ratio, elevation: (major * ratio) / 2 + extra }),
      ),
      fc.record({ d: fc.double({ min: 0.05, max: 0.6, noNaN: true }), extra: fc.double({ min: 0, max: 0.2, noNaN: true }) }).map(({ d, extra }) => ({
        shape: 'sphere' as const,
        diameter: d,
        elevation: d / 2 + extra,
      })),
    ),
    primary: fc.option(
      fc.record({
        shape: fc.constantFrom('flat' as const, 'helical' as const, 'conical' as const),
        margin: fc.double({ min: -0.1, max: 0.3, noNaN: true }),
        turns: fc.double({ min: 1, max: 20, noNaN: true }),
        conductor: fc.double({ min: 2, max: 10, noNaN: true }),
        spacing: fc.double({ min: 0, max: 10, noNaN: true }),
        angle: fc.double({ min: 10, max: 80, noNaN: true }),
        elevation: fc.double({ min: -0.05, max: 0.05, noNaN: true }),
      }),
      { nil: null },
    ),
    tank: fc.oneof(
      fc.constant(null),
      fc.double({ min: 1, max: 200, noNaN: true }).map((nF) => ({ capacitance: `${nF} nF` })),
      fc.record({
        unitCapacitance: fc.double({ min: 10e-9, max: 1e-6, noNaN: true }),
        unitVoltage: fc.double({ min: 500, max: 4000, noNaN: true }),
        series: fc.integer({ min: 1, max: 30 }),
        parallel: fc.integer({ min: 1, max: 6 }),
      }),
    ),
    supply: fc.oneof(
      fc.constant(null),
      fc.record({
        kind: fc.constant('transformer' as const),
        voltage: fc.double({ min: 2000, max: 15000, noNaN: true }),
        current: fc.double({ min: 0.01, max: 0.12, noNaN: true }),
        lineFrequency: fc.constantFrom('50 Hz', '60 Hz'),
        breakRate: fc.option(fc.double({ min: 50, max: 600, noNaN: true }), { nil: undefined }),
      }),
      fc.record({ kind: fc.constant('solid-state' as const), busVoltage: fc.double({ min: 100, max: 700, noNaN: true }) }),
    ),
    tuning: fc.option(
      fc.record({
        streamerCapacitance: fc.double({ min: 0, max: 20e-12, noNaN: true }),
        targetCoupling: fc.option(fc.double({ min: 0.05, max: 0.3, noNaN: true }), { nil: undefined }),
      }),
      { nil: null },
    ),
  })
  .map((g): DesignInput => {
    const ins = 'awg' in g.wire ? null : g.wire.insulatedDiameter;
    const approxIns = ins ?? 0.0254 * 0.005 * 92 ** ((36 - (g.wire as { awg: number }).awg) / 39) + 1e-4;
    const formD = mm(g.form);
    const windingD = formD + approxIns;
    const secondary: DesignInput['secondary'] = {
      formDiameter: lengthInput(formD, g.units),
      turns: g.turns,
      wire: g.wire,
      elevation: g.elevation,
    };
    if (g.lengthFactor !== undefined) secondary.windingLength = Math.min(9.9, g.turns * approxIns * g.lengthFactor * 1.1);
    const design: DesignInput = { secondary };
    if (g.groundClearance !== undefined) design.groundClearance = g.groundClearance;
    if (g.topload) design.topload = g.topload;
    if (g.primary) {
      const a = mm(g.primary.conductor);
      design.primary = {
        shape: g.primary.shape,
        innerDiameter: Math.max(0.006, windingD + 4 * a + g.primary.margin),
        turns: g.primary.turns,
        conductorDiameter: a,
        spacing: mm(g.primary.spacing),
        elevation: g.primary.elevation,
        ...(g.primary.shape === 'conical' ? { angle: `${g.primary.angle} deg` } : {}),
      };
    }
    if (g.tank) design.tank = g.tank;
    if (g.supply) design.supply = g.supply;
    if (g.tuning) design.tuning = g.tuning;
    return design;
  });

function numbers(v: unknown, path = '', out: Array<[string, unknown]> = []): Array<[string, unknown]> {
  if (typeof v === 'number') out.push([path, v]);
  else if (Array.isArray(v)) v.forEach((x, i) => numbers(x, `${path}[${i}]`, out));
  else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) numbers(x, path ? `${path}.${k}` : k, out);
  return out;
}

const POSITIVE = [
  'secondary.inductance',
  'secondary.selfCapacitance',
  'secondary.resonantFrequency',
  'secondary.wireLength',
  'secondary.windingLength',
  'secondary.aspectRatio',
  'secondary.dcResistance',
  'secondary.wireMass',
  'topload.capacitance',
  'system.resonantFrequency',
  'system.quarterWaveFrequency',
  'primary.inductance',
  'primary.conductorLength',
  'coupling.mutualInductance',
  'coupling.k',
  'tuning.targetFrequency',
  'tank.capacitance',
  'tank.energyAtSupplyPeak',
  'supply.resonantCapacitance',
];

function get(r: Result, path: string): unknown {
  return path.split('.').reduce<unknown>((o, k) => (o && typeof o === 'object' ? (o as Record<string, unknown>)[k] : undefined), r);
}

describe('solve(parseDesign(x)) over random designs of every shape, wire form, tank form and supply kind', () => {
  it('gives finite numbers everywhere, positive where physics says so, or a structured error', () => {
    let solved = 0;
    fc.assert(
      fc.property(designArb, (input) => {
        const parsed = parseDesign(input);
        if (!parsed.ok) {
          expect(parsed.issues.length).toBeGreaterThan(0);
          for (const i of parsed.issues) {
            expect(typeof i.path).toBe('string');
            expect(i.message).not.toMatch(/NaN|undefined|\[object/);
          }
          return;
        }
        solved++;
        const r = solve(parsed.design);
        for (const [path, v] of numbers(r)) expect(Number.isFinite(v), path).toBe(true);
        expect(r.warnings.filter((w) => w.code === 'value_not_finite' || w.code === 'computation_failed')).toEqual([]);
        for (const p of POSITIVE) {
          const v = get(r, p);
          if (v !== null && v !== undefined) expect(v as number, p).toBeGreaterThan(0);
        }
        expect(r.coupling === null || r.coupling.k < 1).toBe(true);
        if (r.tuning && r.tuning.tapTurns !== null) {
          expect(r.tuning.tapTurns).toBeGreaterThan(0);
          expect(r.tuning.tapTurns).toBeLessThanOrEqual(parsed.design.primary!.turns);
        }
        for (const w of r.warnings) expect(w.path.length).toBeGreaterThan(0);
      }),
      { numRuns: 200, seed: 20261201 },
    );
    expect(solved).toBeGreaterThan(75);
  });
});

const QUANTITY_PATHS: Array<[string[], unknown]> = [
  [['secondary', 'formDiameter'], '3 kg'],
  [['secondary', 'turns'], -5],
  [['secondary', 'elevation'], '2 F'],
  [['groundClearance'], '-1 m'],
  [['topload', 'majorDiameter'], 'abc'],
  [['primary', 'spacing'], '1 kV'],
  [['primary', 'turns'], 0],
  [['primary', 'innerDiameter'], null],
  [['tank', 'capacitance'], '20 nH'],
  [['supply', 'voltage'], '12 kA'],
  [['tuning', 'streamerCapacitance'], '-3 pF'],
];

describe('parseDesign over designs with one field spoilt', () => {
  it('always fails with an issue naming that field', () => {
    const valid: DesignInput = {
      secondary: { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' }, elevation: '1 in' },
      groundClearance: '0.5 m',
      topload: { shape: 'toroid', majorDiameter: '20 in', minorDiameter: '5 in', elevation: '3 in' },
      primary: { shape: 'flat', innerDiameter: '7 in', turns: 12, conductorDiameter: '0.25 in', spacing: '0.25 in' },
      tank: { capacitance: '20 nF' },
      supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA', lineFrequency: '60 Hz' },
      tuning: { streamerCapacitance: '3 pF' },
    };
    expect(parseDesign(valid).ok).toBe(true);
    fc.assert(
      fc.property(fc.constantFrom(...QUANTITY_PATHS), ([path, bad]) => {
        const spoilt = structuredClone(valid) as Record<string, unknown>;
        let o = spoilt;
        for (const k of path.slice(0, -1)) o = o[k] as Record<string, unknown>;
        o[path[path.length - 1]] = bad;
        const r = parseDesign(spoilt);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.issues.map((i) => i.path)).toContain(path.join('.'));
      }),
      { numRuns: 40, seed: 7 },
    );
  });
});

describe('parseDesign with units or SI numbers', () => {
  it('gives the same solution for a length in mm, in inches or in metres', () => {
    fc.assert(
      fc.property(fc.double({ min: 30, max: 300, noNaN: true }), (formMm) => {
        const mk = (formDiameter: number | string): DesignInput => ({
          secondary: { formDiameter, turns: 800, wire: { awg: 26, insulation: 'single' } },
          topload: { shape: 'sphere', diameter: 0.5, elevation: 0.3 },
        });
        const results = [formMm / 1000, `${formMm} mm`, `${formMm / 25.4} in`].map((f) => {
          const p = parseDesign(mk(f));
          if (!p.ok) throw new Error('invalid');
          return solve(p.design).system!.resonantFrequency;
        });
        expect(Math.abs(results[1] / results[0] - 1)).toBeLessThan(1e-12);
        expect(Math.abs(results[2] / results[0] - 1)).toBeLessThan(1e-12);
      }),
      { numRuns: 30, seed: 11 },
    );
  });
});
