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
 * Production sends through SMTP_URL; development sends to the local fake SMTP service (see dev-mail.ts), whose
 * inbox the admin can open; tests pass a nodemailer test transport to createApp and read what it caught.
 */
export function createMailer(config: Config, transport?: Transporter): Mailer {
  const transporter =
    transport ??
    nodemailer.createTransport(
      config.smtpUrl ?? { host: '127.0.0.1', port: config.devSmtpPort, secure: false, ignoreTLS: true },
    );
  return {
    async send(mail) {
      await transporter.sendMail({ from: config.mailFrom, ...mail });
    },
  };
}
