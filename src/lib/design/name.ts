/** The name rule of a design, for the API (through the schema's `designNameSchema`), the designer and the library. */
export const DESIGN_NAME_MAX = 120;
export const DESIGN_NAME_REQUIRED = 'Give the design a name.';

/** The message for a bad design name, or null when it is fine: some text after trimming, at most 120 characters. */
export function checkDesignName(name: string): string | null {
  const t = name.trim();
  if (t === '') return DESIGN_NAME_REQUIRED;
  if (t.length > DESIGN_NAME_MAX) return `Keep the name under ${DESIGN_NAME_MAX} characters.`;
  return null;
}

/** "Name (copy)" cut to fit the name rule. */
export function copyName(name: string): string {
  const suffix = ' (copy)';
  return name.length + suffix.length > DESIGN_NAME_MAX ? `${name.slice(0, DESIGN_NAME_MAX - suffix.length)}${suffix}` : `${name}${suffix}`;
}
