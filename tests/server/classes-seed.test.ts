import { afterAll, beforeAll, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed';
import { AuditEvent } from '../../server/features/audit/audit-event.model';
import { Invitation } from '../../server/features/classes/invitation.model';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

it('when the demo data is loaded twice, then the pending invitations and office history are there once', async () => {
  await seedDemo(t.sequelize);
  const invitations = await Invitation.count();
  const events = await AuditEvent.count();
  await seedDemo(t.sequelize);
  expect(invitations).toBe(2);
  expect(await Invitation.count()).toBe(invitations);
  expect(await AuditEvent.count()).toBe(events);
  const { agent } = await t.signIn('admin');
  const pending = await agent.get('/api/invitations');
  expect(pending.body.invitations.map((i: { name: string; className: string }) => [i.name, i.className])).toEqual(
    expect.arrayContaining([
      ['Isolde Penwarden', 'Spring Bench 2027'],
      ['Tobias Carrow', 'Spring Bench 2027'],
    ]),
  );
  const log = await agent.get('/api/audit?action=class.created');
  expect(log.body.events.map((e: { targetLabel: string }) => e.targetLabel).sort()).toEqual([
    'Autumn Bench 2026',
    'Spring Bench 2027',
  ]);
});
