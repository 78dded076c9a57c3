/** The steps after the last turn, as the session's checklist shows them (TRADE practice; sources beside each). */
export const FINISH_STEPS = {
  baseEndFastened:
    'Bottom lead fastened to the base terminal, outside the form (never through a hole into the tube: arcs follow inside; laushaus.com secondary notes).',
  topEndFastened: 'Top lead fastened to the top terminal that joins the topload, with no loose turn at the end of the winding (pupman.com list, 1999).',
} as const;

export type FinishStep = keyof typeof FINISH_STEPS;

/** Coating advice: thin coats until the ridges of the wire disappear, turning the coil slowly while each dries (R. Quick, pupman.com list, 1995). */
export const COATING_ADVICE =
  'Oil-based polyurethane (water-based does not stick), two-part epoxy or water-free acrylic, in thin coats until the wire ridges disappear; turn the coil slowly while each coat dries so it does not run. Builders report from several up to 15 coats.';

/** The usual cautions about coating solvents, shown beside the coats and drying time. */
export const SOLVENT_CAUTIONS = [
  'Coating solvents and their vapour are flammable: no flames, heaters or sparking tools nearby, and never run the coil until the coating has fully cured.',
  'Work with good ventilation (outdoors or with a fan drawing air out of the room) and follow the product’s label for gloves and respiratory protection.',
  'Let the last coat cure for the time the label gives before the winding goes near high voltage; a soft coat traps solvent and moisture.',
] as const;

/** Most coats and longest drying time a checklist accepts, so a typo is caught. */
export const MAX_COATS = 50;
export const MAX_DRYING_HOURS = 24 * 14;
