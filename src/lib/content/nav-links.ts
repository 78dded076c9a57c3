import type { SiteRole } from '../permissions';

export type NavLink = { href: string; label: string };

/** What the navigation needs to know of the signed-in user: only the site role. */
export type NavUser = { role: SiteRole };

/** The main navigation, in one list so the wide and the narrow menu never drift apart. */
export function navLinks(user: NavUser | null): NavLink[] {
  const links: NavLink[] = [
    { href: '/designs', label: 'Designs' },
    { href: '/designs/new', label: 'New design' },
    { href: '/methods', label: 'Methods' },
    { href: '/validation', label: 'Validation' },
    { href: '/safety', label: 'Safety' },
  ];
  if (user) links.push({ href: '/groups', label: 'Groups' }, { href: '/account', label: 'Account' });
  if (user?.role === 'admin') links.push({ href: '/admin', label: 'Admin' });
  return links;
}

/** The closest link for the current path, so /designs/abc marks Designs but /designs/new marks New design. */
export function currentHref(links: NavLink[], pathname: string): string | null {
  const path = pathname.replace(/\/+$/, '') || '/';
  let best: string | null = null;
  for (const { href } of links) {
    if (path === href || path.startsWith(`${href}/`)) {
      if (!best || href.length > best.length) best = href;
    }
  }
  return best;
}
