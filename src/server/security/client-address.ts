import { BlockList, isIP } from 'node:net';

/**
 * Which peers may speak for the client in `X-Forwarded-For` / `X-Forwarded-Proto`: the addresses and
 * CIDR ranges listed in TRUSTED_PROXIES (comma-separated, e.g. "10.0.0.0/8, ::1"). Empty by default:
 * then the forwarded headers are ignored and the socket's peer address is the client.
 */
export function trustedProxyList(spec: string | undefined): BlockList {
  const list = new BlockList();
  for (const raw of (spec ?? '').split(',')) {
    const item = raw.trim();
    if (!item) continue;
    const [addr, bits] = item.split('/');
    const family = isIP(addr);
    if (!family) throw new Error(`TRUSTED_PROXIES: "${item}" is not an IP address or CIDR range`);
    const type = family === 6 ? 'ipv6' : 'ipv4';
    if (bits === undefined) list.addAddress(addr, type);
    else {
      const prefix = Number(bits);
      if (!Number.isInteger(prefix) || prefix < 0 || prefix > (family === 6 ? 128 : 32)) {
        throw new Error(`TRUSTED_PROXIES: "${item}" has an invalid prefix length`);
      }
      list.addSubnet(addr, prefix, type);
    }
  }
  return list;
}

/** "::ffff:127.0.0.1" → "127.0.0.1", so IPv4 peers on a dual-stack socket match IPv4 entries. */
export function normalizeAddress(a: string): string {
  const s = a.trim();
  return s.toLowerCase().startsWith('::ffff:') && isIP(s.slice(7)) === 4 ? s.slice(7) : s;
}

export function isTrusted(list: BlockList, address: string): boolean {
  const a = normalizeAddress(address);
  const family = isIP(a);
  if (!family) return false;
  return list.check(a, family === 6 ? 'ipv6' : 'ipv4');
}

/**
 * The client's address: the socket peer, unless the peer is a trusted proxy; then the right-most
 * address in X-Forwarded-For that is not itself a trusted proxy (each proxy appends the address it
 * saw, so entries left of the first untrusted one may be forged by the client).
 */
export function resolveClientAddress(peer: string, forwardedFor: string | string[] | undefined, trusted: BlockList): string {
  const p = normalizeAddress(peer);
  if (!isTrusted(trusted, p)) return p;
  const hops = (Array.isArray(forwardedFor) ? forwardedFor.join(',') : (forwardedFor ?? ''))
    .split(',')
    .map((h) => normalizeAddress(h))
    .filter((h) => isIP(h) !== 0);
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!isTrusted(trusted, hops[i])) return hops[i];
  }
  return hops[0] ?? p;
}
