import { describe, expect, it } from 'vitest';
import { assertClose } from '../helpers/assertClose';
import { designInputSchema, exampleDesigns, formatIssues, parseDesign, parseQuantity, type DesignInput } from '../../src/lib/design';
import { awgDiameter, insulatedDiameter } from '../../src/solver';

const base: DesignInput = {
  secondary: { formDiameter: '4 in', turns: 1000, wire: { awg: 24, insulation: 'heavy' } },
};

function issuesOf(input: unknown) {
  const r = parseDesign(input);
  if (r.ok) throw new Error(`expected issues for ${JSON.stringify(input)}`);
  return r.issues;
}

function issueAt(input: unknown, path: string) {
  const found = issuesOf(input).find((i) => i.path === path);
  if (!found) throw new Error(`no issue at ${path}: ${JSON.stringify(issuesOf(input))}`);
  return found.message;
}

const withSecondary = (patch: Record<string, unknown>) => ({ ...base, secondary: { ...base.secondary, ...patch } });

describe('parseQuantity(value, kind)', () => {
  it('reads the examples of the public design format into SI base units (1 in = 25.4 mm exactly, NIST SP 811 App. B)', () => {
    const cases: Array<[string, Parameters<typeof parseQuantity>[1], number]> = [
      ['4.5 in', 'length', 0.1143],
      ['114.3 mm', 'length', 0.1143],
      ['20 nF', 'capacitance', 20e-9],
      ['12 kV', 'voltage', 12000],
      ['30 mA', 'current', 0.03],
      ['60 Hz', 'frequency', 60],
      ['30 deg', 'angle', Math.PI / 6],
      ['2 ft', 'length', 0.6096],
      ['0.15 µF', 'capacitance', 0.15e-6],
      ['50 uH', 'inductance', 50e-6],
    ];
    for (const [text, kind, si] of cases) {
      const r = parseQuantity(text, kind);
      if (!r.ok) throw new Error(`${text}: ${r.message}`);
      assertClose(r.value, si, 1e-12, text);
    }
  });
  it('takes plain numbers as SI', () => {
    expect(parseQuantity(0.1, 'length')).toEqual({ ok: true, value: 0.1 });
  });
  it('names the dimension it got instead', () => {
    const r = parseQuantity('3 kg', 'length');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toBe('expected a length such as "4 in" or "0.1 m", got a mass');
    const v = parseQuantity('4 in', 'voltage');
    if (!v.ok) expect(v.message).toMatch(/expected a voltage .* got a length/);
    else throw new Error('length accepted as voltage');
  });
  it('rejects unitless text, unknown units and bare units with plain messages', () => {
    for (const [text, pattern] of [
      ['0.1', /without a unit/],
      ['4 furlongz', /not a number with a known unit/],
      ['mm', /without a number/],
      ['', /empty/],
    ] as const) {
      const r = parseQuantity(text, 'length');
      expect(r.ok, text).toBe(false);
      if (!r.ok) expect(r.message, text).toMatch(pattern);
    }
  });
});

describe('parseDesign(input)', () => {
  it('accepts the minimal design and applies the defaults (ground clearance 0.5 m, elevations 0, close-wound)', () => {
    const r = parseDesign(base);
    if (!r.ok) throw new Error(formatIssues(r.issues));
    expect(r.design.groundClearance).toBe(0.5);
    expect(r.design.secondary.elevation).toBe(0);
    expect(r.design.secondary.windingLength).toBeNull();
    expect(r.design.topload).toBeNull();
    expect(r.design.primary).toBeNull();
    expect(r.design.tuning.streamerCapacitance).toBe(0);
  });

  it('resolves AWG wire through the gauge and insulation tables', () => {
    const r = parseDesign(base);
    if (!r.ok) throw new Error('invalid');
    expect(r.design.secondary.wire.diameter).toBe(awgDiameter(24));
    expect(r.design.secondary.wire.insulatedDiameter).toBe(insulatedDiameter(awgDiameter(24), 'heavy'));
  });

  it('returns the input exactly as given, strings with units kept', () => {
    const input = { ...base, groundClearance: '60 cm' };
    const r = parseDesign(input);
    if (!r.ok) throw new Error('invalid');
    expect(r.input).toEqual(input);
    expect(r.input.groundClearance).toBe('60 cm');
    assertClose(r.design.groundClearance, 0.6, 1e-12, 'clearance');
  });

  it('accepts every example design', () => {
    for (const ex of exampleDesigns) {
      const r = parseDesign(ex.design);
      expect(r.ok, `${ex.id}: ${r.ok ? '' : formatIssues(r.issues)}`).toBe(true);
      expect(designInputSchema.safeParse(ex.design).success).toBe(true);
    }
  });

  it('reports a wrong dimension at the field: secondary.formDiameter "3 kg"', () => {
    expect(issueAt(withSecondary({ formDiameter: '3 kg' }), 'secondary.formDiameter')).toBe(
      'expected a length such as "4 in" or "0.1 m", got a mass',
    );
  });

  it('reports missing, zero, negative and out-of-range values per field', () => {
    const { turns: _t, ...noTurns } = base.secondary as Record<string, unknown>;
    expect(issueAt({ secondary: noTurns }, 'secondary.turns')).toBe('is required');
    expect(issueAt(withSecondary({ formDiameter: 0 }), 'secondary.formDiameter')).toMatch(/between 5 mm and 3 m/);
    expect(issueAt(withSecondary({ formDiameter: '-4 in' }), 'secondary.formDiameter')).toMatch(/between 5 mm and 3 m/);
    expect(issueAt(withSecondary({ formDiameter: '40 m' }), 'secondary.formDiameter')).toMatch(/between/);
    expect(issueAt(withSecondary({ turns: 0 }), 'secondary.turns')).toMatch(/1 to 20000/);
    expect(issueAt(withSecondary({ turns: 100.5 }), 'secondary.turns')).toMatch(/whole number/);
    expect(issueAt(withSecondary({ turns: '1000' }), 'secondary.turns')).toMatch(/expected a whole number/);
  });

  it('rejects non-finite numbers', () => {
    expect(issueAt(withSecondary({ formDiameter: Number.NaN }), 'secondary.formDiameter')).toMatch(/not finite/);
    expect(issueAt(withSecondary({ turns: Infinity }), 'secondary.turns')).toMatch(/finite/);
  });

  it('catches a misspelt field and suggests the right one', () => {
    const { turns, ...rest } = base.secondary as Record<string, unknown>;
    expect(issueAt({ secondary: { ...rest, turn: turns } }, 'secondary.turn')).toBe('is not a known field (did you mean "turns"?)');
    expect(issueAt({ ...base, toplod: null }, 'toplod')).toMatch(/did you mean "topload"/);
  });

  it('reports the branch a wire object meant', () => {
    expect(issueAt(withSecondary({ wire: { awg: 24.5, insulation: 'heavy' } }), 'secondary.wire.awg')).toMatch(/whole number/);
    expect(issueAt(withSecondary({ wire: { awg: 24, insulation: 'triple' } }), 'secondary.wire.insulation')).toMatch(/"bare", "single" or "heavy"/);
    expect(issueAt(withSecondary({ wire: { diameter: '0.5 mm' } }), 'secondary.wire.insulatedDiameter')).toBe('is required');
    expect(issueAt(withSecondary({ wire: { diameter: '0.5 mm', insulatedDiameter: '0.45 mm' } }), 'secondary.wire.insulatedDiameter')).toMatch(/smaller than the bare/);
  });

  it('accepts both tank forms and rejects a mixture', () => {
    expect(parseDesign({ ...base, tank: { capacitance: '20 nF' } }).ok).toBe(true);
    expect(parseDesign({ ...base, tank: { unitCapacitance: '150 nF', unitVoltage: '2 kV', series: 10, parallel: 2 } }).ok).toBe(true);
    expect(issueAt({ ...base, tank: { unitCapacitance: '150 nF', unitVoltage: '2 kV', series: 10 } }, 'tank.parallel')).toBe('is required');
    expect(issueAt({ ...base, tank: { capacitance: '20 nF', series: 2 } }, 'tank.series')).toMatch(/not a known field/);
    expect(issueAt({ ...base, tank: { capacitance: '20 kV' } }, 'tank.capacitance')).toMatch(/got a voltage/);
  });

  it('checks supply kinds and their fields', () => {
    expect(parseDesign({ ...base, supply: { kind: 'solid-state', busVoltage: '340 V' } }).ok).toBe(true);
    expect(issueAt({ ...base, supply: { kind: 'battery' } }, 'supply.kind')).toMatch(/"transformer" or "solid-state"/);
    expect(issueAt({ ...base, supply: { kind: 'transformer', voltage: '12 kV', current: '30 mA' } }, 'supply.lineFrequency')).toBe('is required');
    expect(issueAt({ ...base, supply: { kind: 'transformer', voltage: '12 kV', current: '30 mV', lineFrequency: '60 Hz' } }, 'supply.current')).toMatch(/got a voltage/);
  });

  it('needs an angle for a conical primary and refuses one elsewhere', () => {
    const primary = { shape: 'conical', innerDiameter: '8 in', turns: 10, conductorDiameter: '0.25 in', spacing: '0.25 in' };
    expect(issueAt({ ...base, primary }, 'primary.angle')).toMatch(/required for a conical/);
    expect(parseDesign({ ...base, primary: { ...primary, angle: '30 deg' } }).ok).toBe(true);
    expect(issueAt({ ...base, primary: { ...primary, shape: 'flat', angle: '30 deg' } }, 'primary.angle')).toMatch(/conical primaries only/);
    expect(issueAt({ ...base, primary: { ...primary, angle: 30 } }, 'primary.angle')).toMatch(/radians/);
  });

  it('allows fractional primary turns', () => {
    const primary = { shape: 'flat', innerDiameter: '8 in', turns: 10.5, conductorDiameter: '0.25 in', spacing: '0.25 in' };
    expect(parseDesign({ ...base, primary }).ok).toBe(true);
  });

  it('refuses turns that do not fit the winding length, on secondary.windingLength', () => {
    // 1000 turns of heavy 24 AWG need about 564 mm
    expect(issueAt(withSecondary({ windingLength: '20 in' }), 'secondary.windingLength')).toMatch(/need at least 563\.\d mm/);
    expect(parseDesign(withSecondary({ windingLength: '23 in' })).ok).toBe(true);
  });

  it('refuses a primary whose turn runs through the secondary winding, on primary.innerDiameter', () => {
    const primary = { shape: 'flat', innerDiameter: '3 in', turns: 10, conductorDiameter: '0.25 in', spacing: '0.25 in' };
    expect(issueAt({ ...base, primary }, 'primary.innerDiameter')).toMatch(/run through the secondary winding/);
    // the same primary below a raised secondary can be built
    expect(parseDesign({ ...base, secondary: { ...base.secondary, elevation: '2 in' }, primary }).ok).toBe(true);
  });

  it('refuses a closed toroid, a topload on the ground and one cutting into the winding', () => {
    expect(issueAt({ ...base, topload: { shape: 'toroid', majorDiameter: '10 in', minorDiameter: '5 in' } }, 'topload.minorDiameter')).toMatch(/less than half/);
    expect(issueAt({ ...base, groundClearance: 0, secondary: { ...base.secondary, elevation: '-22.2 in' }, topload: { shape: 'sphere', diameter: '12 in', elevation: '4 in' } }, 'secondary.elevation')).toMatch(/below the ground/);
    expect(issueAt({ ...base, topload: { shape: 'sphere', diameter: '12 in', elevation: '1 in' } }, 'topload.elevation')).toMatch(/cut into the top/);
  });

  it('gives structured issues for input that is not an object', () => {
    for (const bad of [null, 42, 'design', [], {}]) {
      const issues = issuesOf(bad);
      expect(issues.length).toBeGreaterThan(0);
      for (const i of issues) {
        expect(typeof i.path).toBe('string');
        expect(i.message.length).toBeGreaterThan(3);
      }
    }
    expect(issueAt({}, 'secondary')).toBe('is required');
  });

  it('derives the streamer allowance from a streamer length at 1 pF per foot (T. Fritz, Tesla Coil Mailing List, May 2002; common practice, single source)', () => {
    const r = parseDesign({ ...base, tuning: { streamerLength: '3 ft' } });
    if (!r.ok) throw new Error('invalid');
    assertClose(r.design.tuning.streamerCapacitance, 3e-12, 1e-12, 'allowance');
    expect(issueAt({ ...base, tuning: { streamerLength: '3 ft', streamerCapacitance: '3 pF' } }, 'tuning.streamerLength')).toMatch(/not both/);
  });
});

describe('formatIssues(issues)', () => {
  it('prints one "path: message" line per issue', () => {
    expect(formatIssues([{ path: 'secondary.turns', message: 'is required' }, { path: 'tank', message: 'x' }])).toBe(
      'secondary.turns: is required\ntank: x',
    );
  });
});
