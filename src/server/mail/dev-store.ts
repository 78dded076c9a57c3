// Mail caught by the local fake SMTP server (only when no SMTP_URL is set), kept in this process.
export type CaughtMail = { to: string; subject: string; text: string; html: string; date: string };

const g = globalThis as unknown as { __coilwrightCaughtMail?: CaughtMail[] };

export function caughtMail(): CaughtMail[] {
  g.__coilwrightCaughtMail ??= [];
  return g.__coilwrightCaughtMail;
}
