/** Sends e-mail through nodemailer: a real SMTP relay from config, or the local fake. */
import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config';
import type { Logger } from './logger';
import { WORKSPACE_HEADER } from './fakeSmtp';

/** One outgoing message. */
export interface Mail {
  to: string | string[];
  subject: string;
  text: string;
  html?: string;
  workspaceId?: number;
}

/** Sends mail; `send` resolves true when the relay accepted it, false (logged) when it failed. */
export interface Mailer {
  send(mail: Mail): Promise<boolean>;
  close(): void;
}

/** Build a mailer for the configured relay, or for the fake listening on `fakePort`. */
export function createMailer(config: Config, logger: Logger, fakePort: number | null): Mailer {
  const transport: Transporter = config.smtp
    ? nodemailer.createTransport({
        host: config.smtp.host,
        port: config.smtp.port,
        secure: config.smtp.secure,
        auth: config.smtp.user ? { user: config.smtp.user, pass: config.smtp.pass ?? '' } : undefined,
      })
    : nodemailer.createTransport({ host: '127.0.0.1', port: fakePort ?? 0, secure: false, ignoreTLS: true });
  return {
    async send(mail) {
      try {
        await transport.sendMail({
          from: config.mailFrom,
          to: mail.to,
          subject: mail.subject,
          text: mail.text,
          html: mail.html,
          headers: mail.workspaceId ? { [WORKSPACE_HEADER]: String(mail.workspaceId) } : undefined,
        });
        return true;
      } catch (err) {
        logger.warn(`Mail to ${String(mail.to)} failed`, (err as Error).message);
        return false;
      }
    },
    close: () => transport.close(),
  };
}
