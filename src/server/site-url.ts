import { env } from './env';

/**
 * The site's public address for links we hand out (share links, mailed invitations). The configured address,
 * never the request's Host header: behind the standalone server the request URL reads as "localhost", and a
 * forged Host must not end up in a mailed link.
 */
export function siteOrigin(): string {
  return env().BETTER_AUTH_URL.replace(/\/+$/, '');
}
