import { lengthInputText, METRES_PER_INCH, readLength, type UnitSystem } from '../format';

/**
 * Radial room between the secondary form and the primary's innermost turn when the builder has not chosen
 * one: 25 mm (1 in) each side, common practice for small spark-gap coils, enough that the default never
 * runs through the winding.
 */
export const PRIMARY_CLEARANCE = { metric: 25e-3, imperial: METRES_PER_INCH } as const;

/**
 * The primary's innermost turn diameter that follows the form: the form's diameter plus the clearance each
 * side, rounded up to 5 mm or 1/4 in. Null when the form's diameter cannot be read yet.
 */
export function primaryInnerDefault(formDiameterText: string, system: UnitSystem): string | null {
  const form = readLength(formDiameterText);
  if (!form || !(form.metres > 0)) return null;
  const step = system === 'imperial' ? METRES_PER_INCH / 4 : 5e-3;
  const metres = Math.ceil((form.metres + 2 * PRIMARY_CLEARANCE[system]) / step - 1e-9) * step;
  return lengthInputText(metres, system, 6);
}
