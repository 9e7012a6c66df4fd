/** A local SMTP server (smtp-server) that parses each message (mailparser) and hands it to a store callback. */
import { SMTPServer } from 'smtp-server';
import { simpleParser, type AddressObject } from 'mailparser';
import type { Logger } from './logger';

/** Header the mailer sets so the outbox can show each workspace only its own mail. */
export const WORKSPACE_HEADER = 'x-heatloom-workspace';

/** A parsed message as the outbox keeps it. */
export interface ReceivedMail {
  workspaceId: number | null;
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string | null;
  date: Date;
}

/** A running fake SMTP server. */
export interface FakeSmtp {
  port: number;
  close(): Promise<void>;
}

const addresses = (a: AddressObject | AddressObject[] | undefined): string =>
  (Array.isArray(a) ? a : a ? [a] : []).map((x) => x.text).join(', ');

/** Start the fake on `port`, or on any free port (with a warning) when that one is taken. */
export async function startFakeSmtpOrFallback(port: number, store: (mail: ReceivedMail) => Promise<void>, logger: Logger): Promise<FakeSmtp> {
  try {
    return await startFakeSmtp(port, store, logger);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || port === 0) throw err;
    logger.warn(`SMTP_FAKE_PORT ${port} is in use; the local SMTP server takes a free port instead.`);
    return startFakeSmtp(0, store, logger);
  }
}

/** Start the fake on 127.0.0.1:`port` (0 = any free port); `store` runs before the message is acknowledged. */
export async function startFakeSmtp(port: number, store: (mail: ReceivedMail) => Promise<void>, logger: Logger): Promise<FakeSmtp> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const ws = Number(parsed.headers.get(WORKSPACE_HEADER));
          await store({
            workspaceId: Number.isInteger(ws) && ws > 0 ? ws : null,
            to: addresses(parsed.to),
            from: addresses(parsed.from),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            date: parsed.date ?? new Date(),
          });
          callback();
        })
        .catch((err: Error) => {
          logger.error('Fake SMTP could not store a message', err);
          callback(err);
        });
    },
  });
  server.on('error', (err) => logger.warn('Fake SMTP error', err.message));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  const actualPort = typeof address === 'object' && address ? address.port : port;
  return { port: actualPort, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
