import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { startServer, freePort, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';

// With SMTP_URL set, mail goes to that server and the dev mail pages do not exist.
let s: TestServer;
let smtp: SMTPServer;
const received: Array<{ to: string; subject: string }> = [];

beforeAll(async () => {
  const port = await freePort();
  smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _s, cb) {
      simpleParser(stream).then((m) => {
        received.push({ to: JSON.stringify(m.to), subject: m.subject ?? '' });
        cb();
      }, cb);
    },
  });
  await new Promise<void>((ok) => smtp.listen(port, '127.0.0.1', () => ok()));
  s = await startServer({ SMTP_URL: `smtp://127.0.0.1:${port}` });
});
afterAll(async () => {
  await s?.stop();
  await new Promise<void>((ok) => smtp?.close(() => ok()));
});

describe('SMTP_URL configured', () => {
  it('sends the verification mail through the configured server and hides /dev/mail', async () => {
    await new Client(s.url).signUp('Sam', 'sam@example.test');
    const end = Date.now() + 10_000;
    while (!received.some((m) => m.to.includes('sam@example.test')) && Date.now() < end) await new Promise((r) => setTimeout(r, 100));
    expect(received.some((m) => m.to.includes('sam@example.test') && /Confirm/.test(m.subject))).toBe(true);
    expect((await fetch(`${s.url}/dev/mail.json`)).status).toBe(404);
    expect((await fetch(`${s.url}/dev/mail`)).status).toBe(404);
  });
});
