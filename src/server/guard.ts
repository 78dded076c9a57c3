import type { AstroGlobal } from 'astro';
import type { SessionUser } from './session';

export { safeNext } from '../lib/safe-next';

export function requirePageUser(Astro: AstroGlobal): SessionUser | Response {
  const user = Astro.locals.user;
  if (user) return user;
  const next = Astro.url.pathname + Astro.url.search;
  return Astro.redirect(`/sign-in?next=${encodeURIComponent(next)}`);
}

export async function requirePageAdmin(Astro: AstroGlobal): Promise<SessionUser | Response> {
  const user = requirePageUser(Astro);
  if (user instanceof Response) return user;
  if (user.role !== 'admin') return Astro.rewrite('/404');
  return user;
}
