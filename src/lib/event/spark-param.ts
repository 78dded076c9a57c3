/**
 * Reads the `spark` query parameter of the event sheet: a length such as "1.2 m", "120 cm", "4 ft",
 * "48 in" or "4'". A bare number is refused, by the same rule as the designer's length fields.
 * Returns metres or a message naming the field by its label.
 */
import { readSimpleQuantity } from '../format/units';
import { readNumberText } from '../format/read-number';
import { BARE_NUMBER_RULE } from '../design/registry';

/** The label of the event sheet's spark field, used in its messages. */
export const SPARK_LABEL = 'Longest arc';

/** Longest arc accepted: far beyond any coil a tool like this would plan, so a typo is caught. */
export const SPARK_PARAM_MAX = 100;

export type SparkParam = { ok: true; value: number | null } | { ok: false; message: string };

/** Spellings people put in a link that the unit reader does not take: feet and inch marks, "metre(s)". */
function asQuantityText(text: string): string {
  const t = text.trim().toLowerCase();
  return t.replace(/'$/, ' ft').replace(/"$/, ' in').replace(/metres?$/, 'm');
}

export function parseSparkParam(raw: string | null | undefined): SparkParam {
  if (raw === null || raw === undefined || raw.trim() === '') return { ok: true, value: null };
  const fail = {
    ok: false as const,
    message: `${SPARK_LABEL}: give the longest arc as a length such as "1.2 m", "120 cm" or "4 ft" (got "${raw.trim().slice(0, 40)}")`,
  };
  if (readNumberText(raw.trim())?.ok) return { ok: false, message: `${SPARK_LABEL}: ${BARE_NUMBER_RULE}, e.g. "${raw.trim()} m" or "${raw.trim()} ft"` };
  const q = readSimpleQuantity(asQuantityText(raw));
  if (!q || q.unit.kind !== 'length') return fail;
  const value = q.value;
  if (!(value > 0)) return { ok: false, message: `${SPARK_LABEL}: must be greater than zero` };
  if (value > SPARK_PARAM_MAX) return { ok: false, message: `${SPARK_LABEL}: ${raw.trim()} is longer than ${SPARK_PARAM_MAX} m; check the unit` };
  return { ok: true, value };
}
