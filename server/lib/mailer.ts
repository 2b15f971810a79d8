import nodemailer, { type Transporter } from 'nodemailer';
import type { Config } from '../config/env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

/**
 * A mail server that accepts a connection and never answers must not hold the outbox for minutes: give up on it
 * quickly and let the outbox try again later.
 */
export const SMTP_TIMEOUTS = { connectionTimeout: 8000, greetingTimeout: 8000, socketTimeout: 20_000 };

/**
 * Production sends through SMTP_URL; development sends to the local fake SMTP service (see dev-mail.ts), whose
 * inbox the admin can open; tests pass a nodemailer test transport. Nothing but the outbox worker sends mail.
 */
export function createMailer(config: Config, transport?: Transporter): Mailer {
  const transporter =
    transport ??
    nodemailer.createTransport(
      config.smtpUrl
        ? { url: config.smtpUrl, ...SMTP_TIMEOUTS }
        : { host: '127.0.0.1', port: config.devSmtpPort, secure: false, ignoreTLS: true, ...SMTP_TIMEOUTS },
    );
  return {
    async send(mail) {
      await transporter.sendMail({ from: config.mailFrom, ...mail });
    },
  };
}
