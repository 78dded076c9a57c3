/**
 * Wording of the safety notes shown beside the numbers they concern. Shared by SafetyNote.astro and
 * SafetyNote.tsx so server pages and islands say exactly the same thing. Plain and factual on purpose.
 */
export type SafetyKind = 'stored-energy' | 'supply' | 'bus' | 'rf' | 'general';

export type SafetyText = { title: string; body: string };

export const safetyNotes: Record<SafetyKind, SafetyText> = {
  'stored-energy': {
    title: 'Stored energy can kill',
    body:
      'A charged tank capacitor can deliver a lethal shock, can hold its charge for days, and can regain some charge after being shorted. ' +
      'Fit bleeder resistors, and short each capacitor to ground by hand with a grounded shorting stick before you touch the bank.',
  },
  supply: {
    title: 'Lethal supply',
    body:
      'The supply delivers voltages that can kill, and it may give no sign of being on. Never adjust anything with power on; unplug it rather than trusting a switch. ' +
      'Use a key switch and proper fusing, ground all metal cases, and never work alone. Ground-fault protection on a supply is a safety feature: do not defeat it.',
  },
  bus: {
    title: 'Rectified-mains bus',
    body:
      'A bridge-driven coil rectifies the mains straight onto its bus: the bridge, its drivers and the bus sit at mains potential, and the bus ' +
      'capacitors hold a lethal charge after switch-off. Discharge them through a resistor and check with a meter before touching. Measure ' +
      'through isolation (a current transformer, an isolated or differential probe), never with a grounded scope clipped to the bridge, ' +
      'and run the interrupter to the controller over optical fibre.',
  },
  rf: {
    title: 'RF burns and interference',
    body:
      'High-frequency current can cause deep burns that may not be felt at the time. Never touch the secondary, topload or arcs while the coil can run. ' +
      'Strong fields can disturb pacemakers and hearing aids and can damage nearby electronics.',
  },
  general: {
    title: 'Estimates, not certification',
    body:
      'High voltage, stored capacitor energy and RF can kill or burn. Coilwright gives estimates, not safety certification: local electrical codes, ' +
      'venue and insurer rules and licensed practice come first. Mains wiring, permanent installations and public shows may need a licensed electrician or formal approval.',
  },
};

export const SAFETY_PAGE = '/safety';
