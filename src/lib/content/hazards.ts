/**
 * The hazards of running a coil and the usual precautions, in plain words, each with where the
 * precaution comes from. Anchors are stable: other pages link to /safety#<id> beside the number
 * they concern.
 */

export type HazardId =
  | 'supply'
  | 'rectified-bus'
  | 'stored-energy'
  | 'rf-burns'
  | 'ozone'
  | 'uv'
  | 'fire'
  | 'noise'
  | 'implants'
  | 'interference'
  | 'audience';

export interface Precaution {
  text: string;
  /** who says so; "common practice" when the trade does it without a written source */
  source: string;
}

export interface Hazard {
  id: HazardId;
  title: string;
  /** what can happen, stated plainly */
  risk: string;
  precautions: Precaution[];
}

/** The community's reference sheet, cited by name throughout. */
export const SAFETY_SHEET =
  'the community safety sheet (Tesla Coil Mailing List, "Tesla Coils Safety Information", v1.1, 1996)';
const SHEET = 'community safety sheet (TCML, v1.1, 1996)';
const LIST = 'Tesla Coil Mailing List archive';
const WARNING_PAGE = 'a community safety warning page (hotstreamer.deanostoybox.com)';
const TROUPE = 'a professional performing troupe (Make: magazine, "High voltage: put safety first during your Tesla coil performance")';

export const hazards: Hazard[] = [
  {
    id: 'supply',
    title: 'Lethal supply voltage',
    risk:
      'The supply and the tank circuit can kill. A neon-sign or other high-voltage transformer delivers thousands of volts and may ' +
      'give no sign of being on except a quiet hum. The rectified mains bus of a solid-state driver can kill as well.',
    precautions: [
      { text: 'Never adjust anything with the power on, however small the change.', source: `${LIST}, 2000; ${SHEET}` },
      { text: 'Unplug the supply physically rather than trusting a switch or a relay.', source: `${LIST}, 2000` },
      { text: 'Use a key switch and proper fusing; ground every metal case.', source: `${LIST}, 2000; ${SHEET}` },
      { text: 'Never work alone, and have someone present who knows how to cut the power.', source: `${LIST}, 2000` },
      {
        text:
          'Ground-fault protection on a modern sign transformer is a safety feature required by electrical codes to prevent sign fires. ' +
          'Do not defeat it. If it trips, choose a supply intended for the job and get professional advice.',
        source: `${LIST}, 2002 (NEC 1999 / UL 2161)`,
      },
    ],
  },
  {
    id: 'rectified-bus',
    title: 'Rectified-mains bus of a solid-state driver',
    risk:
      'A solid-state driver rectifies the mains onto a DC bus of a few hundred volts with no isolation: the bridge, its gate drivers and ' +
      'anything clipped to them sit at mains potential, and the bus capacitors hold a lethal charge for minutes after switch-off.',
    precautions: [
      {
        text: 'After switch-off, discharge the bus capacitors through a power resistor and check with a meter before touching the bridge.',
        source: 'common practice of solid-state coil builders',
      },
      {
        text: 'Measure through isolation: a current transformer on the primary, an isolated or differential probe on the bridge; never a grounded scope clipped to the bus.',
        source: 'common practice of solid-state coil builders',
      },
      { text: 'Run the interrupter to the controller over optical fibre, so no wire links the operator to the bridge.', source: 'common practice of solid-state coil builders' },
      { text: 'Feed the bridge through a fuse and an isolating switch you can reach; bring the bus up slowly (a variac or a soft-start) the first time.', source: 'common practice of solid-state coil builders' },
    ],
  },
  {
    id: 'stored-energy',
    title: 'Stored energy in capacitors',
    risk:
      'A charged tank capacitor can deliver a lethal shock. It can hold its charge for days, regain some charge after being shorted ' +
      '(dielectric absorption), and pick up charge from the atmosphere. Capacitors can also fail violently.',
    precautions: [
      { text: 'Fit a bleeder resistor across each capacitor of a bank (about 10 MΩ, ½ W each).', source: `${LIST}, 2000 (common practice)` },
      {
        text:
          'Bleeders can open. Before touching, short each capacitor by hand with a grounded shorting stick, working from the low-potential ' +
          'end to the high-potential end, then clip each point to ground and leave the clips on while you work.',
        source: `${LIST}, 1999 and 2000`,
      },
      { text: 'Store capacitors with a shorting wire across their terminals.', source: `${LIST}, 1997` },
      { text: 'Put a barrier around capacitors and rotary gaps.', source: `${LIST}, 1996 (common practice)` },
    ],
  },
  {
    id: 'rf-burns',
    title: 'RF burns that may not be felt',
    risk:
      'High-frequency current can cause deep burns that may not be felt at the time, because nerves barely sense current far above ' +
      'about 700 Hz. Such burns heal slowly. The belief that skin effect protects you is false comfort.',
    precautions: [
      { text: 'Never touch the secondary, the topload or an arc while the coil can run.', source: WARNING_PAGE },
      { text: 'Do not imitate photographs of people touching or standing under sparks: they are faked or staged under special conditions.', source: 'genapro.com, Tesla coil page' },
      { text: 'Keep the strike rail and secondary base bonded to a dedicated RF ground.', source: `${LIST}, 1999` },
    ],
  },
  {
    id: 'ozone',
    title: 'Ozone and nitrogen oxides',
    risk:
      'Sparks make ozone; larger, hotter arcs and the spark gap make nitrogen oxides, including the brown gas NO₂. They cause irritation, ' +
      'headache and light-headedness. Smell is no guide, because the nose adapts.',
    precautions: [
      { text: 'Ventilate the room. Ozone decays in minutes, so pause a few minutes between runs; nitrogen oxides persist much longer.', source: `Bert Hickman, ${LIST}, 2014` },
      { text: 'Do not run a coil of more than about 1 kW in a closed room.', source: `${LIST}, 1996 (one experienced member)` },
      { text: 'Stainless-steel gap electrodes add further fumes; keep the gap ventilated.', source: `${LIST}, 1998` },
    ],
  },
  {
    id: 'uv',
    title: 'Ultraviolet light and X-rays',
    risk:
      'A spark gap is as bright as an arc welder and emits ultraviolet light that can harm the eyes. Discharges striking vacuum devices, ' +
      'such as bulbs or tubes, can produce X-rays.',
    precautions: [
      { text: 'Enclose the spark gap and do not look at it while it fires.', source: `${WARNING_PAGE}; Johnson, "Tesla coil impedance"` },
      { text: 'Do not strike arcs onto vacuum tubes or bulbs.', source: `${SHEET}, §5` },
    ],
  },
  {
    id: 'fire',
    title: 'Fire',
    risk: 'Arcs ignite paper, cloth, dust, solvents and many plastics. A failing capacitor or a sign transformer can start a fire on its own.',
    precautions: [
      { text: 'Clear flammable material from the strike area and keep an extinguisher rated for electrical fires at hand.', source: WARNING_PAGE },
      { text: 'Cut the power before fighting a fire.', source: WARNING_PAGE },
    ],
  },
  {
    id: 'noise',
    title: 'Noise',
    risk: 'Spark-gap and burst-mode solid-state coils are loud enough to damage hearing, and too loud for speech near them.',
    precautions: [
      { text: 'Wear hearing protection, and give it to anyone near the coil.', source: 'common practice' },
      { text: 'Agree hand signals beforehand, because the crew cannot hear each other while the coil runs.', source: TROUPE },
    ],
  },
  {
    id: 'implants',
    title: 'Pacemakers and implanted medical devices',
    risk: 'Strong electric and magnetic fields can interfere with pacemakers, hearing aids and other implants, unpredictably.',
    precautions: [
      { text: 'Keep people with implanted medical devices well away from a running coil.', source: WARNING_PAGE },
      { text: 'At public events, put up signs for people with implants, and consider asking for consent.', source: `${LIST}, 2000` },
    ],
  },
  {
    id: 'interference',
    title: 'Interference with electronics and radio',
    risk:
      'A coil can damage nearby electronics (one destroyed a theatre dimmer board 15 ft away), home devices and unprotected measuring ' +
      'instruments. Its radio-frequency emissions can be illegal, for example under FCC rules in the US.',
    precautions: [
      {
        text:
          'Use a dedicated, heavy RF ground, not the house wiring ground, with a short return path; connect the secondary base, strike rail, ' +
          'safety-gap centres and transformer case to it, and put control electronics on the mains ground.',
        source: `${LIST}, 1999`,
      },
      { text: 'A conductive sheet directly under the coil reduces coupling into nearby wiring.', source: `Jim Lux, ${LIST}, 2016` },
      { text: 'Keep computers, phones and instruments away, or isolate them, and run at low power until you know the reach.', source: 'common practice' },
      { text: 'Check your country’s rules on radio-frequency emissions before running in public.', source: 'common practice' },
    ],
  },
  {
    id: 'audience',
    title: 'Distance and audiences',
    risk: 'Arcs can jump farther than expected, and people, children and pets wander. A visitor who reaches a running coil can be killed or burned.',
    precautions: [
      { text: 'Keep a hard perimeter at least 10 ft beyond the longest arc the coil can make.', source: TROUPE },
      {
        text: 'Have at least two operators with hands on kill switches; call power on and off aloud; show a visual power indicator.',
        source: TROUPE,
      },
      { text: 'Use a dead-man push button with lockout, and consider a cage sized to the coil.', source: `${LIST}, 2012` },
      { text: 'No entry to a builder’s area without permission; touch nothing; supervise children.', source: 'Teslathon visitor rules, Museum of Technology, 2016' },
      { text: 'Never run with children or pets near the coil; recommend experienced supervision for young builders.', source: SHEET },
    ],
  },
];
