import { APIError, createAuthMiddleware } from 'better-auth/api';
import { SlidingWindowLimiter, rateLimitHeaders } from '../security/limiter';

/**
 * Failed sign-ins counted per account (the e-mail address, lower-cased), on top of better-auth's own
 * per-address limit: spreading guesses over many addresses does not multiply the allowance for one
 * account (OWASP Authentication Cheat Sheet, "Protect against automated attacks"). Only failures
 * count, and a successful sign-in clears the account's count.
 */
export type SignInGuard = ReturnType<typeof signInGuard>;

const SIGN_IN_PATH = '/sign-in/email';

export function signInGuard(maxFailures: number, windowSeconds = 15 * 60, maxKeys = 50_000) {
  const failures = new SlidingWindowLimiter(maxFailures, windowSeconds * 1000, maxKeys);
  const accountOf = (body: unknown): string | null => {
    const email = (body as { email?: unknown } | null)?.email;
    return typeof email === 'string' && email.length > 0 ? email.trim().toLowerCase() : null;
  };
  return {
    failures,
    before: createAuthMiddleware(async (ctx) => {
      if (ctx.path !== SIGN_IN_PATH) return;
      const account = accountOf(ctx.body);
      if (!account) return;
      const d = failures.peek(account);
      if (!d.allowed) {
        throw new APIError(
          'TOO_MANY_REQUESTS',
          { message: `Too many failed sign-ins for this account. Try again in ${Math.ceil(d.retryAfter / 60)} min.`, code: 'TOO_MANY_ATTEMPTS' },
          rateLimitHeaders(d, 'sign-in-account'),
        );
      }
    }),
    after: createAuthMiddleware(async (ctx) => {
      if (ctx.path !== SIGN_IN_PATH) return;
      const account = accountOf(ctx.body);
      if (!account) return;
      const returned = ctx.context.returned as { statusCode?: number } | undefined;
      const status = returned instanceof APIError ? returned.statusCode : 200;
      if (status === 401 || status === 403) failures.record(account);
      else if (status === 200) failures.forget(account);
    }),
  };
}
