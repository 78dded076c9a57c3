/**
 * The first-light checklist: what an experienced person checks on a coil before it is first powered, generated
 * from the design and its family. Pure: the same design gives the same list on the server, in the browser and in
 * tests. Item keys are stable, so findings stored against a key survive a change of wording.
 *
 * Sources: Coilwright's trade notes (shared practice of the coil-building community) §2.11 bleeders, §2.12 safety
 * gaps, §2.x strike rail ("leave a gap in the ring"), §4 hazards (RF ground apart from mains earth, never work alone,
 * hearing, fire); the event sheet's checklist for the perimeter and kill switches. Solid-state items are common
 * practice.
 */
import type { ChecklistFamily, ChecklistItem } from '../api/contracts/reviews';
import { formatSi } from '../format';

export type { ChecklistFamily, ChecklistItem };

export type Checklist = { family: ChecklistFamily; items: ChecklistItem[] };

type Loose = Record<string, unknown>;

const isRecord = (v: unknown): v is Loose => typeof v === 'object' && v !== null && !Array.isArray(v);

/** A quantity as the builder typed it ("12 kV" stays "12 kV"; a bare SI number gets its unit). */
function quoted(v: unknown, unit: string): string | null {
  if (typeof v === 'string' && v.trim()) return v.trim();
  if (typeof v === 'number' && Number.isFinite(v)) return formatSi(v, unit, 3);
  return null;
}

/** The family the checklist follows: a solid-state supply makes a solid-state coil; everything else is a spark-gap coil. */
export function checklistFamily(design: unknown): ChecklistFamily {
  const supply = isRecord(design) ? design.supply : undefined;
  return isRecord(supply) && supply.kind === 'solid-state' ? 'solid-state' : 'spark-gap';
}

function sparkGapItems(design: Loose): ChecklistItem[] {
  const supply = isRecord(design.supply) ? design.supply : {};
  const voltage = quoted(supply.voltage, 'V');
  const rail = isRecord(design.strikeRail) ? design.strikeRail : null;
  const railSize = rail ? quoted(rail.diameter, 'm') : null;
  return [
    {
      key: 'safety-gap',
      family: 'spark-gap',
      title: 'Safety gap set for the supply',
      detail: voltage
        ? `Safety gaps across the supply's output are set for this ${voltage} supply: they fire only occasionally with the main gap opened, and never in normal running.`
        : 'Safety gaps across the supply’s output are set for the supply in use: they fire only occasionally with the main gap opened, and never in normal running. The design has no supply entered; check against the transformer on the bench.',
    },
    {
      key: 'bleeders',
      family: 'spark-gap',
      title: 'Bleeders on the tank capacitors',
      detail: 'Every tank capacitor has a bleeder resistor fitted and measured; a grounded shorting stick is at hand, and each capacitor is shorted by hand before anyone touches the bank (a bleeder can open).',
    },
    {
      key: 'rf-ground',
      family: 'spark-gap',
      title: 'RF ground separate from mains earth',
      detail: 'The secondary base, strike rail and safety gaps go to a dedicated RF ground or counterpoise, not to the mains safety earth; the supply’s case stays on the mains earth.',
    },
    {
      key: 'strike-rail',
      family: 'spark-gap',
      title: 'Strike rail is not a closed ring',
      detail: rail
        ? `The strike rail${railSize ? ` (${railSize} across)` : ''} has a gap, so it is no shorted turn around the primary, and is connected to the RF ground.`
        : 'The design has no strike rail. If one is fitted on the bench, it has a gap (it must not be a closed ring) and is connected to the RF ground.',
    },
  ];
}

function solidStateItems(design: Loose): ChecklistItem[] {
  const supply = isRecord(design.supply) ? design.supply : {};
  const bus = quoted(supply.busVoltage, 'V');
  const busC = quoted(supply.busCapacitance, 'F');
  const limit = quoted(supply.currentLimit, 'A');
  return [
    {
      key: 'bus-discharge',
      family: 'solid-state',
      title: 'Bus capacitors discharge',
      detail: `The bus${busC ? ` (${busC}` : ''}${busC && bus ? ` at ${bus})` : busC ? ')' : bus ? ` at ${bus}` : ''} has a bleeder that brings it to a safe voltage within a known time, and the bus is measured with a meter before anyone touches the bridge.`,
    },
    {
      key: 'measurement-isolation',
      family: 'solid-state',
      title: 'Isolation for measurement',
      detail: 'Scope measurements on the bridge use a differential probe or an isolated instrument; no instrument is floated by lifting its earth.',
    },
    {
      key: 'fibre-interrupter',
      family: 'solid-state',
      title: 'Interrupter on optical fibre',
      detail: 'The interrupter reaches the driver over optical fibre only, so no wire runs from the operator’s hand to the coil.',
    },
    {
      key: 'trip-set',
      family: 'solid-state',
      title: 'Over-current trip set',
      detail: limit
        ? `The over-current trip is set to the design’s ${limit} and was seen to act on a low-voltage test before full bus voltage.`
        : 'The design has no over-current trip entered: set one below the switches’ pulsed rating and see it act on a low-voltage test before full bus voltage.',
    },
  ];
}

const commonItems: ChecklistItem[] = [
  {
    key: 'perimeter',
    family: 'both',
    title: 'Perimeter from the event sheet',
    detail: 'A hard perimeter (rope or barrier) is marked on the floor at the radius the event sheet gives for this design, and checked before anyone else comes in.',
  },
  {
    key: 'key-switch-stop',
    family: 'both',
    title: 'Key switch and emergency stop',
    detail: 'The supply has a key switch held by the operator, and an emergency stop (or dead-man button) within reach that was tested to cut the supply.',
  },
  {
    key: 'hearing-eyes',
    family: 'both',
    title: 'Hearing and eye protection',
    detail: 'Hearing protection for everyone near the coil; eye protection, and no one looks into a firing spark gap.',
  },
  {
    key: 'fire-extinguisher',
    family: 'both',
    title: 'Fire extinguisher',
    detail: 'An extinguisher rated for electrical fires stands beside the operator, used only with the power off; flammable material is cleared from the strike area.',
  },
  {
    key: 'not-alone',
    family: 'both',
    title: 'Nobody works alone',
    detail: 'At least two people are present whenever the supply is connected; power on and power off are called aloud.',
  },
];

/** The checklist for one design (as stored; a design that no longer validates still gets its family's list). */
export function firstLightChecklist(design: unknown): Checklist {
  const d = isRecord(design) ? design : {};
  const family = checklistFamily(d);
  const own = family === 'solid-state' ? solidStateItems(d) : sparkGapItems(d);
  return { family, items: [...own, ...commonItems] };
}
