/**
 * Reads the `spark` query parameter of the event sheet: a length such as "1.2 m", "120 cm", "4 ft",
 * "48 in" or "4'", or a bare number taken as metres. Returns metres or a message naming the field.
 */
import { readSimpleQuantity } from '../format/units';

/** Longest arc accepted: far beyond any coil a tool like this would plan, so a typo is caught. */
export const SPARK_PARAM_MAX = 100;

export type SparkParam = { ok: true; value: number | null } | { ok: false; message: string };

/** Spellings people put in a link that the unit reader does not take: feet and inch marks, "metre(s)", a bare number. */
function asQuantityText(text: string): string {
  const t = text.trim().toLowerCase();
  if (/^[0-9.e+-]+$/.test(t)) return `${t} m`;
  return t.replace(/'$/, ' ft').replace(/"$/, ' in').replace(/metres?$/, 'm');
}

export function parseSparkParam(raw: string | null | undefined): SparkParam {
  if (raw === null || raw === undefined || raw.trim() === '') return { ok: true, value: null };
  const fail = {
    ok: false as const,
    message: `spark: give the longest arc as a length such as "1.2 m", "120 cm" or "4 ft" (got "${raw.trim().slice(0, 40)}")`,
  };
  const q = readSimpleQuantity(asQuantityText(raw));
  if (!q || q.unit.kind !== 'length') return fail;
  const value = q.value;
  if (!(value > 0)) return { ok: false, message: 'spark: the longest arc must be greater than zero' };
  if (value > SPARK_PARAM_MAX) return { ok: false, message: `spark: ${raw.trim()} is longer than ${SPARK_PARAM_MAX} m; check the unit` };
  return { ok: true, value };
}
