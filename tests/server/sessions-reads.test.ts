import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Session } from '../../server/features/auth/session.model';
import { createTestApp, type TestApp } from './support/test-app';

const DAY_MS = 24 * 3600 * 1000;
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** The one session row of a user, as stored. */
async function sessionOf(userId: number) {
  const row = await Session.findOne({ where: { userId } });
  if (!row) throw new Error('no session row');
  return { expires: row.expires!.getTime(), updatedAt: (row.get('updatedAt') as Date).getTime(), row };
}

describe('signed-in reads do not write the session', () => {
  it('when a signed-in apprentice reads courses and their account, then the session row is left exactly as it was', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const before = await sessionOf(user.id);
    await new Promise((resolve) => setTimeout(resolve, 30));
    for (const url of ['/api/courses', '/api/auth/me', '/api/courses', '/api/log-entries']) {
      const res = await agent.get(url);
      expect(res.status).toBe(200);
      expect(res.headers['set-cookie']).toBeUndefined();
    }
    const after = await sessionOf(user.id);
    expect(after.updatedAt).toBe(before.updatedAt);
    expect(after.expires).toBe(before.expires);
  });

  it('when less than half of the session life is left, then the next read pushes the expiry back two weeks and sends the cookie again', async () => {
    const { agent, user } = await t.signIn('mentor');
    const { row } = await sessionOf(user.id);
    const soon = new Date(Date.now() + 6 * DAY_MS);
    const data = JSON.parse(row.data!);
    data.cookie.expires = soon.toISOString();
    await row.update({ expires: soon, data: JSON.stringify(data) });

    const res = await agent.get('/api/auth/me');
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/tickwright\.sid=/);
    const renewed = await sessionOf(user.id);
    expect(renewed.expires).toBeGreaterThan(Date.now() + 13 * DAY_MS);

    // Renewed once: the following read writes nothing again.
    const settled = renewed.updatedAt;
    await new Promise((resolve) => setTimeout(resolve, 30));
    expect((await agent.get('/api/courses')).status).toBe(200);
    expect((await sessionOf(user.id)).updatedAt).toBe(settled);
  });

  it('when the apprentice signs out, then the very next read with the same cookie is refused', async () => {
    const { agent } = await t.signIn('apprentice');
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await agent.post('/api/auth/logout')).status).toBeLessThan(300);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });
});
