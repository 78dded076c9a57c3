import { METRES_PER_INCH } from '../constants';
import { awgDiameter, awgFromDiameter } from './awg';

/** The kind of enamel film: none, single (grade 1) or heavy (grade 2) build. */
export type InsulationBuild = 'bare' | 'single' | 'heavy';

/** Where the film-build increments come from; shown to the user beside any preset diameter. */
export const INSULATION_SOURCE =
  'Typical enamel film-build increments for round magnet wire, single (grade 1) and heavy (grade 2) build, ' +
  'after NEMA MW 1000 / IEC 60317 (from memory, not checked against the standard). ' +
  'Measure your wire or enter its insulated diameter when it matters.';

/**
 * Typical increase of the overall diameter over the bare copper, per AWG size, in inches (from
 * memory). Values lie between the minimum and maximum increases of the standards' grades; they are
 * a planning aid, not a specification.
 */
export const FILM_BUILD_TABLE: ReadonlyArray<{ awg: number; single: number; heavy: number }> = [
  { awg: 8, single: 0.0019, heavy: 0.0037 },
  { awg: 10, single: 0.0018, heavy: 0.0035 },
  { awg: 12, single: 0.0017, heavy: 0.0033 },
  { awg: 14, single: 0.0016, heavy: 0.0031 },
  { awg: 16, single: 0.0015, heavy: 0.0029 },
  { awg: 18, single: 0.0014, heavy: 0.0027 },
  { awg: 20, single: 0.0013, heavy: 0.0025 },
  { awg: 22, single: 0.0012, heavy: 0.0023 },
  { awg: 24, single: 0.0011, heavy: 0.0021 },
  { awg: 26, single: 0.001, heavy: 0.0019 },
  { awg: 28, single: 0.0009, heavy: 0.0017 },
  { awg: 30, single: 0.0008, heavy: 0.0015 },
  { awg: 32, single: 0.0007, heavy: 0.0013 },
  { awg: 34, single: 0.0006, heavy: 0.0011 },
  { awg: 36, single: 0.0005, heavy: 0.0009 },
  { awg: 38, single: 0.0004, heavy: 0.0007 },
  { awg: 40, single: 0.0003, heavy: 0.0006 },
];

/**
 * Overall diameter of enamelled round wire, in metres.
 *
 * Method: the bare diameter plus the film-build increment of {@link FILM_BUILD_TABLE}, interpolated
 * linearly in gauge number (so any bare diameter works, not only whole AWG sizes) and held at the
 * table's end values outside AWG 8–40. Source: {@link INSULATION_SOURCE} (from memory).
 *
 * Domain: bare > 0. @example insulatedDiameter(awgDiameter(24), 'heavy') // ≈ 5.64e-4 (0.564 mm)
 */
export function insulatedDiameter(bare: number, build: InsulationBuild): number {
  if (!(bare > 0) || !Number.isFinite(bare)) throw new RangeError(`bare wire diameter must be positive, got ${bare}`);
  if (build === 'bare') return bare;
  const gauge = awgFromDiameter(bare);
  const t = FILM_BUILD_TABLE;
  let increment: number;
  if (gauge <= t[0].awg) increment = t[0][build];
  else if (gauge >= t[t.length - 1].awg) increment = t[t.length - 1][build];
  else {
    let i = 0;
    while (t[i + 1].awg < gauge) i++;
    const f = (gauge - t[i].awg) / (t[i + 1].awg - t[i].awg);
    increment = t[i][build] + f * (t[i + 1][build] - t[i][build]);
  }
  return bare + increment * METRES_PER_INCH;
}

/** Convenience: overall diameter of an AWG size with the given build. @example insulatedDiameterAwg(24, 'bare') // 5.1054e-4 */
export function insulatedDiameterAwg(awg: number, build: InsulationBuild): number {
  return insulatedDiameter(awgDiameter(awg), build);
}
