/**
 * Sliding-window rate limiter in memory (one process). Each key keeps the count of the current fixed
 * window and of the previous one; the allowance weighs the previous window by the part of it that
 * still lies within the sliding window (the "sliding window counter" of common practice), so a burst
 * at a window edge cannot double the rate.
 *
 * Memory is bounded: at most `maxKeys` keys are kept, least recently used first out, one key at a
 * time, so a flood of new keys can only push out the oldest idle ones, never everyone at once.
 */
export type LimitDecision = {
  allowed: boolean;
  /** Requests allowed per window. */
  limit: number;
  /** Requests left in the current window after this one. */
  remaining: number;
  /** Seconds until a request is allowed again (0 when allowed). */
  retryAfter: number;
  /** Seconds until the window's allowance is fully restored. */
  reset: number;
  windowSeconds: number;
};

type Entry = { start: number; count: number; previous: number };

export class SlidingWindowLimiter {
  private readonly entries = new Map<string, Entry>();

  constructor(
    readonly max: number,
    readonly windowMs: number,
    readonly maxKeys = 50_000,
  ) {}

  get size(): number {
    return this.entries.size;
  }

  private entry(key: string, now: number): Entry {
    let e = this.entries.get(key);
    if (e) this.entries.delete(key);
    else e = { start: now - (now % this.windowMs), count: 0, previous: 0 };
    const start = now - (now % this.windowMs);
    if (start !== e.start) {
      e.previous = start - e.start === this.windowMs ? e.count : 0;
      e.count = 0;
      e.start = start;
    }
    this.entries.set(key, e); // most recently used last
    while (this.entries.size > this.maxKeys) {
      const oldest = this.entries.keys().next().value as string;
      this.entries.delete(oldest);
    }
    return e;
  }

  private weighted(e: Entry, now: number): number {
    const elapsed = (now - e.start) / this.windowMs;
    return e.previous * (1 - elapsed) + e.count;
  }

  private decision(e: Entry, now: number, allowed: boolean): LimitDecision {
    const used = this.weighted(e, now);
    const remaining = Math.max(0, Math.floor(this.max - used));
    let retryAfter = 0;
    if (!allowed) retryAfter = Math.max(1, Math.ceil(this.waitMs(e, now) / 1000));
    const reset = Math.max(0, Math.ceil((e.start + 2 * this.windowMs - now) / 1000));
    return { allowed, limit: this.max, remaining, retryAfter, reset: used > 0 ? reset : 0, windowSeconds: Math.round(this.windowMs / 1000) };
  }

  /** Milliseconds until previous·(1 − t/W) + count + 1 ≤ max holds again. */
  private waitMs(e: Entry, now: number): number {
    const W = this.windowMs;
    if (e.count + 1 <= this.max) {
      // Only the previous window's share decays within the current window.
      const need = this.weighted(e, now) + 1 - this.max;
      return e.previous > 0 ? need / (e.previous / W) : 0;
    }
    // In the next window the current count becomes the decaying share.
    const untilNext = e.start + W - now;
    return untilNext + W * Math.max(0, 1 - (this.max - 1) / e.count);
  }

  /** Counts one request for `key` when it is allowed; a refused request is not counted. */
  take(key: string, now = Date.now()): LimitDecision {
    const e = this.entry(key, now);
    if (this.weighted(e, now) + 1 > this.max) return this.decision(e, now, false);
    e.count += 1;
    return this.decision(e, now, true);
  }

  /** Whether one more request for `key` would be allowed, without counting it. */
  peek(key: string, now = Date.now()): LimitDecision {
    const e = this.entry(key, now);
    return this.decision(e, now, this.weighted(e, now) + 1 <= this.max);
  }

  /** Counts one event (e.g. a failed sign-in) for `key` regardless of the limit. */
  record(key: string, now = Date.now()): void {
    this.entry(key, now).count += 1;
  }

  /** Forgets one key (e.g. after a successful sign-in). */
  forget(key: string): void {
    this.entries.delete(key);
  }
}

/** IETF draft "RateLimit header fields for HTTP" (draft-ietf-httpapi-ratelimit-headers-08) plus Retry-After (RFC 9110 §10.2.3). */
export function rateLimitHeaders(d: LimitDecision, policy = 'default'): Record<string, string> {
  const h: Record<string, string> = {
    'RateLimit-Policy': `"${policy}";q=${d.limit};w=${d.windowSeconds}`,
    RateLimit: `"${policy}";r=${d.remaining};t=${d.allowed ? d.reset : d.retryAfter}`,
  };
  if (!d.allowed) h['Retry-After'] = String(d.retryAfter);
  return h;
}
