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
export { parseQuantity, QUANTITY_KINDS, type QuantityKind, type QuantityParse } from './units';
export type { QuantityInput } from './fields';
export { exampleDesigns, type ExampleDesign } from './examples';
