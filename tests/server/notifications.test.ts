import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Notification } from '../../server/features/notifications/notification.model';
import { notify } from '../../server/features/notifications/notifications.service';
import { OutboxMessage } from '../../server/features/outbox/outbox-message.model';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('notifications', () => {
  it('when notify is called, then a notice is stored and an e-mail with the full link waits in the outbox', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const result = await notify(
      user.id,
      { kind: 'test', title: 'Plate back', body: 'Your plate was reviewed.', link: '/pieces/1' },
      { appUrl: 'http://bench.test' },
    );
    const queued = await OutboxMessage.findByPk(result.mailId!);
    expect(queued).toMatchObject({ to: user.email, subject: 'Plate back', state: 'queued', kind: 'notification' });
    const sent = (await t.deliverMail()).filter((m) => m.to === user.email);
    expect(sent).toHaveLength(1);
    expect(sent[0].text).toContain('http://bench.test/pieces/1');
    const list = await agent.get('/api/notifications');
    expect(list.body).toMatchObject({
      unreadCount: 1,
      total: 1,
      items: [{ title: 'Plate back', link: '/pieces/1', readAt: null }],
    });
  });

  it('when the notice is for a deactivated account or asks for no e-mail, then only the notice is stored', async () => {
    const gone = await t.createUser('mentor', { active: false });
    const quiet = await t.createUser('mentor');
    expect((await notify(gone.id, { kind: 'test', title: 'T', body: 'B' })).mailId).toBeNull();
    expect((await notify(quiet.id, { kind: 'test', title: 'T', body: 'B' }, { email: false })).mailId).toBeNull();
    expect(await Notification.count({ where: { userId: [gone.id, quiet.id] } })).toBe(2);
    expect(await OutboxMessage.count({ where: { to: [gone.email, quiet.email] } })).toBe(0);
  });

  it('when notices are read one by one or all at once, then the unread count falls to zero; newest come first', async () => {
    const { agent, user } = await t.signIn('apprentice');
    for (const title of ['first', 'second', 'third']) await notify(user.id, { kind: 'test', title, body: '' });
    const list = await agent.get('/api/notifications');
    expect(list.body.items.map((n: { title: string }) => n.title)).toEqual(['third', 'second', 'first']);
    const one = await agent.post(`/api/notifications/${list.body.items[0].id}/read`);
    expect(one.status).toBe(200);
    expect(one.body.readAt).not.toBeNull();
    expect((await agent.get('/api/notifications/count')).body).toEqual({ unreadCount: 2 });
    expect((await agent.post('/api/notifications/read-all')).body).toEqual({ unreadCount: 0 });
    expect(await Notification.count({ where: { userId: user.id, readAt: null } })).toBe(0);
  });

  it('when someone marks another person’s notice, then it answers 404 and leaves it unread; nobody signed in gets 401', async () => {
    const owner = await t.createUser('apprentice');
    const { notificationId } = await notify(owner.id, { kind: 'test', title: 'Private', body: '' });
    const other = (await t.signIn('mentor')).agent;
    expect((await other.post(`/api/notifications/${notificationId}/read`)).status).toBe(404);
    expect((await Notification.findByPk(notificationId!))!.readAt).toBeNull();
    expect((await other.get('/api/notifications')).body.items).toEqual([]);
    expect((await t.anon().get('/api/notifications')).status).toBe(401);
    expect((await t.anon().post('/api/notifications/read-all')).status).toBe(401);
  });
});
