/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    user: import('./server/session').SessionUser | null;
    session: { id: string; expiresAt: Date } | null;
    /** Headers of the rate limit that applied to this request, added to the response by the middleware. */
    rateLimit?: Record<string, string>;
  }
}
