/** Display formatting for the build sheet: metric first, inches or feet in brackets, no NaN ever shown. */

import { METRES_PER_INCH as IN } from '../format/length';
const FT = 0.3048;
const LB = 0.45359237;

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

export function frequency(hz: number): string {
  return hz >= 1e6 ? `${plain(hz / 1e6, 4)} MHz` : `${plain(hz / 1e3, 4)} kHz`;
}

export function capacitance(f: number): string {
  if (f >= 1e-6) return `${plain(f * 1e6, 4)} µF`;
  if (f >= 1e-9) return `${plain(f * 1e9, 4)} nF`;
  return `${plain(f * 1e12, 4)} pF`;
}

export function inductance(h: number): string {
  if (h >= 1e-3) return `${plain(h * 1e3, 4)} mH`;
  return `${plain(h * 1e6, 4)} µH`;
}

export function voltage(v: number): string {
  return v >= 1000 ? `${plain(v / 1000, 4)} kV` : `${plain(v, 4)} V`;
}

export function resistance(ohm: number): string {
  if (ohm >= 1e6) return `${plain(ohm / 1e6, 3)} MΩ`;
  if (ohm >= 1e3) return `${plain(ohm / 1e3, 3)} kΩ`;
  return `${plain(ohm, 3)} Ω`;
}

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
