import { devMailPort } from './mail';
import { caughtMail, type CaughtMail } from './mail/dev-store';

function isLoopbackAddress(a: string): boolean {
  return a === '::1' || a.startsWith('127.') || a.startsWith('::ffff:127.');
}

/** The caught mail, or null when the page must not exist for this caller (SMTP_URL set, or not loopback nor admin). */
export function visibleMail(clientAddress: string, locals: App.Locals): CaughtMail[] | null {
  if (devMailPort() === null) return null;
  if (!isLoopbackAddress(clientAddress) && locals.user?.role !== 'admin') return null;
  return [...caughtMail()].reverse();
}
