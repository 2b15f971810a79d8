import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('sign-in', () => {
  it('when the password is right, then the user is signed in and /me answers with them', async () => {
    const user = await t.createUser('apprentice', { email: 'Mixed.Case@Example.test' });
    const agent = t.anon();
    const login = await agent
      .post('/api/auth/login')
      .send({ email: 'MIXED.case@example.test', password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    expect(login.body.user).toMatchObject({ id: user.id, email: 'mixed.case@example.test', role: 'apprentice' });
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.id).toBe(user.id);
  });

  it('when the password is wrong or the e-mail unknown, then both answer the same 401', async () => {
    const user = await t.createUser('mentor');
    const wrong = await t.anon().post('/api/auth/login').send({ email: user.email, password: 'not-the-password' });
    const unknown = await t
      .anon()
      .post('/api/auth/login')
      .send({ email: 'nobody@example.test', password: 'whatever-else' });
    expect(wrong.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('BAD_CREDENTIALS');
  });

  it('when signed out, then the session no longer works', async () => {
    const { agent } = await t.signIn('admin');
    expect((await agent.post('/api/auth/logout')).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('when an account is deactivated, then its open session stops working and it cannot sign in', async () => {
    const { agent, user } = await t.signIn('apprentice');
    await user.update({ active: false });
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    const again = await t.anon().post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  it('when a state-changing request comes from another origin, then it is refused with BAD_ORIGIN', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent.raw.post('/api/auth/logout').set('Origin', 'https://evil.example');
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('BAD_ORIGIN');
    const none = await agent.raw.post('/api/auth/logout');
    expect(none.status).toBe(403);
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });
});
