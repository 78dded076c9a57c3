export { MISSING, formatSignificant, formatFixed, formatPercent, formatTurns } from './number';
export { siParts, formatSi } from './si';
export {
  METRES_PER_INCH,
  METRES_PER_FOOT,
  lengthParts,
  formatLength,
  formatLengthBoth,
  lengthInputText,
  type UnitSystem,
  type LengthParts,
} from './length';
export { formatQuantity, axisUnit, scaledAxisUnit, siUnitOfDisplay, type DisplayKind, type FormatOptions } from './quantity';
export { convertLengthText, readLength, lengthsInSystem, roundedLengthText, BUILDER_STEP } from './convert';
export { NUMBER_RULE_TEXT, readNumberText, canonicalNumberText, decimalMarkOf, browserDecimalMark, type DecimalMark } from './read-number';
export { formatDate } from './date';
export {
  QUANTITY_KINDS,
  SIMPLE_UNITS,
  parseQuantityQuick,
  readSimpleQuantity,
  siFactor,
  type QuantityKind,
  type QuantityParse,
  type SimpleUnit,
} from './units';
export { parseQuantityLazy } from './units-lazy';
