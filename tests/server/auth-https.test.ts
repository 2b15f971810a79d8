import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/features/auth/user.model';
import { Invitation } from '../../server/features/classes/invitation.model';
import { newLinkToken } from '../../server/lib/link-token';
import { makeClass } from './support/classes-fixture';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';

const APP_URL = 'https://bench.saltmarsh-guild.test';
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ APP_URL });
});
afterAll(() => t.close());

const login = (email: string, proto?: string) => {
  const req = request(t.app).post('/api/auth/login').set('Origin', APP_URL);
  return (proto ? req.set('X-Forwarded-Proto', proto) : req).send({ email, password: TEST_PASSWORD });
};

describe('an https APP_URL reached over plain http', () => {
  it('when someone signs in over http, then it answers 403 saying where to sign in, and sets no cookie', async () => {
    const user = await t.createUser('apprentice');
    const res = await login(user.email);
    expect(res.status).toBe(403);
    expect(res.body).toEqual({
      error: { code: 'HTTPS_REQUIRED', message: expect.stringContaining(APP_URL) },
    });
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('when a proxy in front says the request came over https, then sign-in works with a Secure cookie', async () => {
    const user = await t.createUser('mentor');
    const res = await login(user.email, 'https');
    expect(res.status).toBe(200);
    expect(String(res.headers['set-cookie'])).toMatch(/tickwright\.sid=.*; Secure/);
  });

  it('when an invitation is accepted over http, then it is refused before any account is made', async () => {
    const cls = await makeClass();
    const { token, tokenHash, expiresAt } = newLinkToken(3600_000);
    const admin = await t.createUser('admin');
    await Invitation.create({
      classId: cls.id,
      email: 'plain-http@example.test',
      name: null,
      tokenHash,
      expiresAt,
      invitedById: admin.id,
    });
    const res = await request(t.app)
      .post(`/api/invitations/${token}/accept`)
      .set('Origin', APP_URL)
      .send({ name: 'Plain Http', password: 'long-enough-pw-1' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('HTTPS_REQUIRED');
    expect(await User.count({ where: { email: 'plain-http@example.test' } })).toBe(0);
  });
});
