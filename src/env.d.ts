/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    user: import('./server/session').SessionUser | null;
    session: { id: string; expiresAt: Date } | null;
    /** Headers of the rate limit that applied to this request, added to the response by the middleware. */
    rateLimit?: Record<string, string>;
    /** Set by a page whose HTML may be kept in the render cache under this key (see server/render-cache). */
    renderKey?: string;
  }
}
