/** Reminders printed on the build sheet, each with where the practice comes from. */
export interface SheetNote {
  text: string;
  source: string;
}

export const WINDING_NOTES: readonly SheetNote[] = [
  { text: 'Wipe the form with solvent at most; never wind onto tacky varnish.', source: 'TCML 1999 (pupman.com 1999/July/msg00122)' },
  { text: 'Keep the wire taut through a soft guide that lags slightly behind the turning form; get the first turns right.', source: 'gentlemanphysicist.com/?p=16' },
  { text: 'Pack each new turn against the last with a plastic scraper: a loose or raised turn is where racing sparks start.', source: 'TCML 2010/Aug/msg00025; G. Lau, TCML 1999/November/msg00043' },
  { text: 'Never bring a lead through a hole into the tube: arcs follow it inside.', source: 'laushaus.com/tesla/secondary.htm' },
  { text: 'Counting wires across the coil gives one more than the turns (fencepost); check the count against the height marks below.', source: 'amfone.net forum; common practice' },
];

export const COATING_NOTES: readonly SheetNote[] = [
  { text: 'Coat with oil-based polyurethane (water-based does not stick), two-part epoxy or water-free acrylic.', source: 'laushaus.com/tesla/secondary.htm; R. Quick, TCML 1995/november/msg00085' },
  { text: 'Apply coats until the wire ridges disappear, turning the coil slowly while each coat dries to avoid runs; builders report several to 15 coats.', source: 'R. Quick, TCML 1995; drsparksite.com; jeff7.com' },
  { text: 'Seal both ends of the form, ideally hermetically.', source: 'R. Quick, TCML 1995/november/msg00085' },
  { text: 'The coating mainly stops turns shifting and protects the winding; its electrical benefit is uncertain.', source: 'laushaus.com/tesla/secondary.htm' },
];

const SAFETY_GAP_AT_9KV = 'Safety gap from each high-voltage terminal to the grounded case, about 1/4 in (6 mm) on a 9 kV transformer.';

/** The source's safety-gap setting: 1/4 in (6.35 mm) for a 9 kV transformer. */
export const SAFETY_GAP_REFERENCE = { gap: 6.35e-3, voltage: 9000 } as const;

/**
 * The protection notes for a transformer of this RMS output voltage: the safety-gap starting width scaled in
 * proportion from the source's 1/4 in at 9 kV (the proportion is common practice, a starting point only: the
 * setting procedure that follows decides the gap).
 */
export function transformerProtectionNotes(voltageRms: number | null): readonly SheetNote[] {
  if (voltageRms === null || !(voltageRms > 0)) return TRANSFORMER_PROTECTION_NOTES;
  const gap = (SAFETY_GAP_REFERENCE.gap * voltageRms) / SAFETY_GAP_REFERENCE.voltage;
  const kv = Number((voltageRms / 1000).toPrecision(3));
  const text = `Safety gap from each high-voltage terminal to the grounded case: start near ${(gap * 1000).toFixed(1)} mm (${(gap / 0.0254).toFixed(2)} in) for this ${kv} kV transformer, scaled in proportion from about 1/4 in (6 mm) on a 9 kV transformer (the proportion is common practice; set it as below).`;
  return TRANSFORMER_PROTECTION_NOTES.map((n) => (n.text === SAFETY_GAP_AT_9KV ? { ...n, text } : n));
}

export const TRANSFORMER_PROTECTION_NOTES: readonly SheetNote[] = [
  { text: 'Filter between the transformer and the tank: a 1 kΩ 50 W wire-wound resistor in series with each high-voltage lead (100 W for several transformers in parallel).', source: 'hotstreamer.deanostoybox.com/greg/filter.htm' },
  { text: 'Bypass capacitors of 1 nF / 10 kV from each lead to the grounded case: two up to about 9 kV, four above.', source: 'hotstreamer.deanostoybox.com/greg/filter.htm' },
  { text: SAFETY_GAP_AT_9KV, source: 'hotstreamer.deanostoybox.com/greg/filter.htm' },
  { text: 'Setting it: disconnect the tank; set the gap so it just fails to fire at the highest input the transformer will see; never widen it later to chase spark length; in use, open the main gap until the safety gap fires only now and then.', source: 'G. Reynolds, TCML 2005/Oct/msg00473' },
  { text: 'Build the filter on polyethylene board, not PVC: surface tracking matters more than air spacing.', source: 'D. C. Cox, TCML 2005/Oct/msg00483' },
  { text: 'Ground the transformer case and centre tap to the RF ground.', source: 'TCML 1995/may/msg00010' },
  { text: 'Ground-fault protection built into a transformer is a safety feature: do not bypass it; choose a supply meant for this use and take professional advice.', source: 'NEC 1999 / UL 2161; TCML 2002/May/msg00238' },
];

export const SOLID_STATE_NOTES: readonly SheetNote[] = [
  { text: 'The rectified mains bus can kill: discharge the bus capacitors before touching, and fuse the mains input.', source: 'common practice' },
  { text: 'Size the tank bank by its peak and RMS current and temperature rise, with about 10–20 % voltage headroom, not by DC rating alone.', source: 'DRSSTC design guide, MMC chapter (kaizerpowerelectronics.dk)' },
];

export const BANK_NOTES: readonly SheetNote[] = [
  { text: 'Use pulse-rated polypropylene (metal-foil) capacitors only; other types fail.', source: 'coreyonline.tripod.com/2cents.html' },
  { text: 'Wrap each bleeder’s leads around the capacitor’s leads so a failed solder joint cannot drop it.', source: 'T. Fritz, TCML 2000/FEBRUARY/MSG01055' },
  { text: 'Leave about 1/8 in of air between capacitors in a string and at least 3/4 in between strings; do not cross-connect strings; mount the bank away from metal.', source: 'T. Fritz, TCML 2000' },
  { text: 'Bleeders can open: short each capacitor by hand before touching.', source: 'TCML 2000/February/msg00180' },
];

export const SAFETY_CHECKLIST: readonly string[] = [
  'Local electrical codes, venue and insurer rules and licensed practice come before this sheet; mains wiring, permanent installations and public shows may need a licensed electrician or formal approval. This sheet gives estimates, not safety certification.',
  'Never adjust anything with power on; unplug rather than trust a switch; use a key switch and proper fusing.',
  'Ground all metal cases; run a dedicated RF ground (heavy cable to ground rods), separate from the mains safety earth, for the secondary base, strike rail, safety gaps and transformer case.',
  'Short every tank capacitor with a grounded shorting stick before touching, working from the low-potential end; leave the clips on while working.',
  'Never work alone; keep children, pets and anyone with a pacemaker or other implant well away.',
  'Keep people well beyond the longest arc (one performing troupe keeps at least 10 ft beyond it) and run with hearing protection and ventilation (ozone, NOx).',
  'Enclose the spark gap (UV as bright as a welding arc) and keep an extinguisher for electrical fires at hand, used only after the power is off.',
  'First light at reduced power on a variac; step the tap a turn at a time with the power off and the bank shorted.',
];
