import { SlidingWindowLimiter, rateLimitHeaders, type LimitDecision } from './security/limiter';

// One sliding-window limiter per bucket and limit, in memory (one process), each holding at most 50 000 clients.
// On globalThis: the start script's front server (its own copy of this module) counts in the same windows.
const g = globalThis as unknown as { __coilwrightLimiters?: Map<string, SlidingWindowLimiter> };
const limiters = (g.__coilwrightLimiters ??= new Map<string, SlidingWindowLimiter>());

function limiterFor(bucket: string, max: number, windowMs: number): SlidingWindowLimiter {
  const id = `${bucket}:${max}:${windowMs}`;
  let l = limiters.get(id);
  if (!l) {
    l = new SlidingWindowLimiter(max, windowMs);
    limiters.set(id, l);
  }
  return l;
}

/** Counts one request of `client` in `bucket`; the decision carries what the RateLimit headers report. */
export function take(bucket: string, client: string, max: number, windowMs = 60_000, now = Date.now()): LimitDecision {
  return limiterFor(bucket, max, windowMs).take(client, now);
}

export function allow(bucket: string, client: string, max: number, windowMs = 60_000, now = Date.now()): boolean {
  return take(bucket, client, max, windowMs, now).allowed;
}

/**
 * Counts the request and remembers the decision in `locals`, so the middleware sends `RateLimit`,
 * `RateLimit-Policy` (and `Retry-After` when refused) with the response, error or not.
 */
export function limitRequest(locals: App.Locals, bucket: string, client: string, max: number, windowMs = 60_000): boolean {
  const d = take(bucket, client, max, windowMs);
  locals.rateLimit = rateLimitHeaders(d, bucket);
  return d.allowed;
}
