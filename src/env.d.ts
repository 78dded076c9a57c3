/// <reference types="astro/client" />

declare namespace App {
  interface Locals {
    user: import('./server/session').SessionUser | null;
    session: { id: string; expiresAt: Date } | null;
  }
}
