import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { openAndMigrate } from '../../server/boot';
import { loadConfig } from '../../server/config/env';
import { hashPassword } from '../../server/features/auth/passwords';
import { Session } from '../../server/features/auth/session.model';
import { User } from '../../server/features/auth/user.model';
import { createLogger } from '../../server/lib/logger';
import { ORIGIN, TEST_PASSWORD } from './support/test-app';

const dataDir = mkdtempSync(path.join(tmpdir(), 'tickwright-restart-'));
afterAll(() => rmSync(dataDir, { recursive: true, force: true }));

/** One "server start": a new Sequelize over the same data folder, migrated, and a new app on top of it. */
async function start(sessionSecret = 'restart-secret-restart-secret') {
  const config = loadConfig({ NODE_ENV: 'test', DATA_DIR: dataDir, APP_URL: ORIGIN, SESSION_SECRET: sessionSecret });
  const { sequelize } = await openAndMigrate(config);
  const app = createApp({ sequelize, config, logger: createLogger(config) });
  return { app, stop: () => sequelize.close() };
}

const me = (app: Parameters<typeof request>[0], cookie: string) =>
  request(app).get('/api/auth/me').set('Cookie', cookie);

// Each start migrates and syncs content/ afresh, which takes a few seconds on a busy machine.
describe('sessions across a restart', { timeout: 60_000 }, () => {
  it('when the server restarts, then a signed-in session keeps working, until the account is deactivated', async () => {
    const first = await start();
    const user = await User.create({
      name: 'Odile Marchetti',
      email: 'odile-restart@example.test',
      role: 'mentor',
      passwordHash: await hashPassword(TEST_PASSWORD),
    });
    const login = await request(first.app)
      .post('/api/auth/login')
      .set('Origin', ORIGIN)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    const cookie = String(login.headers['set-cookie']).split(';')[0];
    expect(cookie).toMatch(/^tickwright\.sid=/);
    await first.stop();

    const second = await start();
    const res = await me(second.app, cookie);
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: user.id, role: 'mentor' });
    await User.update({ active: false }, { where: { id: user.id } });
    expect((await me(second.app, cookie)).status).toBe(401);
    await second.stop();
  });

  it('when the server restarts with another session secret, then old cookies are no longer accepted', async () => {
    const first = await start();
    const user = await User.create({
      name: 'Bram Okafor',
      email: 'bram-restart@example.test',
      role: 'mentor',
      passwordHash: await hashPassword(TEST_PASSWORD),
    });
    const login = await request(first.app)
      .post('/api/auth/login')
      .set('Origin', ORIGIN)
      .send({ email: user.email, password: TEST_PASSWORD });
    const cookie = String(login.headers['set-cookie']).split(';')[0];
    expect(await Session.count({ where: { userId: user.id } })).toBe(1);
    await first.stop();

    const other = await start('a-different-secret-entirely');
    expect((await me(other.app, cookie)).status).toBe(401);
    await other.stop();
  });
});
