import { describe, expect, it } from 'vitest';
import { SlidingWindowLimiter, rateLimitHeaders } from '../../src/server/security/limiter';
import { resolveClientAddress, trustedProxyList } from '../../src/server/security/client-address';
import { checkSameOrigin } from '../../src/server/security/origin';
import { inlineScriptHashes } from '../../src/server/security/headers';
import { pickEncoding } from '../../src/server/security/compress';
import { createHash } from 'node:crypto';

describe('SlidingWindowLimiter', () => {
  it('allows max requests in a window, refuses the next with a Retry-After, and recovers as the window slides', () => {
    const l = new SlidingWindowLimiter(3, 60_000);
    const t0 = 1_000_000_020_000; // 20 s into a window
    expect([1, 2, 3].map(() => l.take('a', t0).allowed)).toEqual([true, true, true]);
    const refused = l.take('a', t0 + 1000);
    expect(refused.allowed).toBe(false);
    expect(refused.remaining).toBe(0);
    expect(refused.retryAfter).toBeGreaterThan(0);
    // Just after the window edge the previous window still weighs almost fully: still refused.
    const windowEnd = t0 - (t0 % 60_000) + 60_000;
    expect(l.take('a', windowEnd + 1000).allowed).toBe(false);
    // At Retry-After the weighted count has fallen far enough.
    expect(l.take('a', t0 + 1000 + refused.retryAfter * 1000).allowed).toBe(true);
    // Other keys are independent.
    expect(l.take('b', t0).allowed).toBe(true);
  });

  it('holds at most maxKeys keys and evicts the least recently used one at a time', () => {
    const l = new SlidingWindowLimiter(2, 60_000, 100);
    const now = 5_000_000;
    l.take('victim', now);
    l.take('victim', now);
    expect(l.take('victim', now).allowed).toBe(false);
    for (let i = 0; i < 99; i++) {
      l.take(`flood-${i}`, now);
      l.take('victim', now); // the limited key stays recently used
    }
    expect(l.size).toBe(100);
    for (let i = 99; i < 10_000; i++) {
      l.take(`flood-${i}`, now);
      if (i % 50 === 0) l.take('victim', now);
      expect(l.size).toBeLessThanOrEqual(100);
    }
    // A flood of new keys never resets a key that keeps coming back.
    expect(l.take('victim', now).allowed).toBe(false);
    // Only the oldest idle keys went.
    expect(l.peek('flood-9999', now).remaining).toBe(1);
  });

  it('formats the RateLimit and Retry-After headers', () => {
    const l = new SlidingWindowLimiter(1, 60_000);
    const ok = rateLimitHeaders(l.take('x', 0), 'solve');
    expect(ok['RateLimit-Policy']).toBe('"solve";q=1;w=60');
    expect(ok.RateLimit).toMatch(/^"solve";r=0;t=\d+$/);
    expect(ok['Retry-After']).toBeUndefined();
    const no = rateLimitHeaders(l.take('x', 1000), 'solve');
    expect(Number(no['Retry-After'])).toBeGreaterThan(0);
  });
});

describe('client address', () => {
  const none = trustedProxyList('');
  const proxies = trustedProxyList('10.0.0.0/8, ::1');
  it('ignores X-Forwarded-For from a peer that is not a trusted proxy', () => {
    expect(resolveClientAddress('203.0.113.7', '198.51.100.1', none)).toBe('203.0.113.7');
    expect(resolveClientAddress('::ffff:127.0.0.1', '1.2.3.4', none)).toBe('127.0.0.1');
  });
  it('takes the right-most untrusted hop behind trusted proxies', () => {
    expect(resolveClientAddress('10.1.2.3', '198.51.100.9, 203.0.113.5, 10.0.0.2', proxies)).toBe('203.0.113.5');
    expect(resolveClientAddress('::1', '203.0.113.5', proxies)).toBe('203.0.113.5');
    expect(resolveClientAddress('10.1.2.3', undefined, proxies)).toBe('10.1.2.3');
  });
  it('refuses a malformed TRUSTED_PROXIES entry', () => {
    expect(() => trustedProxyList('10.0.0.0/40')).toThrow(/TRUSTED_PROXIES/);
    expect(() => trustedProxyList('proxy.local')).toThrow(/TRUSTED_PROXIES/);
  });
});

describe('same-origin check', () => {
  const site = new Set(['http://127.0.0.1:4321']);
  const h = (o: Record<string, string>) => new Headers(o);
  it('passes reads, same-origin writes and programs that send no browser headers', () => {
    expect(checkSameOrigin('GET', h({ origin: 'https://evil.example' }), site).ok).toBe(true);
    expect(checkSameOrigin('POST', h({ origin: 'http://127.0.0.1:4321', 'sec-fetch-site': 'same-origin' }), site).ok).toBe(true);
    expect(checkSameOrigin('PUT', h({}), site).ok).toBe(true);
  });
  it('refuses cross-site writes by Origin, Sec-Fetch-Site or Referer', () => {
    expect(checkSameOrigin('POST', h({ origin: 'https://evil.example' }), site).ok).toBe(false);
    expect(checkSameOrigin('DELETE', h({ 'sec-fetch-site': 'cross-site' }), site).ok).toBe(false);
    expect(checkSameOrigin('PATCH', h({ 'sec-fetch-site': 'same-site', origin: 'http://127.0.0.1:4321' }), site).ok).toBe(false);
    expect(checkSameOrigin('POST', h({ referer: 'https://evil.example/form' }), site).ok).toBe(false);
    expect(checkSameOrigin('POST', h({ origin: 'null' }), site).ok).toBe(false);
  });
});

describe('headers helpers', () => {
  it('hashes inline scripts only (not external or JSON data)', () => {
    const body = 'console.log(1)';
    const html = `<script>${body}</script><script src="/a.js"></script><script type="application/json">{"a":1}</script>`;
    const expected = `'sha256-${createHash('sha256').update(body).digest('base64')}'`;
    expect(inlineScriptHashes(html)).toEqual([expected]);
  });
  it('prefers brotli, falls back to gzip, honours q=0', () => {
    expect(pickEncoding('gzip, deflate, br')).toBe('br');
    expect(pickEncoding('gzip, br;q=0')).toBe('gzip');
    expect(pickEncoding('identity')).toBeNull();
    expect(pickEncoding(null)).toBeNull();
  });
});
