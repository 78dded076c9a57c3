import { z } from 'zod';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes } from 'node:crypto';
import { dirname, resolve } from 'node:path';

// Read once, validated; a bad value stops the start with the variable's name.
const schema = z.object({
  PORT: z.coerce.number().int().min(1).max(65535).default(4321),
  HOST: z.string().min(1).default('127.0.0.1'),
  DATABASE_URL: z.string().min(1).default('file:data/coilwright.db'),
  DATABASE_AUTH_TOKEN: z.string().optional(),
  BETTER_AUTH_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  BETTER_AUTH_URL: z.url().optional(),
  SMTP_URL: z.string().optional(),
  MAIL_FROM: z.string().default('Coilwright <no-reply@coilwright.local>'),
  S3_ENDPOINT: z.string().optional(),
  S3_BUCKET: z.string().default('coilwright'),
  S3_ACCESS_KEY_ID: z.string().optional(),
  S3_SECRET_ACCESS_KEY: z.string().optional(),
  S3_REGION: z.string().default('us-east-1'),
  DATA_DIR: z.string().default('data'),
  // Set by the start script when it runs the local fake mail and S3 servers (no SMTP_URL / S3_ENDPOINT given).
  COILWRIGHT_DEV_SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  COILWRIGHT_DEV_S3_ENDPOINT: z.string().optional(),
  // Requests per minute and client; the tests raise the sign-in limit.
  COILWRIGHT_AUTH_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
  COILWRIGHT_SOLVE_RATE_LIMIT: z.coerce.number().int().min(1).default(120),
  // 1: render the pages that are the same for every visitor right after start (the first visitor waits for none)
  COILWRIGHT_WARM_PAGES: z.coerce.number().int().min(0).max(1).default(1),
  // Invitation mails per minute and account: a short burst is fine, a flood is not.
  COILWRIGHT_INVITE_RATE_LIMIT: z.coerce.number().int().min(1).default(20),
  // Failed sign-ins per account within 15 minutes; seconds the signed session cookie copy is trusted.
  COILWRIGHT_ACCOUNT_SIGN_IN_LIMIT: z.coerce.number().int().min(1).default(10),
  COILWRIGHT_SESSION_CACHE_SECONDS: z.coerce.number().int().min(1).max(3600).default(60),
  /** Reverse proxies whose X-Forwarded-For / X-Forwarded-Proto are believed: addresses or CIDR ranges, comma-separated. */
  TRUSTED_PROXIES: z
    .string()
    .optional()
    .refine((v) => v === undefined || v.split(',').every((x) => x.trim() === '' || /^[0-9a-fA-F:.]+(\/\d{1,3})?$/.test(x.trim())), 'must list IP addresses or CIDR ranges, comma-separated'),
});

export type Env = z.infer<typeof schema> & { BETTER_AUTH_SECRET: string; BETTER_AUTH_URL: string };

let cached: Env | undefined;

function loadSecret(dataDir: string): string {
  const file = resolve(dataDir, 'auth-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dirname(file), { recursive: true });
  const secret = randomBytes(32).toString('base64url');
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

export function env(): Env {
  if (cached) return cached;
  const raw = Object.fromEntries(Object.entries(process.env).filter(([, v]) => v !== ''));
  const parsed = schema.safeParse(raw);
  if (!parsed.success) {
    const names = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new Error(`Invalid environment: ${names}`);
  }
  const e = parsed.data;
  cached = {
    ...e,
    BETTER_AUTH_SECRET: e.BETTER_AUTH_SECRET ?? loadSecret(e.DATA_DIR),
    BETTER_AUTH_URL: e.BETTER_AUTH_URL ?? `http://${e.HOST.includes(':') ? `[${e.HOST}]` : e.HOST}:${e.PORT}`,
  };
  return cached;
}

export function isLoopbackHost(host: string): boolean {
  return host === '127.0.0.1' || host === 'localhost' || host === '::1' || host.startsWith('127.');
}
