import { describe, expect, it } from 'vitest';
import { exampleDesigns, parseDesign, type DesignSI } from '~/lib/design';
import { convertLengths, fromDesignInput, toDesignInput, emptyValues } from '~/islands/designer/form/values';
import { runRequest } from '~/workers/solver-tasks';
import { BUILDER_STEP } from '~/lib/format';

function flatten(o: unknown, prefix = '', out: Record<string, unknown> = {}): Record<string, unknown> {
  if (o && typeof o === 'object') for (const [k, v] of Object.entries(o)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  else out[prefix] = o;
  return out;
}

/** Lengths shown in the other system are rounded to the precision entered, never coarser than a builder's step (1/16 in, 0.1 mm). */
const HALF_STEP = BUILDER_STEP.imperial / 2;

function expectSameDesign(got: DesignSI, expected: DesignSI, label: string) {
  const g = flatten(got);
  const e = flatten(expected);
  expect(Object.keys(g).sort(), label).toEqual(Object.keys(e).sort());
  for (const [k, v] of Object.entries(e)) {
    if (typeof v === 'number') expect(Math.abs((g[k] as number) - v), `${label}: ${k} got ${g[k]}, expected ${v}`).toBeLessThanOrEqual(Math.max(1e-5 * Math.max(1, Math.abs(v)), HALF_STEP));
    else expect(g[k], `${label}: ${k}`).toEqual(v);
  }
}

describe('designer form values', () => {
  for (const ex of exampleDesigns) {
    for (const system of ['metric', 'imperial'] as const) {
      it(`fromDesignInput → toDesignInput keeps example "${ex.id}" the same design in ${system} units`, () => {
        const expected = parseDesign(ex.design);
        const back = parseDesign(toDesignInput(fromDesignInput(ex.design, ex.name, system)));
        expect(expected.ok && back.ok, JSON.stringify(back)).toBe(true);
        if (expected.ok && back.ok) expectSameDesign(back.design, expected.design, `${ex.id}/${system}`);
      });
    }
  }

  it('convertLengths switches every length field and back without changing the design', () => {
    const ex = exampleDesigns[1];
    const metric = fromDesignInput(ex.design, ex.name, 'metric');
    const imperial = convertLengths(metric, 'imperial');
    expect(imperial.secondary.formDiameter).toBe('4.5 in');
    expect(metric.secondary.formDiameter).toBe('114.3 mm');
    // and back again gives exactly the text first shown
    expect(convertLengths(imperial, 'metric')).toEqual(metric);
    const a = parseDesign(toDesignInput(metric));
    const b = parseDesign(toDesignInput(imperial));
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) expectSameDesign(b.design, a.design, 'metric vs imperial');
  });

  it('toDesignInput leaves blank optional fields out and passes a mistyped count to the schema as text', () => {
    const v = emptyValues('metric');
    v.secondary.turns = '12.5x';
    const input = toDesignInput(v) as unknown as { secondary: Record<string, unknown>; topload: unknown };
    expect('windingLength' in input.secondary).toBe(false);
    expect(input.topload).toBeNull();
    const parsed = parseDesign(input);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues.map((i) => i.path)).toContain('secondary.turns');
  });
});

describe('runRequest (solver worker tasks)', () => {
  it('runRequest charts: the primary curve meets the tuning target at the solved tap', () => {
    const ex = exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!;
    const solved = runRequest(1, { type: 'solve', input: ex.design });
    const charts = runRequest(2, { type: 'charts', input: ex.design });
    expect(solved.ok && charts.ok).toBe(true);
    if (!solved.ok || !charts.ok || solved.reply.type !== 'solve' || charts.reply.type !== 'charts') return;
    const tuning = charts.reply.data.tuning!;
    const tap = solved.reply.data.result.tuning!.tapTurns!;
    // interpolate the curve at the tap: it must sit on the target frequency (same L(tap), different route)
    const i = tuning.rows.findIndex((r) => r.tap >= tap);
    const [a, b] = [tuning.rows[i - 1], tuning.rows[i]];
    const f = a.primaryFrequency! + ((b.primaryFrequency! - a.primaryFrequency!) * (tap - a.tap)) / (b.tap - a.tap);
    expect(Math.abs(f / tuning.targetFrequency - 1)).toBeLessThan(0.01);
    expect(charts.reply.data.coupling!.rows.length).toBeGreaterThan(10);
    const ex2 = charts.reply.data.exchange!;
    expect(ex2.firstPrimaryMinimum).toBeGreaterThan(0);
    // lossless pair: primary + secondary energy never exceeds the start (the mutual term carries the rest)
    for (const r of ex2.rows) expect(r.primary + r.secondary).toBeLessThan(1.2);
  });

  it('runRequest goal frequency: the turns found give the target loaded frequency', () => {
    const ex = exampleDesigns[0];
    const base = runRequest(1, { type: 'solve', input: ex.design });
    if (!base.ok || base.reply.type !== 'solve') throw new Error('solve failed');
    const target = 1.1 * base.reply.data.result.tuning!.targetFrequency;
    const goal = runRequest(2, { type: 'goal', input: ex.design, goal: { kind: 'frequency', hz: target } });
    if (!goal.ok || goal.reply.type !== 'goal' || !goal.reply.data || goal.reply.data.kind !== 'frequency') throw new Error('no answer');
    const turns = Math.round(goal.reply.data.turns);
    expect(turns).toBeLessThan(ex.design.secondary.turns);
    const check = runRequest(3, { type: 'solve', input: { ...ex.design, secondary: { ...ex.design.secondary, turns } } });
    if (!check.ok || check.reply.type !== 'solve') throw new Error('solve failed');
    // rounding to whole turns moves the frequency by well under 1 %
    expect(Math.abs(check.reply.data.result.tuning!.targetFrequency / target - 1)).toBeLessThan(0.01);
  });

  it('runRequest reports invalid input as issues with paths, not as an exception', () => {
    const r = runRequest(1, { type: 'solve', input: { secondary: { formDiameter: '3 kg', turns: 100, wire: { awg: 24, insulation: 'heavy' } } } });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].path).toBe('secondary.formDiameter');
  });
});
