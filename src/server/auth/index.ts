import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { admin } from 'better-auth/plugins';
import { ac, siteRoles } from '../../lib/permissions';
import { schema, type Db } from '../db/client';
import { getDb } from '../db';
import { env, isLoopbackHost } from '../env';
import { actionMail, sendMail, type OutgoingMail } from '../mail';
import { signInGuard } from './sign-in-guard';
import { markUserChanged } from './freshness';

export const CLIENT_IP_HEADER = 'x-coilwright-client-ip';

/** Default lifetime of the signed session cookie cache, in seconds. */
export const SESSION_CACHE_SECONDS = 60;

export type AuthOptions = {
  db: Db;
  baseURL: string;
  secret: string;
  trustedOrigins: string[];
  send: (mail: OutgoingMail) => Promise<void>;
  signInLimit?: number;
  /** Failed sign-ins per account within 15 minutes before that account's sign-in is refused for a while. */
  accountSignInLimit?: number;
  /** Seconds a signed session cookie is trusted before the database is asked again (revocation takes effect within it). */
  sessionCacheSeconds?: number;
};

/** Built through a factory so tests can hand it their own database and mail sink. */
export function createAuth(o: AuthOptions) {
  const limit = o.signInLimit ?? 10;
  const guard = signInGuard(o.accountSignInLimit ?? 10);
  const https = new URL(o.baseURL).protocol === 'https:';
  return betterAuth({
    appName: 'Coilwright',
    baseURL: o.baseURL,
    secret: o.secret,
    trustedOrigins: o.trustedOrigins,
    database: drizzleAdapter(o.db, {
      provider: 'sqlite',
      schema: { user: schema.user, session: schema.session, account: schema.account, verification: schema.verification },
    }),
    user: {
      additionalFields: {
        unitSystem: { type: 'string', required: false, defaultValue: 'metric', input: true },
      },
    },
    emailAndPassword: {
      enabled: true,
      autoSignIn: true,
      minPasswordLength: 8,
      maxPasswordLength: 128,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user, url }) => {
        await o.send(
          actionMail(user.email, 'Reset your Coilwright password', [
            `Hello ${user.name},`,
            'Someone asked to reset the password of your Coilwright account. If it was you, choose a new password with the link below. The link works for one hour.',
            'If it was not you, ignore this message: your password stays as it is.',
          ], { label: 'Choose a new password', url }),
        );
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: true,
      sendVerificationEmail: async ({ user, url }) => {
        await o.send(
          actionMail(user.email, 'Confirm your Coilwright address', [
            `Hello ${user.name},`,
            'Welcome to Coilwright. Confirm this e-mail address so you can invite the people you build with to your designs.',
          ], { label: 'Confirm my address', url }),
        );
      },
    },
    session: {
      // A signed copy of the session in a cookie spares the database lookup on each request; a signed-out
      // or disabled session stops working when this copy expires.
      cookieCache: { enabled: true, maxAge: o.sessionCacheSeconds ?? SESSION_CACHE_SECONDS },
    },
    hooks: { before: guard.before, after: guard.after },
    databaseHooks: {
      user: { update: { after: async (u) => markUserChanged(u.id) } },
      session: {
        update: { after: async (x) => void (x.userId && markUserChanged(x.userId)) },
        delete: { after: async (x) => void (x.userId && markUserChanged(x.userId)) },
      },
    },
    plugins: [admin({ ac, roles: siteRoles, defaultRole: 'member', adminRoles: ['admin'] })],
    rateLimit: {
      enabled: true,
      window: 60,
      max: 200,
      customRules: {
        '/sign-in/email': { window: 60, max: limit },
        '/sign-up/email': { window: 60, max: limit },
        '/request-password-reset': { window: 60, max: limit },
      },
    },
    advanced: {
      // Never relaxed by the environment (test runners set TEST=true, which would otherwise skip it).
      disableOriginCheck: false,
      ipAddress: { ipAddressHeaders: [CLIENT_IP_HEADER] },
      // Secure (and __Secure- prefixed) cookies whenever the site is served over HTTPS.
      useSecureCookies: https,
    },
    telemetry: { enabled: false },
  });
}

export type Auth = ReturnType<typeof createAuth>;

export { markUserChanged } from './freshness';

/** The cookie cache lifetime in effect, in milliseconds. */
export function sessionCacheMs(): number {
  return env().COILWRIGHT_SESSION_CACHE_SECONDS * 1000;
}

/** Origins a browser request to this site may carry: the public URL, and both loopback spellings when serving on loopback. */
export function siteOrigins(): ReadonlySet<string> {
  const e = env();
  return new Set(trustedOriginsFor(e.BETTER_AUTH_URL, e.HOST, e.PORT));
}

export function trustedOriginsFor(baseURL: string, host: string, port: number): string[] {
  const origins = new Set([new URL(baseURL).origin]);
  if (isLoopbackHost(host)) {
    origins.add(`http://localhost:${port}`);
    origins.add(`http://127.0.0.1:${port}`);
  }
  return [...origins];
}

const g = globalThis as unknown as { __coilwrightAuth?: Auth };

export function getAuth(): Auth {
  if (!g.__coilwrightAuth) {
    const e = env();
    g.__coilwrightAuth = createAuth({
      db: getDb(),
      baseURL: e.BETTER_AUTH_URL,
      secret: e.BETTER_AUTH_SECRET,
      trustedOrigins: trustedOriginsFor(e.BETTER_AUTH_URL, e.HOST, e.PORT),
      send: sendMail,
      signInLimit: e.COILWRIGHT_AUTH_RATE_LIMIT,
      accountSignInLimit: e.COILWRIGHT_ACCOUNT_SIGN_IN_LIMIT,
      sessionCacheSeconds: e.COILWRIGHT_SESSION_CACHE_SECONDS,
    });
  }
  return g.__coilwrightAuth;
}
