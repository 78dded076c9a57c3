export { parseTouchstone, unitFactor, magnitude } from './parse-touchstone';
export { parseSweepCsv } from './parse-csv';
export { parseSweepFile, sweepFileKind, touchstoneTrace, type SweepTrace } from './sweep';
export { findResonances, guessMode, type Resonance, type ResonanceMode, type ResonanceOptions } from './resonance';
export type { Complex, DataFormat, FrequencyUnit, ParameterType, ParseResult, Sweep, SweepParseError, TouchstoneData } from './types';
