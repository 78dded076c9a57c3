import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import { caughtMail } from '../../src/server/mail/dev-store';

function addresses(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).flatMap((x) => x.value.map((v) => v.address ?? '')).join(', ');
}

/** A local SMTP server that accepts every message and keeps it in this process for /dev/mail. */
export async function startFakeMail(port = 0) {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((m) => {
          caughtMail().push({
            to: addresses(m.to),
            subject: m.subject ?? '',
            text: m.text ?? '',
            html: typeof m.html === 'string' ? m.html : '',
            date: (m.date ?? new Date()).toISOString(),
          });
          callback();
        })
        .catch((e: Error) => callback(e));
    },
  });
  await new Promise<void>((ok, fail) => {
    server.once('error', fail);
    server.listen(port, '127.0.0.1', () => ok());
  });
  const address = server.server.address();
  const actual = typeof address === 'object' && address ? address.port : port;
  return { port: actual, stop: () => new Promise<void>((ok) => server.close(() => ok())) };
}
