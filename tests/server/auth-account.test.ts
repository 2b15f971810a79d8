import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/features/auth/user.model';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('my account', () => {
  it('when the name and unit preference are changed, then the reply, /me and the row all show them', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const res = await agent.patch('/api/account').send({ name: '  Ned Pellow  ', unitSystem: 'imperial' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: user.id, name: 'Ned Pellow', unitSystem: 'imperial' });
    expect((await agent.get('/api/auth/me')).body.user).toMatchObject({ name: 'Ned Pellow', unitSystem: 'imperial' });
    const row = await User.findByPk(user.id);
    expect(row).toMatchObject({ name: 'Ned Pellow', unitSystem: 'imperial' });
  });

  it('when the body tries to change role or e-mail, then those stay as they were', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const res = await agent
      .patch('/api/account')
      .send({ role: 'admin', email: 'taken-over@example.test', name: 'Ruth Ashdown' });
    expect(res.status).toBe(200);
    const row = await User.findByPk(user.id);
    expect(row).toMatchObject({ role: 'apprentice', email: user.email, name: 'Ruth Ashdown' });
  });

  it('when the name is blank or the unit system unknown, then it answers 400 with field errors', async () => {
    const { agent, user } = await t.signIn('mentor');
    const res = await agent.patch('/api/account').send({ name: '   ', unitSystem: 'cubits' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['name', 'unitSystem']);
    expect((await User.findByPk(user.id))?.name).toBe(user.name);
  });
});

describe('changing the password', () => {
  it('when the current password is wrong, then it answers 400 on that field and the password stays', async () => {
    const { agent, user } = await t.signIn('mentor');
    const res = await agent
      .post('/api/account/password')
      .send({ currentPassword: 'not-it-at-all', newPassword: 'balance-spring-9' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.currentPassword).toEqual(['That is not your current password.']);
    expect((await User.findByPk(user.id))?.passwordHash).toBe(user.passwordHash);
  });

  it('when the new password is shorter than 10 characters, then it answers 400 on that field', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent
      .post('/api/account/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.newPassword[0]).toMatch(/at least 10 characters/);
  });

  it('when the current password is right, then the new one works, this session stays and the other sessions end', async () => {
    const user = await t.createUser('admin');
    const { agent: here } = await t.signIn(user);
    const { agent: elsewhere } = await t.signIn(user);
    const res = await here
      .post('/api/account/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'balance-spring-9' });
    expect(res.status).toBe(204);
    expect((await here.get('/api/auth/me')).status).toBe(200);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    const login = (password: string) => t.anon().post('/api/auth/login').send({ email: user.email, password });
    expect((await login(TEST_PASSWORD)).status).toBe(401);
    expect((await login('balance-spring-9')).status).toBe(200);
  });
});
