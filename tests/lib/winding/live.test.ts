import { describe, expect, it } from 'vitest';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { solve, type DesignSI } from '~/solver';
import { buildSheet } from '~/lib/buildsheet';
import { elapsedWinding, liveFigures, windingPlan } from '~/lib/winding';
import { assertClose } from '../../helpers/assertClose';

function example(id: string, patch: (d: DesignSI) => DesignSI = (d) => d): DesignSI {
  const parsed = parseDesign(exampleDesigns.find((e) => e.id === id)!.design);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return patch(parsed.design);
}

const T0 = Date.UTC(2026, 2, 14, 9, 0, 0);
const MIN = 60_000;

describe('elapsedWinding(startedAt, pauses, now)', () => {
  it('elapsedWinding leaves out closed and open pauses', () => {
    const pauses = [
      { startedAt: T0 + 10 * MIN, endedAt: T0 + 13 * MIN },
      { startedAt: T0 + 20 * MIN, endedAt: null },
    ];
    expect(elapsedWinding(T0, pauses, T0 + 15 * MIN)).toBe(12 * 60);
    expect(elapsedWinding(T0, pauses, T0 + 25 * MIN)).toBe(17 * 60);
  });
});

describe('liveFigures(plan, session, now) against the build sheet of the same design', () => {
  const design = example('sign-transformer-toroid');
  const result = solve(design);
  const rpm = 40;
  const sheet = buildSheet(design, result, { rpm, margin: 0.1, every: 100 });
  const plan = windingPlan(design, result)!;
  const spool = 400;
  const session = { rpm, spoolLength: spool, startedAt: T0, pauses: [] };

  it('windingPlan takes the build sheet’s pitch, turns and wire length; close-wound pitch is the insulated diameter', () => {
    expect(plan.turns).toBe(sheet.secondary.turns);
    assertClose(plan.pitch, sheet.secondary.pitch, 1e-12, 'pitch');
    assertClose(plan.pitch, design.secondary.wire.insulatedDiameter, 1e-12, 'close-wound pitch');
    expect(plan.pitchSource).toBe('insulated-diameter');
    expect(plan.wireLength).toBe(sheet.secondary.wireLength);
  });

  it('liveFigures at the start: time to finish is the build sheet’s winding time, nothing used', () => {
    const f = liveFigures(plan, session, T0);
    assertClose(f.timeToFinish, sheet.secondary.windingTime, 1e-12, 'time to finish = winding time');
    expect(f.expectedTurns).toBe(0);
    expect(f.wireUsed).toBe(0);
    expect(f.wireLeft).toBe(spool);
  });

  it('liveFigures after the build sheet’s winding time: all turns, the sheet’s wire length, nothing left to wind', () => {
    const f = liveFigures(plan, session, T0 + sheet.secondary.windingTime * 1000);
    assertClose(f.expectedTurns, sheet.secondary.turns, 1e-12, 'turns');
    assertClose(f.wireUsed, sheet.secondary.wireLength, 1e-12, 'wire used = build sheet wire length');
    assertClose(f.wireLeft!, spool - sheet.secondary.wireLength, 1e-12, 'wire left on the spool');
    assertClose(f.expectedHeight, sheet.secondary.windingLength, 1e-12, 'height = winding length');
    expect(f.timeToFinish).toBe(0);
  });

  it('liveFigures at each checkpoint’s time gives the checkpoint’s height (n turns at n / rpm minutes)', () => {
    for (const c of sheet.secondary.checkpoints) {
      const f = liveFigures(plan, session, T0 + (c.turns / rpm) * MIN);
      assertClose(f.expectedTurns, c.turns, 1e-12, `turns at checkpoint ${c.turns}`);
      assertClose(f.expectedHeight, c.height, 1e-9, `height at checkpoint ${c.turns}`);
    }
  });

  it('liveFigures: a 5-minute pause moves every figure 5 minutes later', () => {
    const paused = { ...session, pauses: [{ startedAt: T0 + 2 * MIN, endedAt: T0 + 7 * MIN }] };
    const f = liveFigures(plan, paused, T0 + 15 * MIN);
    expect(f.elapsed).toBe(10 * 60);
    assertClose(f.expectedTurns, 400, 1e-12, '10 min at 40 rpm');
    assertClose(f.timeToFinish, (600 / 40) * 60, 1e-12, '600 turns left at 40 rpm');
  });

  it('liveFigures flags a spool shorter than the winding', () => {
    expect(liveFigures(plan, { ...session, spoolLength: sheet.secondary.wireLength * 0.5 }, T0).spoolShort).toBe(true);
    expect(liveFigures(plan, { ...session, spoolLength: null }, T0).wireLeft).toBeNull();
  });

  it('windingPlan of a space-wound design takes the design’s spacing: winding length / turns', () => {
    const spaced = example('sign-transformer-toroid', (d) => ({ ...d, secondary: { ...d.secondary, windingLength: 0.8 } }));
    const p = windingPlan(spaced, solve(spaced))!;
    expect(p.pitchSource).toBe('design-spacing');
    assertClose(p.pitch, 0.8 / 1000, 1e-12, 'pitch');
    const s2 = buildSheet(spaced, solve(spaced), { rpm, margin: 0.1, every: 100 });
    assertClose(p.pitch, s2.secondary.pitch, 1e-12, 'build sheet pitch');
  });
});
