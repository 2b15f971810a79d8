import { mkdtempSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { openAndMigrate } from '../../server/boot';
import { loadConfig } from '../../server/config/env';
import { User } from '../../server/features/auth/user.model';
import { notify } from '../../server/features/notifications/notifications.service';
import { OutboxMessage } from '../../server/features/outbox/outbox-message.model';
import { createOutboxWorker, retryDelayMs } from '../../server/features/outbox/outbox-worker';
import { createLogger } from '../../server/lib/logger';
import { createMailer, type OutgoingMail } from '../../server/lib/mailer';
import { makeClass } from './support/classes-fixture';
import { createTestApp, ORIGIN, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** A worker whose mail server refuses every message with the given error. */
const failingWorker = (error = 'mail server down') =>
  createOutboxWorker({
    mailer: { send: async () => Promise.reject(new Error(error)) },
    logger: createLogger(t.config),
  });

const past = () => new Date(Date.now() - 1000);

describe('the outbox', () => {
  it('when the mail server fails, then the message stays queued with the error and goes out on a later try; a reset link is then emptied', async () => {
    const user = await t.createUser('apprentice');
    expect((await t.anon().post('/api/auth/password-reset').send({ email: user.email })).status).toBe(202);
    const message = await waitForMessage(user.email);
    expect(message).toMatchObject({ kind: 'password-reset', state: 'queued', secret: true, attempts: 0 });

    await failingWorker().deliverDue();
    await message.reload();
    expect(message).toMatchObject({ state: 'queued', attempts: 1, lastError: 'mail server down' });
    const wait = message.nextAttemptAt!.getTime() - Date.now();
    expect(wait).toBeGreaterThan(retryDelayMs(1) - 5000);
    expect(wait).toBeLessThanOrEqual(retryDelayMs(1));

    // Not due yet: a pass leaves it alone.
    await t.deliverMail();
    expect((await message.reload()).state).toBe('queued');
    await message.update({ nextAttemptAt: past() });
    const sent = (await t.deliverMail()).filter((m) => m.to === user.email);
    expect(sent).toHaveLength(1);
    expect(sent[0].text).toMatch(/\/reset-password\/[A-Za-z0-9_-]+/);
    await message.reload();
    expect(message).toMatchObject({ state: 'sent', attempts: 2, lastError: null, text: '' });
    expect(message.sentAt).toBeInstanceOf(Date);
  });

  it('when retries run past a day, then the message is failed, the office sees it without its text, and resending delivers it', async () => {
    const mentor = await t.createUser('mentor');
    const { mailId } = await notify(mentor.id, { kind: 'test', title: 'Piece waiting', body: 'A piece waits.' });
    await OutboxMessage.update({ giveUpAt: past() }, { where: { id: mailId! } });
    await failingWorker('550 mailbox unavailable').deliverDue();
    const failed = (await OutboxMessage.findByPk(mailId!))!;
    expect(failed).toMatchObject({ state: 'failed', lastError: '550 mailbox unavailable', nextAttemptAt: null });

    const admin = await t.signIn('admin');
    const list = await admin.agent.get('/api/outbox?state=failed');
    expect(list.status).toBe(200);
    const row = list.body.messages.find((m: { id: number }) => m.id === mailId);
    expect(row).toMatchObject({ to: mentor.email, subject: 'Piece waiting', state: 'failed', attempts: 1 });
    expect(row).not.toHaveProperty('text');
    expect(list.body.counts.failed).toBeGreaterThanOrEqual(1);
    expect(list.body.messages.every((m: { state: string }) => m.state === 'failed')).toBe(true);
    expect((await admin.agent.get('/api/outbox?state=lost')).status).toBe(400);

    const { agent: mentorAgent } = await t.signIn(mentor);
    expect((await mentorAgent.get('/api/outbox')).status).toBe(403);
    expect((await mentorAgent.post(`/api/outbox/${mailId}/resend`)).status).toBe(403);

    const resent = await admin.agent.post(`/api/outbox/${mailId}/resend`);
    expect(resent.status).toBe(200);
    expect(resent.body).toMatchObject({ id: mailId, state: 'queued', attempts: 0, lastError: null });
    expect((await admin.agent.post(`/api/outbox/${mailId}/resend`)).status).toBe(409);
    expect((await t.deliverMail()).filter((m) => m.to === mentor.email)).toHaveLength(1);
    expect((await OutboxMessage.findByPk(mailId!))!.state).toBe('sent');
  });

  it('when the link in a message runs out before it could be delivered, then it is failed rather than sent', async () => {
    const user = await t.createUser('apprentice');
    await t.anon().post('/api/auth/password-reset').send({ email: user.email });
    const message = await waitForMessage(user.email);
    await message.update({ expiresAt: past() });
    const sent = await t.deliverMail();
    expect(sent.filter((m) => m.to === user.email)).toEqual([]);
    expect(await message.reload()).toMatchObject({ state: 'failed', lastError: expect.stringMatching(/ran out/) });
  });
});

describe('a mail server that hangs', () => {
  let silent: Server;
  let port: number;
  beforeAll(async () => {
    // Accepts connections and never says a word, like a mail server that has hung.
    silent = createServer(() => undefined);
    await new Promise<void>((resolve) => silent.listen(0, '127.0.0.1', resolve));
    port = (silent.address() as { port: number }).port;
  });
  afterAll(() => new Promise<void>((resolve) => silent.close(() => resolve())));

  it('when an office invites two addresses, then the reply comes at once with both mails queued, none sent in the request', async () => {
    const { agent } = await t.signIn('admin');
    const cls = await makeClass();
    const invited = await agent
      .post(`/api/classes/${cls.id}/invitations`)
      .send({ emails: ['first-hung@example.test', 'second-hung@example.test'] });
    expect(invited.status).toBe(200);
    expect(invited.body.results.map((r: { mail: string }) => r.mail)).toEqual(['queued', 'queued']);
    expect(t.sent.filter((m) => m.to.endsWith('-hung@example.test'))).toEqual([]);
    const queued = await OutboxMessage.findAll({
      where: { to: ['first-hung@example.test', 'second-hung@example.test'] },
    });
    expect(queued.map((m) => [m.kind, m.state, m.secret])).toEqual([
      ['invitation', 'queued', true],
      ['invitation', 'queued', true],
    ]);
  });

  it('when the worker meets a server that never greets, then it gives up on it within the SMTP timeouts and keeps the message queued', async () => {
    const user = await t.createUser('mentor');
    const { mailId } = await notify(user.id, { kind: 'test', title: 'Hung', body: 'B' });
    const config = loadConfig({ ...baseEnv(t.dataDir), SMTP_URL: `smtp://127.0.0.1:${port}` });
    const worker = createOutboxWorker({ mailer: createMailer(config), logger: createLogger(config) });
    // Other messages from earlier tests may be due: only this one's outcome matters.
    await OutboxMessage.update({ nextAttemptAt: new Date(Date.now() + 3600_000) }, { where: { state: 'queued' } });
    await OutboxMessage.update({ nextAttemptAt: past() }, { where: { id: mailId! } });
    await worker.deliverDue();
    const message = (await OutboxMessage.findByPk(mailId!))!;
    expect(message.state).toBe('queued');
    expect(message.attempts).toBe(1);
    expect(message.lastError).toMatch(/greeting|timeout/i);
  }, 30_000);
});

describe('across a restart', () => {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'tickwright-outbox-'));
  afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

  it('when the server stops with mail still queued, then the next start delivers it without anyone asking again', async () => {
    const first = await openAndMigrate(loadConfig(baseEnv(dataDir)));
    const app = createApp({ sequelize: first.sequelize, config: loadConfig(baseEnv(dataDir)), logger: silentLogger() });
    const user = await User.create({ name: 'Ruth Pellow', email: 'ruth-restart@example.test', role: 'apprentice' });
    expect(
      (await request(app).post('/api/auth/password-reset').set('Origin', ORIGIN).send({ email: user.email })).status,
    ).toBe(202);
    await expect.poll(() => OutboxMessage.count({ where: { to: user.email, state: 'queued' } })).toBe(1);
    await first.sequelize.close();

    const second = await openAndMigrate(loadConfig(baseEnv(dataDir)));
    const delivered: OutgoingMail[] = [];
    const worker = createOutboxWorker({
      mailer: { send: async (m) => void delivered.push(m) },
      logger: silentLogger(),
    });
    expect(await worker.deliverDue()).toBe(1);
    expect(delivered.map((m) => m.to)).toEqual([user.email]);
    expect((await OutboxMessage.findOne({ where: { to: user.email } }))!.state).toBe('sent');
    await second.sequelize.close();
  });
});

function baseEnv(dataDir: string) {
  return { NODE_ENV: 'test', DATA_DIR: dataDir, APP_URL: ORIGIN, SESSION_SECRET: 'outbox-secret-outbox-secret' };
}

function silentLogger() {
  return createLogger(loadConfig({ ...baseEnv(tmpdir()), LOG_LEVEL: 'silent' }));
}

async function waitForMessage(to: string) {
  // The reset is answered before its row and mail are written.
  await expect.poll(() => OutboxMessage.count({ where: { to } })).toBe(1);
  return (await OutboxMessage.findOne({ where: { to } }))!;
}
