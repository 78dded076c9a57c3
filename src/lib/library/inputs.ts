import { findDesignField } from '../design/registry';
import type { QuantityKind } from '../format/units';
import { formatQuantity } from '../format/quantity';

/** Every leaf of a JSON value as `path → value`; `null` sections are leaves so that removing one shows. */
export function flatten(value: unknown, prefix = '', out: Map<string, unknown> = new Map()): Map<string, unknown> {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const entries = Object.entries(value as Record<string, unknown>);
    if (entries.length === 0 && prefix) out.set(prefix, value);
    for (const [k, v] of entries) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (prefix) out.set(prefix, value);
  return out;
}

/** The field's label from the design registry; a path the registry does not know shows as itself. */
export function inputLabel(path: string): string {
  return findDesignField(path)?.label ?? path;
}

const QUANTITY_DISPLAY: Partial<Record<QuantityKind, Parameters<typeof formatQuantity>[1]>> = {
  length: 'length',
  capacitance: 'capacitance',
  inductance: 'inductance',
  voltage: 'voltage',
  current: 'current',
  frequency: 'frequency',
  angle: 'angle',
  time: 'time',
};

/** Strings with units stay as the builder wrote them; bare numbers are SI and get a prefix. */
export function formatInput(path: string, value: unknown): string {
  if (value === undefined) return '—';
  if (value === null) return 'none';
  if (typeof value === 'string') return value;
  if (typeof value === 'number') {
    const kind = findDesignField(path)?.kind;
    const display = kind ? QUANTITY_DISPLAY[kind as QuantityKind] : undefined;
    return display ? formatQuantity(value, display) : String(value);
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return JSON.stringify(value);
}
