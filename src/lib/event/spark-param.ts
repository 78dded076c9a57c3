/**
 * Reads the `spark` query parameter of the event sheet: a length such as "1.2 m", "120 cm", "4 ft",
 * "48 in" or "4'", or a bare number taken as metres. Returns metres or a message naming the field.
 */

const UNITS: Record<string, number> = {
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  cm: 0.01,
  mm: 0.001,
  ft: 0.3048,
  foot: 0.3048,
  feet: 0.3048,
  "'": 0.3048,
  in: 0.0254,
  inch: 0.0254,
  inches: 0.0254,
  '"': 0.0254,
};

/** Longest arc accepted: far beyond any coil a tool like this would plan, so a typo is caught. */
export const SPARK_PARAM_MAX = 100;

export type SparkParam = { ok: true; value: number | null } | { ok: false; message: string };

export function parseSparkParam(raw: string | null | undefined): SparkParam {
  if (raw === null || raw === undefined || raw.trim() === '') return { ok: true, value: null };
  const text = raw.trim().toLowerCase();
  const match = /^([0-9]*\.?[0-9]+(?:e[+-]?[0-9]+)?)\s*([a-z'"]*)$/.exec(text);
  const fail = {
    ok: false as const,
    message: `spark: give the longest arc as a length such as "1.2 m", "120 cm" or "4 ft" (got "${raw.trim().slice(0, 40)}")`,
  };
  if (!match) return fail;
  const unit = match[2] === '' ? 'm' : match[2];
  const factor = UNITS[unit];
  if (factor === undefined) return fail;
  const value = Number(match[1]) * factor;
  if (!Number.isFinite(value) || value <= 0) return { ok: false, message: 'spark: the longest arc must be greater than zero' };
  if (value > SPARK_PARAM_MAX) return { ok: false, message: `spark: ${raw.trim()} is longer than ${SPARK_PARAM_MAX} m; check the unit` };
  return { ok: true, value };
}
