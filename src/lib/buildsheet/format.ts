/** Display formatting for the build sheet: metric first, inches or feet in brackets, no NaN ever shown. */

import { METRES_PER_FOOT as FT, METRES_PER_INCH as IN } from '../format/length';
import { KILOGRAMS_PER_POUND as LB } from '../format/quantity';
import { formatSi } from '../format/si';

function fixed(x: number, digits: number): string {
  return Number.isFinite(x) ? x.toFixed(digits) : '—';
}

/** Significant-figure rounding that never falls back to exponent notation for everyday sizes. */
export function sig(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const d = Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(x))));
  return x.toFixed(Math.min(d, 9));
}

/** Like sig, without trailing zeros: 16 not 16.00, 40.5 not 40.50. */
export function plain(x: number, digits = 4): string {
  const s = sig(x, digits);
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** Wire diameters and pitches, where a tenth of a millimetre is too coarse. */
export function lengthFine(m: number): string {
  return `${fixed(m * 1000, 3)} mm (${fixed(m / IN, 4)} in)`;
}

/** Short lengths (form, winding, heights) in mm and inches. */
export function lengthShort(m: number): string {
  return `${fixed(m * 1000, 1)} mm (${fixed(m / IN, 2)} in)`;
}

/** Long lengths (wire, tube) in metres and feet. */
export function lengthLong(m: number): string {
  return `${fixed(m, 1)} m (${fixed(m / FT, 0)} ft)`;
}

export function mass(kg: number): string {
  return kg < 1 ? `${fixed(kg * 1000, 0)} g (${fixed(kg / LB, 2)} lb)` : `${fixed(kg, 2)} kg (${fixed(kg / LB, 2)} lb)`;
}

export function duration(s: number): string {
  if (!Number.isFinite(s)) return '—';
  const total = Math.round(s);
  const h = Math.floor(total / 3600);
  const min = Math.floor((total % 3600) / 60);
  const sec = total % 60;
  return h > 0 ? `${h} h ${min} min` : `${min} min ${sec} s`;
}

// the app's one SI formatter, limited to the prefixes a build sheet reads in
export const frequency = (hz: number): string => formatSi(hz, 'Hz', 4, ['k', 'M']);
export const capacitance = (f: number): string => formatSi(f, 'F', 4, ['p', 'n', 'µ']);
export const inductance = (h: number): string => formatSi(h, 'H', 4, ['µ', 'm']);
export const voltage = (v: number): string => formatSi(v, 'V', 4, ['', 'k']);
export const resistance = (ohm: number): string => formatSi(ohm, 'Ω', 3, ['', 'k', 'M']);

export function power(w: number): string {
  return `${plain(w, 3)} W`;
}

export function energy(j: number): string {
  return `${plain(j, 3)} J`;
}

export function percent(fraction: number, digits = 1): string {
  return `${fixed(fraction * 100, digits)} %`;
}

/** A tap position as whole turns plus the angle around the next turn, e.g. "7 turns + 135°". */
export function tapPosition(turns: number): string {
  if (!Number.isFinite(turns)) return '—';
  let whole = Math.floor(turns);
  let deg = Math.round((turns - whole) * 360);
  if (deg === 360) {
    whole += 1;
    deg = 0;
  }
  return `${whole} turns + ${deg}°`;
}
