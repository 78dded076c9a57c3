export { MISSING, formatSignificant, formatFixed, formatPercent } from './number';
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
export { formatQuantity, axisUnit, type DisplayKind, type FormatOptions } from './quantity';
export { convertLengthText, readLength } from './convert';
