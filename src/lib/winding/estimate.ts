/** Where a height reading is measured from. */
export const HEIGHT_DATUMS = ['form-end', 'first-turn'] as const;
export type HeightDatum = (typeof HEIGHT_DATUMS)[number];

export const DATUM_LABELS: Record<HeightDatum, string> = {
  'form-end': 'from the end of the form',
  'first-turn': 'from the first turn',
};

/** A height read off a steel rule or tape to the nearest millimetre: ±1 mm (common practice). */
export const HEIGHT_RESOLUTION = 1e-3;
/**
 * Allowance for the pitch of real turns against the nominal one: ±1 % of the wound height (our allowance; from
 * memory: enamel build and packing vary by about this much along a close-wound winding).
 */
export const PITCH_VARIATION = 0.01;
/** The turn in progress: a counter shows completed revolutions while the wire already climbs the next one. */
export const TURN_IN_PROGRESS = 1;

/** The tolerance a comparison of counter and height uses, in words, for the page and the export. */
export const TOLERANCE_TEXT =
  'height read to ±1 mm, plus ±1 % pitch variation along the winding, plus the turn in progress, turned into turns at this pitch';

export interface HeightEstimate {
  /** height of the winding above its first turn, m */
  windingHeight: number;
  /** turns the height holds at the pitch (not rounded) */
  turns: number;
  /** ± turns the height cannot resolve */
  tolerance: number;
}

/**
 * Turns on the form from a measured height. Measured from the form end, the bare start of the form (the start
 * offset) is subtracted first; measured from the first turn it is the winding's own height. Turns = height /
 * pitch, the build sheet's checkpoint rule (checkpoint n sits n × pitch above the first turn). The tolerance in
 * turns is (1 mm + 1 % of the height) / pitch + 1.
 * @example turnsFromHeight(0.1, 'first-turn', 0.0381, 0.0005) // { windingHeight: 0.1, turns: 200, tolerance: 5 }
 */
export function turnsFromHeight(height: number, datum: HeightDatum, startOffset: number, pitch: number): HeightEstimate {
  if (!(pitch > 0)) throw new RangeError('turnsFromHeight needs a pitch above 0');
  const windingHeight = datum === 'form-end' ? height - startOffset : height;
  const turns = windingHeight / pitch;
  const tolerance = (HEIGHT_RESOLUTION + PITCH_VARIATION * Math.max(0, windingHeight)) / pitch + TURN_IN_PROGRESS;
  return { windingHeight, turns, tolerance };
}

export type CountFlag = {
  /** the counter shows fewer turns than the height holds, or more */
  direction: 'counter-low' | 'counter-high';
  /** counter − height estimate, turns */
  difference: number;
  tolerance: number;
  cause: string;
  advice: string;
  /** the turns the height says are on the form, rounded */
  correctedCount: number;
};

/** Counter and height compared: a flag when they disagree by more than the height can explain, else null. */
export function checkCount(counter: number, estimate: HeightEstimate): CountFlag | null {
  const difference = counter - estimate.turns;
  if (Math.abs(difference) <= estimate.tolerance) return null;
  const correctedCount = Math.max(0, Math.round(estimate.turns));
  return difference < 0
    ? {
        direction: 'counter-low',
        difference,
        tolerance: estimate.tolerance,
        cause: 'The counter is missing counts at this speed (a cam or bumper counter misses revolutions when the form turns fast; common practice).',
        advice: 'Slow the winder down, or lengthen the actuator’s dwell so each revolution holds the contact longer.',
        correctedCount,
      }
    : {
        direction: 'counter-high',
        difference,
        tolerance: estimate.tolerance,
        cause: 'The counter shows more turns than the height holds: a bouncing contact counting twice, or turns riding over each other (common practice).',
        advice: 'Look along the winding for a turn lying on another, and check the counter’s contact for bounce.',
        correctedCount,
      };
}

export interface ReadingInput {
  counter: number;
  height: number | null;
  datum: HeightDatum | null;
}

export interface ReadingAnalysis {
  estimate: HeightEstimate | null;
  flag: CountFlag | null;
  /** best figure for the turns on the form: the height's count when it was read, otherwise the counter plus the offset found at the last height */
  bestTurns: number;
}

/**
 * Each reading in order with its height estimate, its flag and the best count of turns. A counter that has
 * missed counts keeps missing them, so after a height reading the offset it found is carried to the readings
 * that follow without a height.
 */
export function analyseReadings(readings: readonly ReadingInput[], startOffset: number, pitch: number): ReadingAnalysis[] {
  let offset = 0;
  return readings.map((r) => {
    if (r.height === null || r.datum === null) return { estimate: null, flag: null, bestTurns: r.counter + offset };
    const estimate = turnsFromHeight(r.height, r.datum, startOffset, pitch);
    const flag = checkCount(r.counter, estimate);
    offset = flag ? flag.correctedCount - r.counter : 0;
    return { estimate, flag, bestTurns: flag ? flag.correctedCount : r.counter };
  });
}

/** The highest height a reading may give by its datum: the form's length, less the start offset from the first turn. */
export function maxHeight(datum: HeightDatum, formLength: number, startOffset: number): number {
  return datum === 'form-end' ? formLength : formLength - startOffset;
}
