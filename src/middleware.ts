import { defineMiddleware } from 'astro:middleware';
import { getAuth } from './server/auth';
import { dbReady } from './server/db';
import { toSessionUser } from './server/session';

// Fills Astro.locals only; each page and endpoint guards itself.
export const onRequest = defineMiddleware(async (context, next) => {
  context.locals.user = null;
  context.locals.session = null;
  if (context.isPrerendered) return next();
  await dbReady();
  try {
    const found = await getAuth().api.getSession({ headers: context.request.headers });
    if (found && !(found.user as { banned?: boolean }).banned) {
      context.locals.user = toSessionUser(found.user as Record<string, unknown>);
      context.locals.session = { id: found.session.id, expiresAt: new Date(found.session.expiresAt) };
    }
  } catch (e) {
    console.error('[session]', e);
  }
  return next();
});
