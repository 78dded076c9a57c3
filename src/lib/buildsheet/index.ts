export {
  buildSheet,
  suggestBank,
  MIN_END_MARGIN,
  DEFAULT_END_MARGIN,
  BLEEDER_RATED_POWER,
  COMMON_BANK_UNIT,
  MAX_CHECKPOINTS,
  type BuildSheet,
  type BuildSheetOptions,
  type BankLayout,
  type Checkpoint,
} from './sheet';
export { sheetSections, type SheetSection, type SheetRow, type SheetTable, type SheetCaution } from './sections';
export { suggestSpool, SPOOL_SIZES_KG, SPOOL_SIZES_LB, type SpoolSuggestion } from './spool';
// the request body's schema comes from the API contracts, so that the calibration helpers stay free of zod
export { calibrationBodySchema as calibrationSchema } from '../api/contracts/measurements';
export {
  mergeCalibration,
  readCalibration,
  calibratedTuning,
  type Calibration,
  type CalibrationInput,
  type CalibratedTuning,
} from './calibration';
export { buildSheetQuerySchema, type BuildSheetQuery } from './query';
export * as sheetFormat from './format';
export type { SheetNote } from './notes';
