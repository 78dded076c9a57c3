import { parseQuantityQuick, type QuantityKind, type QuantityParse } from './units';

/**
 * Reads a quantity as `parseQuantity` does, loading mathjs only when the text is not a plain form: for the
 * browser's main thread, which should not carry the unit library for "12 mm".
 */
export async function parseQuantityLazy(input: number | string, kind: QuantityKind): Promise<QuantityParse> {
  const quick = parseQuantityQuick(input, kind);
  if (quick) return quick;
  const { parseQuantity } = await import('./units-mathjs');
  return parseQuantity(input, kind);
}
