import { MISSING } from './number';

const DAY: Intl.DateTimeFormatOptions = { year: 'numeric', month: 'short', day: 'numeric' };
const DAY_AND_TIME: Intl.DateTimeFormatOptions = { ...DAY, hour: '2-digit', minute: '2-digit' };

/**
 * The one date format of the app, in the reader's locale and time zone: "2 Dec 2026" or, with the time,
 * "2 Dec 2026, 06:45". A missing or unreadable date shows as a dash.
 */
export function formatDate(iso: string | null | undefined, withTime = false): string {
  if (!iso) return MISSING;
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? MISSING : d.toLocaleString(undefined, withTime ? DAY_AND_TIME : DAY);
}
