/**
 * Where to go after signing in. Only a path on this site: it must start with one "/" (not "//", which a
 * browser reads as another host) and carry no backslash or control character that could turn it into one.
 */
export function safeNext(raw: string | null | undefined, fallback: string): string {
  if (!raw) return fallback;
  if (!raw.startsWith('/') || raw.startsWith('//')) return fallback;
  if (raw.includes('\\') || [...raw].some((ch) => ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f)) return fallback;
  try {
    const u = new URL(raw, 'http://coilwright.invalid');
    if (u.origin !== 'http://coilwright.invalid') return fallback;
    return u.pathname + u.search + u.hash;
  } catch {
    return fallback;
  }
}
