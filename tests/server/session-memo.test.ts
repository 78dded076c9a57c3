import { describe, expect, it } from 'vitest';
import { recallSession, rememberSession, SESSION_MEMO_MS, sessionCookieKey } from '../../src/server/auth/session-memo';

const session = (id: string, expiresInMs: number, now: number) => ({
  user: { id: `u-${id}`, name: 'Ada Winder', email: `${id}@example.test`, role: 'member', emailVerified: true, unitSystem: 'metric' } as never,
  session: { id, expiresAt: new Date(now + expiresInMs) },
});

describe('session memo', () => {
  it('keys on the session cookies only, in order, ignoring other cookies', () => {
    expect(sessionCookieKey('theme=dark; better-auth.session_token=abc.def; x=1; better-auth.session_data=eyJ9')).toBe(
      'better-auth.session_token=abc.def; better-auth.session_data=eyJ9',
    );
    expect(sessionCookieKey('__Secure-better-auth.session_token=t')).toBe('__Secure-better-auth.session_token=t');
    expect(sessionCookieKey('theme=dark')).toBe('');
    expect(sessionCookieKey(null)).toBe('');
  });

  it('recalls a session for at most the memo lifetime and never past the session expiry', () => {
    const now = 1_000_000;
    rememberSession('k1', session('s1', 60_000, now), now);
    expect(recallSession('k1', now + SESSION_MEMO_MS - 1)?.session.id).toBe('s1');
    expect(recallSession('k1', now + SESSION_MEMO_MS + 1)).toBeNull();
    // dropped once expired
    expect(recallSession('k1', now)).toBeNull();
    rememberSession('k2', session('s2', 1_000, now), now);
    expect(recallSession('k2', now + 1_001)).toBeNull();
  });

  it('remembers nothing under an empty key and stays bounded, dropping the oldest first', () => {
    const now = 2_000_000;
    rememberSession('', session('none', 60_000, now), now);
    expect(recallSession('', now)).toBeNull();
    for (let i = 0; i < 10_050; i++) rememberSession(`key-${i}`, session(`s${i}`, 60_000, now), now);
    expect(recallSession('key-0', now)).toBeNull();
    expect(recallSession('key-49', now)).toBeNull();
    expect(recallSession('key-10049', now)?.session.id).toBe('s10049');
    expect(recallSession('key-50', now)?.session.id).toBe('s50');
  });
});
