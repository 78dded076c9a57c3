export { windingPlan, type WindingPlan, type PitchSource } from './plan';
export { elapsedWinding, turnsAt, wireFor, liveFigures, type LiveFigures, type PauseSpan } from './live';
export {
  HEIGHT_DATUMS,
  DATUM_LABELS,
  HEIGHT_RESOLUTION,
  PITCH_VARIATION,
  TURN_IN_PROGRESS,
  TOLERANCE_TEXT,
  turnsFromHeight,
  checkCount,
  analyseReadings,
  maxHeight,
  type HeightDatum,
  type HeightEstimate,
  type CountFlag,
  type ReadingInput,
  type ReadingAnalysis,
} from './estimate';
export { FINISH_STEPS, COATING_ADVICE, SOLVENT_CAUTIONS, MAX_COATS, MAX_DRYING_HOURS, type FinishStep } from './checklist';
export { sessionCsv, type CsvSession } from './csv';

/** Why a winding stops, as the pause buttons offer them. */
export const PAUSE_REASONS = {
  guide: 'Move the guide',
  splice: 'Splice',
  break: 'Break',
} as const;
export type PauseReason = keyof typeof PAUSE_REASONS;
export const PAUSE_REASON_IDS = Object.keys(PAUSE_REASONS) as [PauseReason, ...PauseReason[]];
