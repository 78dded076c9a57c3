import type { DesignSI } from './types';

/** Numeric fields of a DesignSI a sweep may vary, as dotted paths. */
export function sweepablePaths(d: DesignSI): string[] {
  const out: string[] = [];
  const walk = (v: unknown, prefix: string) => {
    if (v && typeof v === 'object') {
      for (const [k, x] of Object.entries(v)) walk(x, prefix ? `${prefix}.${k}` : k);
    } else if ((typeof v === 'number' && prefix !== 'secondary.wire.awg') || (v === null && prefix === 'secondary.windingLength')) {
      out.push(prefix);
    }
  };
  walk(d, '');
  return out;
}
