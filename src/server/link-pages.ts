import { ApiError } from './http';
import { getShared } from './services/shares';
import { describeInvitation } from './services/invitations';
import { describeGroupInvitation } from './services/groups';

/** A link that leads nowhere (unknown, revoked, expired or malformed token) becomes null, for the page to say so. */
async function orNull<T>(load: () => Promise<T>): Promise<T | null> {
  try {
    return await load();
  } catch (e) {
    if (e instanceof ApiError) return null;
    throw e;
  }
}

/** The design behind a read-only share link, for /s/[token]. */
export function loadSharedDesign(token: string) {
  return orNull(() => getShared(token));
}

/** The invitation behind an invitation link, for /invitations/[token]. */
export function loadInvitation(token: string) {
  return orNull(() => describeInvitation(token));
}

/** The group invitation behind a link, for /group-invitations/[token]. */
export function loadGroupInvitation(token: string) {
  return orNull(() => describeGroupInvitation(token));
}
