import { describe, expect, it } from 'vitest';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { solve, type DesignSI } from '~/solver';
import { buildSheet, sheetSections } from '~/lib/buildsheet';
import { BLEEDER_RATED_VOLTAGE } from '~/lib/buildsheet/sheet';

function design(patch: (d: Record<string, unknown>) => void = () => {}): DesignSI {
  const ex = structuredClone(exampleDesigns.find((e) => e.id === 'sign-transformer-toroid')!.design) as Record<string, unknown>;
  patch(ex);
  const parsed = parseDesign(ex);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design;
}

const sections = (d: DesignSI) => sheetSections(buildSheet(d, solve(d), { rpm: 40, margin: 0.1, every: 100 }));
const rowsOf = (d: DesignSI, id: string) => sections(d).find((s) => s.id === id)?.rows ?? [];

describe('build sheet: every built part with its dimensions, every stress against a rating', () => {
  it('has a topload section with the dimensions to build it', () => {
    const rows = rowsOf(design(), 'topload');
    expect(rows.map((r) => r.label)).toEqual(expect.arrayContaining(['Overall diameter', 'Tube diameter', 'Centre above the top turn']));
    // the example's toroid is 20 in by 4 in
    expect(rows.find((r) => r.label === 'Overall diameter')!.value).toContain('508');
  });

  it('gives the primary its inner diameter, gap, outside diameter and elevation', () => {
    const d = design();
    const rows = rowsOf(d, 'primary');
    const value = (l: string) => rows.find((r) => r.label === l)?.value;
    expect(value('Innermost turn diameter')).toContain('165.1 mm');
    expect(value('Gap between turns')).toContain('0.25 in');
    expect(value('Innermost turn above the primary plane')).toBeDefined();
    // one datum, one number: the sheet's outside diameter is the solver's
    expect(value('Outside diameter')).toContain(`${(solve(d).primary!.outerDiameter * 1000).toFixed(1)} mm`);
  });

  it('checks the bleeder resistor voltage against the common-practice rating and puts resistors in series above it', () => {
    const sheet = buildSheet(design(), solve(design()), { rpm: 40, margin: 0.1, every: 100 });
    const b = sheet.tank!.bank!;
    expect(b.bleeder.ratedVoltage).toBe(BLEEDER_RATED_VOLTAGE);
    expect(b.bleeder.inSeries).toBe(Math.ceil(b.perUnitVoltage! / 350));
    const check = rowsOf(design(), 'tank').find((r) => r.label === 'Bleeder voltage check')!;
    expect(check.note).toMatch(/350 V/);
    expect(check.note).toMatch(/common practice/);
  });

  it('says the safety gap for the design\'s own supply voltage, not 9 kV', () => {
    const d = design((x) => {
      (x.supply as Record<string, unknown>).voltage = '15 kV';
    });
    const notes = sections(d).find((s) => s.id === 'supply')!.notes!.map((n) => n.text).join(' ');
    // 1/4 in at 9 kV scaled in proportion: 6.35 mm × 15/9 = 10.6 mm
    expect(notes).toContain('10.6 mm');
    expect(notes).toContain('15 kV transformer');
  });

  it('puts the quarter-wave comparison in the wire section', () => {
    const rows = rowsOf(design(), 'secondary');
    expect(rows.some((r) => r.label.startsWith('Quarter-wave figure'))).toBe(true);
  });
});
