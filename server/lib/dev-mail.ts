import type { Config } from '../config/env';

/** Starts maildev, the local fake SMTP service with an inbox page, when no real SMTP_URL is configured. */
export async function startDevMailServer(config: Config): Promise<string | null> {
  if (config.smtpUrl) return null;
  const { MailDev } = await import('maildev');
  const maildev = new MailDev({
    smtp: config.devSmtpPort,
    web: config.devMailWebPort,
    ip: '127.0.0.1',
    webIp: '127.0.0.1',
    silent: true,
  });
  await maildev.start();
  return devMailInboxUrl(config);
}

export const devMailInboxUrl = (config: Config) =>
  config.smtpUrl ? null : `http://localhost:${config.devMailWebPort}`;
