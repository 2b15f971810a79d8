import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/features/audit/audit-event.model';
import { ClassMentor, GuildClass } from '../../server/features/classes/class.model';
import { courseId, makeClass } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
});
afterAll(() => t.close());

const auditFor = (targetType: string, targetId: number) =>
  AuditEvent.findAll({ where: { targetType, targetId }, order: [['id', 'ASC']] });

describe('creating and editing classes', () => {
  it('when the admin creates a class with a mentor, then it answers 201 with the class and records both actions', async () => {
    const odile = await t.createUser('mentor', { name: 'Odile Marchetti' });
    const body = {
      name: 'Autumn Bench 2026',
      courseId: await courseId(),
      startsOn: '2026-09-07',
      endsOn: '2026-12-18',
      capacity: 12,
      mentorIds: [odile.id],
    };
    const res = await admin.agent.post('/api/classes').send(body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      id: expect.any(Number),
      name: 'Autumn Bench 2026',
      course: { id: body.courseId, slug: 'going-train-wall-regulator', title: expect.any(String) },
      mentors: [{ id: odile.id, name: 'Odile Marchetti' }],
      counts: { active: 0, withdrawn: 0, invited: 0, seatsLeft: 12 },
      archived: false,
    });
    expect(await ClassMentor.count({ where: { classId: res.body.id } })).toBe(1);
    const events = await auditFor('class', res.body.id);
    expect(events.map((e) => [e.action, e.actorId])).toEqual([
      ['class.created', admin.user.id],
      ['class.mentors-changed', admin.user.id],
    ]);
    expect(events[1].details).toMatchObject({ added: ['Odile Marchetti'], removed: [] });
  });

  it('when the input is wrong, then the answer names the field and nothing is stored', async () => {
    const apprentice = await t.createUser('apprentice');
    const before = await GuildClass.count();
    const base = {
      name: 'Spring Bench 2027',
      courseId: await courseId(),
      startsOn: '2027-03-01',
      endsOn: '2027-06-25',
      capacity: 10,
    };
    const backwards = await admin.agent.post('/api/classes').send({ ...base, endsOn: '2027-02-01' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.endsOn).toBeDefined();
    const noCourse = await admin.agent.post('/api/classes').send({ ...base, courseId: 99999 });
    expect(noCourse.body.error.fields.courseId).toBeDefined();
    const notMentor = await admin.agent.post('/api/classes').send({ ...base, mentorIds: [apprentice.id] });
    expect(notMentor.body.error.fields.mentorIds).toBeDefined();
    const noRoom = await admin.agent.post('/api/classes').send({ ...base, capacity: 0 });
    expect(noRoom.body.error.fields.capacity).toBeDefined();
    expect(await GuildClass.count()).toBe(before);
  });

  it('when the admin edits, reassigns mentors and archives, then each change is stored and recorded', async () => {
    const odile = await t.createUser('mentor', { name: 'Odile Marchetti' });
    const bram = await t.createUser('mentor', { name: 'Bram Okafor' });
    const cls = await makeClass({ mentorIds: [odile.id] });

    const edited = await admin.agent
      .patch(`/api/classes/${cls.id}`)
      .send({ name: 'Spring Bench 2027', capacity: 8, mentorIds: [bram.id] });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({ name: 'Spring Bench 2027', capacity: 8, mentors: [{ id: bram.id }] });
    const archived = await admin.agent.patch(`/api/classes/${cls.id}`).send({ archived: true });
    expect(archived.body.archived).toBe(true);
    const back = await admin.agent.patch(`/api/classes/${cls.id}`).send({ archived: false });
    expect(back.body.archived).toBe(false);

    const events = await auditFor('class', cls.id);
    expect(events.map((e) => e.action)).toEqual([
      'class.updated',
      'class.mentors-changed',
      'class.archived',
      'class.unarchived',
    ]);
    expect(events[0].details).toMatchObject({ changes: { capacity: [12, 8] }, label: 'Spring Bench 2027' });
    expect(events[1].details).toMatchObject({ added: ['Bram Okafor'], removed: ['Odile Marchetti'] });
  });

  it('when the capacity would fall below the enrolled apprentices, then the edit is refused', async () => {
    const a = await t.createUser('apprentice');
    const b = await t.createUser('apprentice');
    const cls = await makeClass({ capacity: 5, apprenticeIds: [a.id, b.id] });
    const res = await admin.agent.patch(`/api/classes/${cls.id}`).send({ capacity: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.capacity[0]).toMatch(/2 apprentices/);
    expect((await GuildClass.findByPk(cls.id))!.capacity).toBe(5);
  });

  it('when archived classes are filtered, then each filter lists the right ones', async () => {
    const current = await makeClass();
    const old = await makeClass({ archived: true });
    const ids = async (q: string) =>
      (await admin.agent.get(`/api/classes${q}`)).body.classes.map((c: { id: number }) => c.id);
    expect(await ids('?archived=true')).toContain(old.id);
    expect(await ids('?archived=true')).not.toContain(current.id);
    expect(await ids('?archived=false')).toContain(current.id);
    expect(await ids('?archived=false')).not.toContain(old.id);
    expect(await ids('')).toEqual(expect.arrayContaining([old.id, current.id]));
  });
});

describe('the audit log', () => {
  it('when withdrawals, re-enrolments, invitations and an import happen, then each writes its event', async () => {
    const ned = await t.createUser('apprentice');
    const cls = await makeClass({ apprenticeIds: [ned.id] });
    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/withdraw`);
    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/reenrol`);
    await admin.agent.post(`/api/classes/${cls.id}/invitations`).send({ emails: ['audit-one@example.test'] });
    await admin.agent
      .post(`/api/classes/${cls.id}/roster/import`)
      .send({ rows: [{ name: 'Audit Two', email: 'audit-two@example.test' }] });
    const invitationId = (await AuditEvent.findOne({ where: { action: 'invitation.sent' }, order: [['id', 'DESC']] }))!
      .targetId;
    await admin.agent.post(`/api/invitations/${invitationId}/resend`);
    await admin.agent.post(`/api/invitations/${invitationId}/revoke`);

    const mine = await AuditEvent.findAll({ where: { actorId: admin.user.id }, order: [['id', 'ASC']] });
    const recent = mine.slice(-7).map((e) => [e.action, (e.details as { label: string }).label]);
    expect(recent).toEqual([
      ['enrolment.withdrawn', ned.email],
      ['enrolment.reenrolled', ned.email],
      ['invitation.sent', 'audit-one@example.test'],
      ['invitation.sent', 'audit-two@example.test'],
      ['roster.imported', cls.name],
      ['invitation.resent', 'audit-two@example.test'],
      ['invitation.revoked', 'audit-two@example.test'],
    ]);
  });

  it('when withdrawing someone already withdrawn, then nothing new is recorded', async () => {
    const ned = await t.createUser('apprentice');
    const cls = await makeClass({ apprenticeIds: [ned.id] });
    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/withdraw`);
    const before = await AuditEvent.count();
    expect((await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/withdraw`)).status).toBe(200);
    expect(await AuditEvent.count()).toBe(before);
  });

  it('when the admin filters the log by actor, action and dates, then only matching events come back', async () => {
    const other = await t.signIn('admin');
    const cls = await makeClass();
    await other.agent.patch(`/api/classes/${cls.id}`).send({ archived: true });
    await AuditEvent.create({
      actorId: other.user.id,
      action: 'class.archived',
      targetType: 'class',
      targetId: cls.id,
      details: { label: 'Old' },
      createdAt: new Date('2026-01-15T10:00:00Z'),
    });

    const byActor = await admin.agent.get(`/api/audit?actor=${other.user.id}&action=&from=&to=`);
    expect(byActor.status).toBe(200);
    expect(byActor.body.total).toBe(2);
    expect(byActor.body.events.every((e: { actor: { id: number } }) => e.actor.id === other.user.id)).toBe(true);
    expect(byActor.body.actors.map((a: { id: number }) => a.id)).toEqual(
      expect.arrayContaining([admin.user.id, other.user.id]),
    );

    const january = await admin.agent.get(`/api/audit?actor=${other.user.id}&from=2026-01-15&to=2026-01-15`);
    expect(january.body.events.map((e: { targetLabel: string }) => e.targetLabel)).toEqual(['Old']);
    const byAction = await admin.agent.get('/api/audit?action=class.archived');
    expect(byAction.body.events.every((e: { action: string }) => e.action === 'class.archived')).toBe(true);
    expect((await admin.agent.get('/api/audit?action=no.such')).status).toBe(400);
  });
});
