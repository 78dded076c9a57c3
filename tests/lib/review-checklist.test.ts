import { describe, expect, it } from 'vitest';
import { checklistFamily, firstLightChecklist, reviewStatus } from '../../src/lib/review';
import { exampleDesigns } from '../../src/lib/design/examples';

const transformerCoil = exampleDesigns[1].design;
const solidStateCoil = exampleDesigns[2].design;
const keys = (d: unknown) => firstLightChecklist(d).items.map((i) => i.key);
const common = ['perimeter', 'key-switch-stop', 'hearing-eyes', 'fire-extinguisher', 'not-alone'];

describe('firstLightChecklist', () => {
  it('firstLightChecklist(spark-gap coil) lists the safety gap, bleeders, RF ground and strike rail, then the common items', () => {
    expect((transformerCoil as { supply: { kind: string } }).supply.kind).toBe('transformer');
    expect(firstLightChecklist(transformerCoil).family).toBe('spark-gap');
    expect(keys(transformerCoil)).toEqual(['safety-gap', 'bleeders', 'rf-ground', 'strike-rail', ...common]);
  });

  it('firstLightChecklist(solid-state coil) lists bus discharge, measurement isolation, fibre interrupter and trip, then the common items', () => {
    expect((solidStateCoil as { supply: { kind: string } }).supply.kind).toBe('solid-state');
    expect(firstLightChecklist(solidStateCoil).family).toBe('solid-state');
    expect(keys(solidStateCoil)).toEqual(['bus-discharge', 'measurement-isolation', 'fibre-interrupter', 'trip-set', ...common]);
  });

  it('firstLightChecklist quotes the supply voltage as the builder typed it', () => {
    const d = { secondary: {}, supply: { kind: 'transformer', voltage: '9 kV', current: '30 mA', lineFrequency: '50 Hz' } };
    expect(firstLightChecklist(d).items[0].detail).toContain('9 kV supply');
    const si = { secondary: {}, supply: { kind: 'transformer', voltage: 12000 } };
    expect(firstLightChecklist(si).items[0].detail).toContain('12 kV supply');
  });

  it('firstLightChecklist names the trip setting when the design has one, and asks for one when it does not', () => {
    const withTrip = { supply: { kind: 'solid-state', busVoltage: '340 V', currentLimit: '450 A', busCapacitance: '3300 uF' } };
    const trip = firstLightChecklist(withTrip).items.find((i) => i.key === 'trip-set')!;
    expect(trip.detail).toContain('450 A');
    expect(firstLightChecklist(withTrip).items[0].detail).toContain('3300 uF at 340 V');
    const without = firstLightChecklist({ supply: { kind: 'solid-state', busVoltage: '340 V' } }).items.find((i) => i.key === 'trip-set')!;
    expect(without.detail).toContain('no over-current trip');
  });

  it('firstLightChecklist mentions the strike rail’s size when one is in the design', () => {
    const rail = firstLightChecklist({ supply: { kind: 'transformer' }, strikeRail: { diameter: '40 in', height: '2 in' } }).items.find((i) => i.key === 'strike-rail')!;
    expect(rail.detail).toContain('40 in across');
    const none = firstLightChecklist({ supply: { kind: 'transformer' } }).items.find((i) => i.key === 'strike-rail')!;
    expect(none.detail).toContain('no strike rail');
  });

  it('checklistFamily treats a design without a supply, or a stored design that no longer parses, as spark gap', () => {
    expect(checklistFamily({ secondary: {} })).toBe('spark-gap');
    expect(checklistFamily(null)).toBe('spark-gap');
    expect(checklistFamily({ supply: 'nonsense' })).toBe('spark-gap');
    expect(keys(null)).toHaveLength(9);
  });

  it('firstLightChecklist gives every item a unique key, a title and a detail', () => {
    for (const d of [transformerCoil, solidStateCoil]) {
      const items = firstLightChecklist(d).items;
      expect(new Set(items.map((i) => i.key)).size).toBe(items.length);
      for (const i of items) {
        expect(i.title.length).toBeGreaterThan(5);
        expect(i.detail.length).toBeGreaterThan(20);
      }
    }
  });
});

const at = (n: number) => `2026-03-${String(n).padStart(2, '0')}T10:00:00.000Z`;
const row = (revision: number, state: 'requested' | 'signed_off' | 'changes_requested', requested: number, decided: number | null) => ({
  revision,
  state,
  reviewer: decided ? 'Oriel' : null,
  requestedBy: 'Noor',
  requestedAt: at(requested),
  decidedAt: decided ? at(decided) : null,
});

describe('reviewStatus', () => {
  it('reviewStatus reads a sign-off of the current revision as signed off', () => {
    expect(reviewStatus([row(3, 'signed_off', 1, 2)], 3)).toMatchObject({ kind: 'signed_off', text: 'Signed off for first light: revision 3' });
  });

  it('reviewStatus reads a sign-off of an older revision as "signed off revision N; changed since"', () => {
    expect(reviewStatus([row(3, 'signed_off', 1, 2)], 4)).toMatchObject({ kind: 'changed_since', text: 'Signed off revision 3; changed since' });
  });

  it('reviewStatus: a later request for changes replaces an earlier sign-off', () => {
    expect(reviewStatus([row(3, 'signed_off', 1, 2), row(4, 'changes_requested', 3, 4)], 4).kind).toBe('changes_requested');
    expect(reviewStatus([row(4, 'changes_requested', 3, 4), row(5, 'signed_off', 5, 6)], 5).kind).toBe('signed_off');
  });

  it('reviewStatus shows a waiting request, and nothing when there are no reviews', () => {
    expect(reviewStatus([row(2, 'requested', 1, null)], 2)).toMatchObject({ kind: 'requested', text: 'First-light review requested: revision 2' });
    expect(reviewStatus([row(3, 'signed_off', 1, 2), row(4, 'requested', 3, null)], 4).detail).toContain('Review of revision 4 requested');
    expect(reviewStatus([], 1).kind).toBe('none');
  });
});
