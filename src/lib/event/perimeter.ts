/**
 * Perimeter arithmetic for a public run of a coil. Pure: lengths in metres in, metres out.
 *
 * The margin is the practice of one professional performing troupe: a hard perimeter at least 10 ft
 * beyond the longest arc the coil can make (Make: magazine, makezine.com, "High voltage: put safety first
 * during your Tesla coil performance"). It is a starting point; venue and insurer rules override it.
 */

const METRES_PER_FOOT = 0.3048;

/** 10 ft, the troupe's margin beyond the longest arc. */
export const PERIMETER_MARGIN = 10 * METRES_PER_FOOT;

export const PERIMETER_MARGIN_SOURCE =
  'at least 10 ft beyond the longest arc: the practice of one professional performing troupe ' +
  '(makezine.com, "High voltage: put safety first during your Tesla coil performance")';

export type SparkLengthOrigin = 'stated' | 'estimate' | 'design';

export interface PerimeterInput {
  /** longest arc expected, measured from the topload's surface */
  sparkLength: number;
  /** outside radius of the topload (arcs start there, not on the axis); 0 when there is none */
  toploadRadius?: number;
  /** clearance beyond the reach of the arcs; default {@link PERIMETER_MARGIN} */
  margin?: number;
}

export interface Perimeter {
  /** farthest an arc can reach from the coil's axis: topload radius + spark length */
  arcReach: number;
  margin: number;
  /** radius of the hard perimeter around the coil's axis */
  radius: number;
  diameter: number;
  /** length of barrier (rope, fence) needed for a full circle */
  circumference: number;
  /** floor area kept clear inside the perimeter */
  area: number;
}

/**
 * Radius of the keep-out circle around the coil: topload radius + longest arc + margin.
 * Throws a RangeError naming the bad quantity for negative or non-finite input.
 * Example: a 1.37 m arc, a 0.38 m topload radius → 1.75 m reach, 4.80 m radius.
 */
export function eventPerimeter(input: PerimeterInput): Perimeter {
  const toploadRadius = input.toploadRadius ?? 0;
  const margin = input.margin ?? PERIMETER_MARGIN;
  check('spark length', input.sparkLength);
  check('topload radius', toploadRadius);
  check('margin', margin);
  const arcReach = toploadRadius + input.sparkLength;
  const radius = arcReach + margin;
  return {
    arcReach,
    margin,
    radius,
    diameter: 2 * radius,
    circumference: 2 * Math.PI * radius,
    area: Math.PI * radius * radius,
  };
}

function check(name: string, value: number): void {
  if (!Number.isFinite(value) || value < 0) throw new RangeError(`${name} must be a finite length of zero or more, got ${value}`);
}

/**
 * Chooses the spark length the perimeter is drawn for: a length the user states wins (they may have
 * measured it), then the solver's estimate, then the streamer length the design itself assumes.
 */
export function chooseSparkLength(options: {
  stated: number | null;
  estimate: number | null;
  design: number | null;
}): { length: number; origin: SparkLengthOrigin } | null {
  if (options.stated !== null) return { length: options.stated, origin: 'stated' };
  if (options.estimate !== null && options.estimate > 0) return { length: options.estimate, origin: 'estimate' };
  if (options.design !== null && options.design > 0) return { length: options.design, origin: 'design' };
  return null;
}
