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
export { formatQuantity, axisUnit, siUnitOfDisplay, type DisplayKind, type FormatOptions } from './quantity';
export { convertLengthText, readLength } from './convert';
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
