import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/features/audit/audit-event.model';
import { Session } from '../../server/features/auth/session.model';
import { User } from '../../server/features/auth/user.model';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
});
afterAll(() => t.close());

describe('the guild office changes accounts', () => {
  it('when someone other than the admin tries, then the change is refused and not made', async () => {
    const target = await t.createUser('apprentice');
    for (const role of ['apprentice', 'mentor'] as const) {
      const { agent } = await t.signIn(role);
      expect((await agent.patch(`/api/users/${target.id}`).send({ role: 'admin' })).status).toBe(403);
    }
    expect((await t.anon().patch(`/api/users/${target.id}`).send({ role: 'admin' })).status).toBe(401);
    expect((await User.findByPk(target.id))!.role).toBe('apprentice');
  });

  it('when the admin makes an apprentice a mentor, then the role is stored, applies at once and is recorded', async () => {
    const bram = await t.signIn('apprentice');
    const res = await admin.agent.patch(`/api/users/${bram.user.id}`).send({ role: 'mentor' });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ id: bram.user.id, role: 'mentor', active: true });
    expect((await bram.agent.get('/api/auth/me')).body.user.role).toBe('mentor');
    const event = await AuditEvent.findOne({ where: { action: 'user.role-changed', targetId: bram.user.id } });
    expect(event).toMatchObject({
      actorId: admin.user.id,
      targetType: 'user',
      details: { from: 'apprentice', to: 'mentor' },
    });
  });

  it('when the admin deactivates an account, then its sessions end and it cannot sign in until reactivated', async () => {
    const ned = await t.signIn('apprentice');
    const res = await admin.agent.patch(`/api/users/${ned.user.id}`).send({ active: false });
    expect(res.body.user.active).toBe(false);
    expect(await Session.count({ where: { userId: ned.user.id } })).toBe(0);
    expect((await ned.agent.get('/api/auth/me')).status).toBe(401);
    const login = () => t.anon().post('/api/auth/login').send({ email: ned.user.email, password: TEST_PASSWORD });
    expect((await login()).status).toBe(401);

    await admin.agent.patch(`/api/users/${ned.user.id}`).send({ active: true });
    expect((await login()).status).toBe(200);
    const actions = await AuditEvent.findAll({
      where: { targetType: 'user', targetId: ned.user.id },
      order: [['id', 'ASC']],
    });
    expect(actions.map((a) => a.action)).toEqual(['user.deactivated', 'user.reactivated']);
  });

  it('when the admin tries to demote or deactivate themselves, then it is refused', async () => {
    const own = await admin.agent.patch(`/api/users/${admin.user.id}`).send({ active: false });
    expect(own.status).toBe(409);
    expect((await admin.agent.patch(`/api/users/${admin.user.id}`).send({ role: 'mentor' })).status).toBe(409);
    expect((await User.findByPk(admin.user.id))!).toMatchObject({ role: 'admin', active: true });
  });

  it('when the body changes nothing or the account is unknown, then the answer says so', async () => {
    const someone = await t.createUser('mentor');
    expect((await admin.agent.patch(`/api/users/${someone.id}`).send({})).status).toBe(400);
    expect((await admin.agent.patch(`/api/users/${someone.id}`).send({ role: 'captain' })).status).toBe(400);
    expect((await admin.agent.patch('/api/users/99999').send({ role: 'mentor' })).status).toBe(404);
  });
});
