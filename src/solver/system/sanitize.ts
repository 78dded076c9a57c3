import type { SolverWarning } from '../types';
import { warning } from '../warnings';

/**
 * Replaces every non-finite number in a result tree by null, with one warning per value, so that
 * nothing downstream ever sees NaN or Infinity. Arrays keep their length.
 */
export function sanitizeNumbers<T>(value: T, warnings: SolverWarning[], path = ''): T {
  const walk = (v: unknown, p: string): unknown => {
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return v;
      warnings.push(warning('value_not_finite', p, `${p || 'a value'} could not be computed for this design and was left out`));
      return null;
    }
    if (Array.isArray(v)) return v.map((x, i) => walk(x, `${p}[${i}]`));
    if (v && typeof v === 'object') {
      const out: Record<string, unknown> = {};
      for (const [k, x] of Object.entries(v)) out[k] = walk(x, p ? `${p}.${k}` : k);
      return out;
    }
    return v;
  };
  return walk(value, path) as T;
}
