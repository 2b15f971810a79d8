import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Enrolment, GuildClass } from '../../server/features/classes/class.model';
import { Invitation } from '../../server/features/classes/invitation.model';
import { newInvitationToken } from '../../server/features/classes/invitation-token';
import { castOfClass, courseId } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let cast: Awaited<ReturnType<typeof castOfClass>>;
beforeAll(async () => {
  t = await createTestApp();
  cast = await castOfClass(t);
});
afterAll(() => t.close());

type Who = 'anon' | 'apprenticeOut' | 'apprenticeIn' | 'mentorOther' | 'mentorThis' | 'admin';
const EVERYONE: Who[] = ['anon', 'apprenticeOut', 'apprenticeIn', 'mentorOther', 'mentorThis', 'admin'];
const agentOf = (who: Who) => cast[who].agent;

/** Expected status per role; the admin goes last so that refused attempts are checked against unchanged data. */
async function expectStatuses(call: (who: Who) => Promise<{ status: number }>, expected: Record<Who, number>) {
  const got: Partial<Record<Who, number>> = {};
  for (const who of EVERYONE) got[who] = (await call(who)).status;
  expect(got).toEqual(expected);
}

const adminOnly = (adminStatus: number): Record<Who, number> => ({
  anon: 401,
  apprenticeOut: 403,
  apprenticeIn: 403,
  mentorOther: 403,
  mentorThis: 403,
  admin: adminStatus,
});

describe('who may use each class route', () => {
  it('when each role lists classes, then each sees only its own classes and the anonymous visitor is refused', async () => {
    const ids: Partial<Record<Who, number[]>> = {};
    for (const who of EVERYONE) {
      const res = await agentOf(who).get('/api/classes');
      ids[who] = res.status === 200 ? res.body.classes.map((c: { id: number }) => c.id) : [res.status];
    }
    expect(ids.anon).toEqual([401]);
    expect(ids.mentorThis).toEqual([cast.cls.id]);
    expect(ids.apprenticeIn).toEqual([cast.cls.id]);
    expect(ids.mentorOther).not.toContain(cast.cls.id);
    expect(ids.apprenticeOut).not.toContain(cast.cls.id);
    expect(ids.admin).toEqual(expect.arrayContaining([cast.cls.id, ...ids.mentorOther!]));
  });

  it('when each role opens the class, then strangers get 404 as if it did not exist', async () => {
    await expectStatuses((who) => agentOf(who).get(`/api/classes/${cast.cls.id}`), {
      anon: 401,
      apprenticeOut: 404,
      apprenticeIn: 200,
      mentorOther: 404,
      mentorThis: 200,
      admin: 200,
    });
  });

  it('when each role opens the roster, then only the admin and this class’s mentor read it', async () => {
    await expectStatuses((who) => agentOf(who).get(`/api/classes/${cast.cls.id}/roster`), {
      anon: 401,
      apprenticeOut: 403,
      apprenticeIn: 403,
      mentorOther: 404,
      mentorThis: 200,
      admin: 200,
    });
  });

  it('when each role asks for the class form options, then only the admin gets them', async () => {
    await expectStatuses((who) => agentOf(who).get('/api/classes/form-options'), adminOnly(200));
  });

  it('when each role creates a class, then only the admin’s is stored', async () => {
    const before = await GuildClass.count();
    const body = {
      name: 'Winter Bench 2027',
      courseId: await courseId(),
      startsOn: '2027-01-04',
      endsOn: '2027-02-26',
      capacity: 6,
    };
    await expectStatuses((who) => agentOf(who).post('/api/classes').send(body), adminOnly(201));
    expect(await GuildClass.count()).toBe(before + 1);
  });

  it('when each role edits the class, then only the admin’s change is made', async () => {
    await expectStatuses(
      (who) =>
        agentOf(who)
          .patch(`/api/classes/${cast.cls.id}`)
          .send({ name: `Renamed by ${who}` }),
      adminOnly(200),
    );
    expect((await GuildClass.findByPk(cast.cls.id))!.name).toBe('Renamed by admin');
  });

  it('when each role withdraws and re-enrols an apprentice, then only the admin can', async () => {
    const url = (a: string) => `/api/classes/${cast.cls.id}/enrolments/${cast.apprenticeIn.user.id}/${a}`;
    await expectStatuses((who) => agentOf(who).post(url('withdraw')), adminOnly(200));
    expect(
      (await Enrolment.findOne({ where: { classId: cast.cls.id, userId: cast.apprenticeIn.user.id } }))!.status,
    ).toBe('withdrawn');
    await expectStatuses((who) => agentOf(who).post(url('reenrol')), adminOnly(200));
    expect(
      (await Enrolment.findOne({ where: { classId: cast.cls.id, userId: cast.apprenticeIn.user.id } }))!.status,
    ).toBe('active');
  });

  it('when each role invites by e-mail, then only the admin’s invitation is stored', async () => {
    await expectStatuses(
      (who) =>
        agentOf(who)
          .post(`/api/classes/${cast.cls.id}/invitations`)
          .send({ emails: [`by-${who}@example.test`] }),
      adminOnly(200),
    );
    const rows = await Invitation.findAll({ where: { classId: cast.cls.id } });
    expect(rows.map((r) => r.email)).toEqual(['by-admin@example.test']);
  });

  it('when each role previews or imports a roster, then only the admin can', async () => {
    const csv = Buffer.from('name,email\nPip Tregarthen,pip@example.test\n');
    await expectStatuses(
      (who) => agentOf(who).post(`/api/classes/${cast.cls.id}/roster/preview`).attach('file', csv, 'roster.csv'),
      adminOnly(200),
    );
    await expectStatuses(
      (who) =>
        agentOf(who)
          .post(`/api/classes/${cast.cls.id}/roster/import`)
          .send({ rows: [{ name: 'Pip Tregarthen', email: 'pip@example.test' }] }),
      adminOnly(200),
    );
    expect(await Invitation.count({ where: { email: 'pip@example.test' } })).toBe(1);
  });

  it('when each role lists, resends or revokes invitations, then only the admin can', async () => {
    const { tokenHash, expiresAt } = newInvitationToken();
    const inv = await Invitation.create({
      classId: cast.cls.id,
      email: 'kept@example.test',
      name: null,
      tokenHash,
      expiresAt,
      invitedById: null,
    });
    await expectStatuses((who) => agentOf(who).get('/api/invitations'), adminOnly(200));
    await expectStatuses((who) => agentOf(who).post(`/api/invitations/${inv.id}/resend`), adminOnly(200));
    await expectStatuses((who) => agentOf(who).post(`/api/invitations/${inv.id}/revoke`), adminOnly(204));
    expect((await Invitation.findByPk(inv.id))!.revokedAt).not.toBeNull();
  });

  it('when each role reads the audit log, then only the admin can', async () => {
    await expectStatuses((who) => agentOf(who).get('/api/audit'), adminOnly(200));
  });

  it('when the class id is not a number or unknown, then the admin gets 404 rather than an error', async () => {
    const { agent } = cast.admin;
    expect((await agent.get('/api/classes/abc')).status).toBe(404);
    expect((await agent.get('/api/classes/99999')).status).toBe(404);
    expect((await agent.patch('/api/classes/99999').send({ name: 'Nobody' })).status).toBe(404);
    expect((await agent.get('/api/classes/99999/roster')).status).toBe(404);
    expect((await agent.post('/api/classes/99999/invitations').send({ emails: ['a@example.test'] })).status).toBe(404);
  });
});
