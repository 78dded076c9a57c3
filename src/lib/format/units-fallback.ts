import type { QuantityKind, QuantityParse } from './units';

/** The reader for texts the plain forms do not cover: mathjs, set by `units-mathjs.ts` when it is evaluated. */
export type FullReader = (input: string, kind: QuantityKind) => QuantityParse;

let full: FullReader | null = null;

export function setFullReader(reader: FullReader | null): void {
  full = reader;
}

export function fullReader(): FullReader | null {
  return full;
}
