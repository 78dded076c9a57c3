import { sheetFormat as fmt } from '~/lib/buildsheet';

export const mmText = (m: number | null | undefined) => (m === null || m === undefined || !Number.isFinite(m) ? '—' : `${(m * 1000).toFixed(1)} mm`);
export const metresText = (m: number | null | undefined) => (m === null || m === undefined || !Number.isFinite(m) ? '—' : `${m.toFixed(1)} m`);
export const durationText = (s: number) => fmt.duration(s);
export const clockText = (iso: string) => new Date(iso).toISOString().slice(11, 19);
export const frequencyText = (hz: number | null | undefined) => (hz === null || hz === undefined ? '—' : fmt.frequency(hz));
export const inductanceText = (h: number | null | undefined) => (h === null || h === undefined ? '—' : fmt.inductance(h));

/** A number typed by a gloved hand: comma or point, spaces ignored; null when empty; NaN when not a number. */
export function typedNumber(text: string): number | null {
  const t = text.trim().replace(/\s+/g, '').replace(',', '.');
  if (t === '') return null;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : Number.NaN;
}

/** A UUID for a reading made on this device; crypto.randomUUID needs a secure context, getRandomValues does not. */
export function newId(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, '0')).join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}
