import type { HazardId } from './hazards';

/** One line of the event sheet's checklist, with the hazard on /safety it answers. */
export interface ChecklistItem {
  text: string;
  hazard: HazardId;
  source: string;
  /** only for one family of coil; absent: for every coil */
  family?: 'spark-gap' | 'solid-state';
}

const TROUPE = 'professional performing troupe practice (Make: magazine)';

/** The precautions an operator signs off before a show or open day, in the order they are set up. */
export const eventChecklist: ChecklistItem[] = [
  {
    text: 'Hard perimeter marked out (rope or barrier) at the radius above, checked on the floor before the audience arrives.',
    hazard: 'audience',
    source: TROUPE,
  },
  {
    text: 'At least two operators present, both with hands on kill switches while the coil runs; power on and power off called aloud.',
    hazard: 'audience',
    source: TROUPE,
  },
  { text: 'A visual power indicator the audience and crew can see, lit whenever the supply is live.', hazard: 'audience', source: TROUPE },
  {
    text: 'Kill switch or dead-man push button tested; key switch or lockout on the supply, key held by the lead operator.',
    hazard: 'supply',
    source: 'Tesla Coil Mailing List, 2000 and 2012',
  },
  {
    text: 'Tank capacitors fitted with bleeders; grounded shorting stick at hand; no one touches the bank until each capacitor is shorted.',
    hazard: 'stored-energy',
    source: 'Tesla Coil Mailing List, 1999 and 2000',
    family: 'spark-gap',
  },
  {
    text: 'Bus capacitors discharged through a resistor and checked with a meter before anyone reaches into the driver; the bus bleeder fitted and tested.',
    hazard: 'rectified-bus',
    source: 'common practice of solid-state coil builders',
    family: 'solid-state',
  },
  {
    text: 'Interrupter linked to the controller by optical fibre only; the operator handles no wire that reaches the bridge.',
    hazard: 'rectified-bus',
    source: 'common practice of solid-state coil builders',
    family: 'solid-state',
  },
  {
    text: 'Over-current trip set and checked with a current transformer at low bus voltage; interrupter limited to the on-time and repetition rate the design was checked at.',
    hazard: 'rectified-bus',
    source: 'common practice of solid-state coil builders',
    family: 'solid-state',
  },
  {
    text: 'Scopes and meters on the driver connected through isolation (current transformer, isolated or differential probe), never a grounded probe on the bridge.',
    hazard: 'rectified-bus',
    source: 'common practice of solid-state coil builders',
    family: 'solid-state',
  },
  {
    text: 'Dedicated RF ground connected: secondary base, strike rail, safety gaps and transformer case; control electronics on the mains ground.',
    hazard: 'interference',
    source: 'Tesla Coil Mailing List, 1999',
    family: 'spark-gap',
  },
  {
    text: 'Dedicated RF ground connected: secondary base and strike rail; the driver and its controller on the mains safety earth, not the RF ground.',
    hazard: 'interference',
    source: 'Tesla Coil Mailing List, 1999; common practice of solid-state coil builders',
    family: 'solid-state',
  },
  {
    text: 'Room ventilated for ozone and nitrogen oxides; pauses of a few minutes between runs.',
    hazard: 'ozone',
    source: 'Bert Hickman, Tesla Coil Mailing List, 2014',
  },
  { text: 'Hearing protection for the crew and offered to the audience; hand signals agreed.', hazard: 'noise', source: 'common practice; troupe practice' },
  {
    text: 'Signs at the entrance and at the perimeter: people with pacemakers or other implanted medical devices must keep away.',
    hazard: 'implants',
    source: 'Tesla Coil Mailing List, 2000',
  },
  { text: 'Spark gap enclosed; no one looks into it while it fires.', hazard: 'uv', source: 'community safety warning page', family: 'spark-gap' },
  {
    text: 'Fire extinguisher rated for electrical fires beside the operators; flammable material cleared from the strike area.',
    hazard: 'fire',
    source: 'community safety warning page',
  },
  {
    text: 'Phones, computers, instruments and the venue’s own electronics (dimmers, sound desk) kept away or isolated.',
    hazard: 'interference',
    source: 'Tesla Coil Mailing List, 2002',
  },
  {
    text: 'Visitors do not enter the builder’s area without permission and touch nothing; children supervised; no pets.',
    hazard: 'audience',
    source: 'Teslathon visitor rules, 2016',
  },
];

/** The checklist for one kind of supply: the items for every coil and those of its family. */
export function eventChecklistFor(supplyKind: 'transformer' | 'solid-state' | null): ChecklistItem[] {
  const family = supplyKind === 'solid-state' ? 'solid-state' : 'spark-gap';
  return eventChecklist.filter((i) => i.family === undefined || i.family === family);
}
