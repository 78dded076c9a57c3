import { parseQuantityQuick, type QuantityKind, type QuantityParse } from './units';
import { fullReader, setFullReader, type FullReader } from './units-fallback';

export { setFullReader, type FullReader };

/**
 * The synchronous quantity reader the design schema uses. Plain forms ("12 mm", "20 nF") are read by the
 * table in `units.ts`; anything else goes to the full reader (mathjs, `units-mathjs.ts`), which registers
 * itself here when its module is evaluated. Code that must not carry mathjs up front (the solver worker, the
 * browser's main thread) leaves it unloaded and runs its parsing through `withFullReader`, which loads it on
 * the first text that needs it and runs the parsing again.
 */

/** Thrown by `parseQuantity` when a text needs the full reader and it is not loaded yet. */
export class FullReaderNeeded extends Error {
  constructor(readonly input: string) {
    super(`reading "${input}" needs the full unit reader: import "units-mathjs" or run the parsing through withFullReader`);
    this.name = 'FullReaderNeeded';
  }
}

export function hasFullReader(): boolean {
  return fullReader() !== null;
}

/** Reads a quantity into SI: the plain forms without mathjs, the rest with the full reader. */
export function parseQuantity(input: number | string, kind: QuantityKind): QuantityParse {
  const quick = parseQuantityQuick(input, kind);
  if (quick) return quick;
  const full = fullReader();
  if (!full) throw new FullReaderNeeded(String(input));
  return full(input as string, kind);
}

let loading: Promise<typeof import('./units-mathjs')> | null = null;

/** Loads mathjs and sets it as the full reader (the module once; the reader whenever none is set). */
export async function loadFullReader(): Promise<void> {
  if (fullReader()) return;
  loading ??= import('./units-mathjs');
  try {
    setFullReader((await loading).parseWithMathjs);
  } catch (e) {
    loading = null;
    throw e;
  }
}

/**
 * Runs `work` (which may read quantities through `parseQuantity`); when a text needs the full reader and it
 * is not loaded, loads it and runs `work` again. `work` must have no effects before its parsing is done.
 */
export async function withFullReader<T>(work: () => T | Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (e) {
    if (!(e instanceof FullReaderNeeded)) throw e;
    await loadFullReader();
    return await work();
  }
}
