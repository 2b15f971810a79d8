import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '@shared/schemas/user';
import { createApp } from '../../server/app';
import { User } from '../../server/features/auth/user.model';
import { createLogger } from '../../server/lib/logger';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

type Who = 'anonymous' | Role;
type Method = 'get' | 'post' | 'patch';
interface Route {
  method: Method;
  url: string;
  body?: object;
  expect: Record<Who, number>;
}

const everyone = (status: number): Record<Who, number> => ({
  anonymous: status,
  apprentice: status,
  mentor: status,
  admin: status,
});
const signedIn = (status: number): Record<Who, number> => ({
  anonymous: 401,
  apprentice: status,
  mentor: status,
  admin: status,
});
const adminOnly: Record<Who, number> = { anonymous: 401, apprentice: 403, mentor: 403, admin: 200 };

// A wrong current password answers 400 only after the guard let the request through, so 400 means "allowed".
const ROUTES: Route[] = [
  { method: 'get', url: '/api/auth/me', expect: signedIn(200) },
  { method: 'post', url: '/api/auth/password-reset', body: { email: 'nobody@example.test' }, expect: everyone(202) },
  {
    method: 'post',
    url: '/api/auth/password-reset/not-a-real-token',
    body: { password: 'long-enough-pw' },
    expect: everyone(410),
  },
  { method: 'patch', url: '/api/account', body: { unitSystem: 'imperial' }, expect: signedIn(200) },
  {
    method: 'post',
    url: '/api/account/password',
    body: { currentPassword: 'not-my-password', newPassword: 'long-enough-pw' },
    expect: signedIn(400),
  },
  { method: 'get', url: '/api/users', expect: adminOnly },
  { method: 'get', url: '/api/users?role=mentor&q=a&page=1', expect: adminOnly },
  { method: 'get', url: '/api/dev-mail', expect: adminOnly },
];

let t: TestApp;
const agents = {} as Record<Who, ReturnType<TestApp['anon']>>;
beforeAll(async () => {
  t = await createTestApp();
  agents.anonymous = t.anon();
  for (const role of ['apprentice', 'mentor', 'admin'] as const) agents[role] = (await t.signIn(role)).agent;
});
afterAll(() => t.close());

describe('access to the sign-in, account and users routes, role by role', () => {
  for (const route of ROUTES) {
    for (const who of ['anonymous', 'apprentice', 'mentor', 'admin'] as const) {
      it(`when ${who} calls ${route.method.toUpperCase()} ${route.url}, then it answers ${route.expect[who]}`, async () => {
        // A different address for each caller: one address may ask for a reset link only a few times an hour.
        const body = route.body && 'email' in route.body ? { email: `nobody-${who}@example.test` } : route.body;
        const res = await agents[who][route.method](route.url).send(body);
        expect(res.status).toBe(route.expect[who]);
        if (res.status === 401) expect(res.body.error.code).toBe('UNAUTHENTICATED');
        if (res.status === 403) expect(res.body.error.code).toBe('FORBIDDEN');
      });
    }
  }

  it('when anyone signed in calls POST /api/auth/logout, then it answers 204 and that session ends', async () => {
    const { agent } = await t.signIn('mentor');
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    expect((await t.anon().post('/api/auth/logout')).status).toBe(204);
  });
});

describe('cross-origin refusal', () => {
  it('when an account change comes from another origin, then it is refused with BAD_ORIGIN and nothing changes', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const res = await agent.raw
      .patch('/api/account')
      .set('Origin', 'https://elsewhere.example')
      .send({ name: 'Changed' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('BAD_ORIGIN');
    expect((await User.findByPk(user.id))?.name).toBe(user.name);
  });

  it('when a password change, reset request or sign-in carries a foreign Referer and no Origin, then each is refused', async () => {
    const { agent } = await t.signIn('mentor');
    const foreign = 'https://elsewhere.example/page';
    const replies = await Promise.all([
      agent.raw
        .post('/api/account/password')
        .set('Referer', foreign)
        .send({ currentPassword: 'x', newPassword: 'long-enough-pw' }),
      agent.raw.post('/api/auth/password-reset').set('Referer', foreign).send({ email: 'nobody@example.test' }),
      agent.raw.post('/api/auth/password-reset/abc').set('Referer', foreign).send({ password: 'long-enough-pw' }),
      request(t.app).post('/api/auth/login').set('Referer', foreign).send({ email: 'a@example.test', password: 'x' }),
    ]);
    expect(replies.map((r) => r.status)).toEqual([403, 403, 403, 403]);
    expect(replies.every((r) => r.body.error.code === 'BAD_ORIGIN')).toBe(true);
    expect(await t.deliverMail()).toHaveLength(0);
  });

  it('when the Referer is the app itself, then the request is accepted', async () => {
    const res = await request(t.app)
      .post('/api/auth/password-reset')
      .set('Referer', `${ORIGIN}/forgot-password`)
      .send({ email: 'nobody-else@example.test' });
    expect(res.status).toBe(202);
  });
});

describe('outgoing mail in development', () => {
  it('when the fake mail service runs, then the admin is given its inbox page', async () => {
    const app = createApp({
      sequelize: t.sequelize,
      config: t.config,
      logger: createLogger(t.config),
      devMailInbox: 'http://localhost:1080',
    });
    const admin = await t.createUser('admin');
    const agent = request.agent(app);
    await agent
      .post('/api/auth/login')
      .set('Origin', ORIGIN)
      .send({ email: admin.email, password: TEST_PASSWORD })
      .expect(200);
    expect((await agent.get('/api/dev-mail')).body).toEqual({ inboxUrl: 'http://localhost:1080' });
  });

  it('when no fake mail service was started, then the admin is told there is no inbox page', async () => {
    const res = await agents.admin.get('/api/dev-mail');
    expect(res.body).toEqual({ inboxUrl: null });
  });
});
