import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { z } from 'zod';

const port = z.coerce
  .number({ error: 'must be a port number (0 to 65535)' })
  .int('must be a port number (0 to 65535)')
  .min(0, 'must be a port number (0 to 65535)')
  .max(65535, 'must be a port number (0 to 65535)');

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: port.default(3000),
  DATA_DIR: z.string().min(1).default('./data'),
  APP_URL: z.url({ protocol: /^https?$/ }).optional(),
  SESSION_SECRET: z.string().min(16, 'must be at least 16 characters').optional(),
  SMTP_URL: z.url({ protocol: /^smtps?$/ }).optional(),
  MAIL_FROM: z.string().default('Tickwright <no-reply@saltmarsh-guild.test>'),
  GUILD_NAME: z.string().trim().min(2, 'must name the guild').max(120).default('Saltmarsh Guild of Clockmakers'),
  DEV_SMTP_PORT: port.default(1025),
  DEV_MAIL_WEB_PORT: port.default(1080),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  UPLOAD_QUOTA_MB: z.coerce
    .number({ error: 'must be a whole number of megabytes' })
    .int('must be a whole number of megabytes')
    .min(1, 'must be at least 1 (megabyte)')
    .default(500),
});

export interface Config {
  env: 'development' | 'production' | 'test';
  port: number;
  dataDir: string;
  /** The app's public origin, e.g. http://localhost:3000; state-changing requests must come from it. */
  appUrl: string;
  sessionSecret: string;
  /** Unset: a local fake SMTP service (maildev) is started and used. */
  smtpUrl?: string;
  mailFrom: string;
  /** The guild that issues certificates, printed on them and named by the public check. */
  guildName: string;
  devSmtpPort: number;
  devMailWebPort: number;
  logLevel: string;
  /** How much photo storage each person may fill (all stored sizes counted), in bytes. */
  uploadQuotaBytes: number;
}

export class ConfigError extends Error {}

/** Reads and validates the environment once; a bad value throws a ConfigError naming the variable. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(source);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const name = String(issue.path[0]);
    throw new ConfigError(`Invalid ${name}=${JSON.stringify(source[name])}: ${issue.message}`);
  }
  const env = parsed.data;
  const dataDir = path.resolve(env.DATA_DIR);
  mkdirSync(dataDir, { recursive: true });
  return {
    env: env.NODE_ENV,
    port: env.PORT,
    dataDir,
    appUrl: (env.APP_URL ?? `http://localhost:${env.PORT}`).replace(/\/$/, ''),
    sessionSecret: env.SESSION_SECRET ?? persistentSecret(dataDir),
    smtpUrl: env.SMTP_URL,
    mailFrom: env.MAIL_FROM,
    guildName: env.GUILD_NAME,
    devSmtpPort: env.DEV_SMTP_PORT,
    devMailWebPort: env.DEV_MAIL_WEB_PORT,
    logLevel: env.LOG_LEVEL,
    uploadQuotaBytes: env.UPLOAD_QUOTA_MB * 1024 * 1024,
  };
}

/** Generated once and kept beside the database, so that a restart does not sign everyone out. */
function persistentSecret(dataDir: string): string {
  const file = path.join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}

/** For entry points: one clear line naming the bad variable, and a non-zero exit. */
export function loadConfigOrExit(): Config {
  try {
    return loadConfig();
  } catch (err) {
    if (!(err instanceof ConfigError)) throw err;
    console.error(`Tickwright cannot start: ${err.message}`);
    process.exit(1);
  }
}
