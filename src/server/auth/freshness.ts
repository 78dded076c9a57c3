/**
 * Users whose account or sessions changed recently (verified address, new name or role, banned,
 * signed out elsewhere). For them the middleware skips the signed session cookie cache and asks the
 * database, which also rewrites the cookie; after one cache lifetime no cookie older than the change
 * can be left, and the entry is dropped. One process: with several app processes a change is seen
 * by the others when their cookie copies expire (the cache's stated lifetime).
 */
// On globalThis, shared by the built app and the start script's front server (separate copies of this module).
const g = globalThis as unknown as { __coilwrightChangedUsers?: Map<string, number> };
const changed = (g.__coilwrightChangedUsers ??= new Map<string, number>());
const MAX_ENTRIES = 100_000;

export function markUserChanged(userId: string, now = Date.now()): void {
  changed.delete(userId);
  changed.set(userId, now);
  while (changed.size > MAX_ENTRIES) changed.delete(changed.keys().next().value as string);
}

export function changedWithin(userId: string, ms: number, now = Date.now()): boolean {
  const at = changed.get(userId);
  if (at === undefined) return false;
  if (now - at > ms) {
    changed.delete(userId);
    return false;
  }
  return true;
}
