// first: the schema's unit reader gets mathjs before any module below reads a quantity
import '../format/units-mathjs';
export {
  designInputSchema,
  secondarySchema,
  toploadSchema,
  primarySchema,
  tankSchema,
  supplySchema,
  tuningSchema,
  type DesignInput,
} from './schema';
export { parseDesign, toDesignSI, formatIssues, DEFAULT_GROUND_CLEARANCE, type ParseDesignResult, type DesignSI, type DesignIssue } from './parse';
export { QUANTITY_KINDS, type QuantityKind, type QuantityParse } from '../format/units';
export { parseQuantity } from '../format/units-mathjs';
export { DESIGN_FIELDS, DESIGN_PARTS, designField, findDesignField, pathsOfKind, type DesignFieldPath, type FieldSpec, type FieldKind } from './registry';
export { RESULT_FIGURES, resultFigure, figureOf, type ResultFigure, type ResultFigureId } from './figures';
export { designNameSchema } from './schema';
export { checkDesignName, copyName, DESIGN_NAME_MAX } from './name';
export type { QuantityInput } from './fields';
export { exampleDesigns, type ExampleDesign } from './examples';
