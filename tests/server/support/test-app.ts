import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import nodemailer from 'nodemailer';
import request from 'supertest';
import type { Role } from '@shared/schemas/user';
import { createApp } from '../../../server/app';
import { openAndMigrate } from '../../../server/boot';
import { loadConfig } from '../../../server/config/env';
import { hashPassword } from '../../../server/features/auth/passwords';
import { User } from '../../../server/features/auth/user.model';
import { createLogger } from '../../../server/lib/logger';
import { createMailer } from '../../../server/lib/mailer';
import { createOutboxWorker } from '../../../server/features/outbox/outbox-worker';

export const TEST_PASSWORD = 'correct-horse-battery';
export const ORIGIN = 'http://localhost:3000';
let hash: Promise<string> | undefined;

export interface SentMail {
  to: string;
  subject: string;
  text: string;
}

/**
 * A fresh app over a fresh, migrated SQLite file in a temporary folder (content/ synced). E-mail waits in the outbox
 * table until a test calls `deliverMail()`, which runs one pass of the outbox worker: delivered mail goes to nodemailer's
 * JSON test transport and is collected in `sent`. With `logLines`, every line the app logs is pushed there.
 */
export async function createTestApp(env: Record<string, string> = {}, options: { logLines?: string[] } = {}) {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'tickwright-test-'));
  const config = loadConfig({
    NODE_ENV: 'test',
    DATA_DIR: dataDir,
    APP_URL: ORIGIN,
    SESSION_SECRET: 'test-secret-test-secret',
    ...env,
  });
  const { logLines } = options;
  const logger = createLogger(config, logLines ? { write: (line: string) => void logLines.push(line) } : undefined);
  const { sequelize } = await openAndMigrate(config);
  const sent: SentMail[] = [];
  const transport = nodemailer.createTransport({ jsonTransport: true });
  const mailer = createMailer(config, transport);
  const send = mailer.send;
  mailer.send = async (mail) => {
    await send(mail);
    sent.push({ to: mail.to, subject: mail.subject, text: mail.text });
  };
  const outboxWorker = createOutboxWorker({ mailer, logger });
  const app = createApp({ sequelize, config, logger });

  /** Delivers whatever the outbox holds that is due, then returns everything delivered so far. */
  async function deliverMail() {
    await outboxWorker.deliverDue();
    return sent;
  }

  async function createUser(role: Role, fields: Partial<{ name: string; email: string; active: boolean }> = {}) {
    hash ??= hashPassword(TEST_PASSWORD);
    const n = Math.random().toString(36).slice(2, 8);
    return User.create({
      name: fields.name ?? `${role} ${n}`,
      email: fields.email ?? `${role}-${n}@example.test`,
      role,
      passwordHash: await hash,
      active: fields.active ?? true,
    });
  }

  /** A supertest agent signed in as a new (or given) user; it sends the app's Origin on every request. */
  async function signIn(roleOrUser: Role | User) {
    const user = typeof roleOrUser === 'string' ? await createUser(roleOrUser) : roleOrUser;
    const agent = request.agent(app);
    const res = await agent
      .post('/api/auth/login')
      .set('Origin', ORIGIN)
      .send({ email: user.email, password: TEST_PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
    return { agent: withOrigin(agent), user };
  }

  async function close() {
    await sequelize.close();
    rmSync(dataDir, { recursive: true, force: true });
  }

  return {
    app,
    sequelize,
    config,
    dataDir,
    sent,
    mailer,
    deliverMail,
    createUser,
    signIn,
    close,
    anon: () => withOrigin(request.agent(app)),
  };
}

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;

type Agent = ReturnType<typeof request.agent>;
/** Wraps an agent so that state-changing calls carry the app's Origin, as a browser would. */
function withOrigin(agent: Agent) {
  return {
    raw: agent,
    get: (url: string) => agent.get(url),
    post: (url: string) => agent.post(url).set('Origin', ORIGIN),
    patch: (url: string) => agent.patch(url).set('Origin', ORIGIN),
    put: (url: string) => agent.put(url).set('Origin', ORIGIN),
    delete: (url: string) => agent.delete(url).set('Origin', ORIGIN),
  };
}
