/**
 * A short memo of sessions already read from a signed session cookie, so that a burst of requests with the
 * same cookie verifies its signature once instead of once per request. Keyed by the exact session cookie
 * values; an entry lives MEMO_MS at most and is never used for a user whose account or sessions changed
 * (see freshness.ts), so signing out, a new role or a ban are seen at once by this process, and a cookie
 * copy is never trusted longer than the signed cookie cache itself allows plus MEMO_MS.
 */
import type { SessionUser } from '../session';

export type MemoSession = { user: SessionUser; session: { id: string; expiresAt: Date } };

const MEMO_MS = 5_000;
const MAX_ENTRIES = 10_000;
// On globalThis: the start script's front server (its own copy of this module, compiled from the sources)
// answers some reads itself and must see the same sessions as the built app's middleware.
const g = globalThis as unknown as { __coilwrightSessionMemo?: Map<string, { at: number; value: MemoSession }> };
const memo = (g.__coilwrightSessionMemo ??= new Map<string, { at: number; value: MemoSession }>());
const SESSION_COOKIES = /(?:^|;\s*)((?:__Secure-)?better-auth\.session_(?:token|data)=[^;]*)/g;

/** The session cookies of a Cookie header, in order, as the memo's key; '' when there are none. */
export function sessionCookieKey(cookie: string | null): string {
  if (!cookie) return '';
  return Array.from(cookie.matchAll(SESSION_COOKIES), (m) => m[1]).join('; ');
}

export function recallSession(key: string, now = Date.now()): MemoSession | null {
  const hit = key ? memo.get(key) : undefined;
  if (!hit) return null;
  if (now - hit.at > MEMO_MS || now > hit.value.session.expiresAt.getTime()) {
    memo.delete(key);
    return null;
  }
  return hit.value;
}

export function rememberSession(key: string, value: MemoSession, now = Date.now()): void {
  if (!key) return;
  memo.delete(key);
  memo.set(key, { at: now, value });
  // Oldest first: dropping from the front keeps memory bounded without forgetting recent sessions.
  while (memo.size > MAX_ENTRIES) memo.delete(memo.keys().next().value as string);
}

export const SESSION_MEMO_MS = MEMO_MS;
