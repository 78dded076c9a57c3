import { figureOf, resultFigure, type ResultFigure, type ResultFigureId } from '../design/figures';
import { formatQuantity } from '../format/quantity';

/** The key results a builder compares and posts for review; labels and accessors come from the result figures. */
const KEY_FIGURES: readonly ResultFigureId[] = [
  'loadedFrequency',
  'secondaryFrequency',
  'targetFrequency',
  'tapTurns',
  'k',
  'secondaryInductance',
  'selfCapacitance',
  'toploadCapacitance',
  'wireLength',
  'windingLength',
  'aspectRatio',
  'primaryInductance',
  'mutualInductance',
  'tankCapacitance',
  'tankVoltageRating',
  'tankEnergy',
  'resonantCapacitance',
];

export type Figure = ResultFigure;
export const keyFigures: readonly Figure[] = KEY_FIGURES.map(resultFigure);

/** Library pages show results to three significant figures, lengths in metric. */
export const LIBRARY_DIGITS = 3;

export function figureValue(result: unknown, f: Figure): number | null {
  return figureOf(result, f);
}

export function showFigure(f: Figure, value: number | null): string {
  return formatQuantity(value, f.kind, { digits: LIBRARY_DIGITS });
}
