import { z } from 'zod';

export const DESIGN_NAME_MAX = 120;
const REQUIRED = 'Give the design a name.';
const TOO_LONG = `Keep the name under ${DESIGN_NAME_MAX} characters.`;

/** A design's name: some text after trimming, at most 120 characters. The API, the designer and the library all check it so. */
export const designNameSchema = z.string({ error: REQUIRED }).trim().min(1, REQUIRED).max(DESIGN_NAME_MAX, TOO_LONG);

/** The name rule for a form: the message for a bad name, or null when it is fine. */
export function checkDesignName(name: string): string | null {
  const r = designNameSchema.safeParse(name);
  return r.success ? null : r.error.issues[0].message;
}

/** "Name (copy)" cut to fit the name rule. */
export function copyName(name: string): string {
  const suffix = ' (copy)';
  return name.length + suffix.length > DESIGN_NAME_MAX ? `${name.slice(0, DESIGN_NAME_MAX - suffix.length)}${suffix}` : `${name}${suffix}`;
}
