// A local SMTP server for development and tests: it speaks real SMTP (so
// nodemailer's whole path runs) on 127.0.0.1 and keeps what it receives.
import { SMTPServer } from 'smtp-server';

export interface ReceivedMail {
  from: string;
  to: string[];
  raw: string;
  subject: string;
}

export interface SmtpFake {
  url: string;
  received: ReceivedMail[];
  /** Make the next `count` deliveries fail (to exercise retries). */
  failNext(count: number): void;
  stop(): Promise<void>;
}

/** Undoes quoted-printable soft breaks and =XX escapes, enough to read bodies in tests. */
function decodeQuotedPrintable(s: string): string {
  return s.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/g, (_, h) => String.fromCharCode(parseInt(h, 16)));
}

export async function startSmtpFake(): Promise<SmtpFake> {
  const received: ReceivedMail[] = [];
  let failures = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        if (failures > 0) {
          failures--;
          const err = new Error('Mailbox temporarily unavailable (simulated)') as Error & { responseCode: number };
          err.responseCode = 451;
          return callback(err);
        }
        const raw = decodeQuotedPrintable(Buffer.concat(chunks).toString('utf8'));
        const subject = /^Subject: (.*)$/m.exec(raw)?.[1]?.trim() ?? '';
        received.push({
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          raw,
          subject,
        });
        callback();
      });
    },
  });
  const port: number = await new Promise((ok, fail) => {
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => ok((server.server.address() as { port: number }).port));
  });
  return {
    url: `smtp://127.0.0.1:${port}`,
    received,
    failNext: (n) => {
      failures = n;
    },
    stop: () => new Promise((ok) => server.close(() => ok())),
  };
}
