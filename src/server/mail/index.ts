import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../env';

export type OutgoingMail = { to: string; subject: string; text: string; html: string };

let transport: Transporter | undefined;

/** The fake local SMTP server's port, set by the start script when no SMTP_URL is configured. */
export function devMailPort(): number | null {
  const e = env();
  return e.COILWRIGHT_DEV_SMTP_PORT && !e.SMTP_URL ? e.COILWRIGHT_DEV_SMTP_PORT : null;
}

function getTransport(): Transporter {
  if (transport) return transport;
  const e = env();
  if (e.SMTP_URL) transport = nodemailer.createTransport(e.SMTP_URL);
  else {
    const port = devMailPort();
    if (!port) throw new Error('No mail transport: set SMTP_URL, or start the app with npm start');
    transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }
  return transport;
}

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ from: env().MAIL_FROM, ...mail });
}

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/** A plain-text and an HTML part from one message with one action link. */
export function actionMail(to: string, subject: string, lines: string[], action: { label: string; url: string }): OutgoingMail {
  const text = [...lines, '', `${action.label}: ${action.url}`, '', '— Coilwright'].join('\n');
  const html = `<!doctype html><html><body style="font-family:sans-serif;line-height:1.5">${lines
    .map((l) => `<p>${escapeHtml(l)}</p>`)
    .join('')}<p><a href="${escapeHtml(action.url)}">${escapeHtml(action.label)}</a></p><p style="color:#666">${escapeHtml(
    action.url,
  )}</p><p>— Coilwright</p></body></html>`;
  return { to, subject, text, html };
}
