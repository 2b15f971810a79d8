import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { localToday } from '@shared/schemas/log-entry';
import type { RecordCourse, RecordSkill } from '@shared/schemas/record';
import { AuditEvent } from '../../server/features/audit/audit-event.model';
import { GuildClass } from '../../server/features/classes/class.model';
import { Notification } from '../../server/features/notifications/notification.model';
import { SignOff } from '../../server/features/record/record.model';
import { pdfText } from './support/pdf-text';
import { binary, courseProjects, recordClass, reviewedPiece } from './support/record';
import { zipEntries } from './support/zip-entries';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const TRAIN = 'going-train-wall-regulator';
const skillOf = (course: RecordCourse, key: string) => course.skills.find((s) => s.key === key) as RecordSkill;

/** The first project (lesson 2: plate-layout and bench-practice) passed, the third (lesson 4: pivot-holes) reworked. */
async function apprenticeWithWork() {
  const cls = await recordClass(t);
  const { projects } = await courseProjects(TRAIN);
  const plates = projects[0];
  const holes = projects.find((p) => p.skills.includes('pivot-holes'))!;
  const passed = await reviewedPiece(cls.apprentice, cls.mentor, plates.project, 'passed');
  const reworked = await reviewedPiece(cls.apprentice, cls.mentor, holes.project, 'rework');
  const entry = await cls.apprentice.agent.post('/api/log-entries').send({
    date: localToday(),
    minutes: 95,
    title: 'Scribed the datum lines',
    lessonId: plates.lesson.id,
  });
  await cls.mentor.agent
    .post(`/api/log-entries/${entry.body.id}/grades`)
    .send({ completeness: 3, measurements: 3, photos: 3 });
  return { ...cls, plates, holes, passed, reworked, entryId: entry.body.id as number };
}

describe('the record', () => {
  it('when the apprentice reads their record, then each skill has its standard, a status and the evidence gathered from their work', async () => {
    const a = await apprenticeWithWork();
    const res = await a.apprentice.agent.get(`/api/apprentices/${a.apprentice.user.id}/record`);
    expect(res.status).toBe(200);
    expect(res.body.apprentice).toEqual({ id: a.apprentice.user.id, name: a.apprentice.user.name });
    const course: RecordCourse = res.body.courses.find((c: RecordCourse) => c.course.slug === TRAIN);
    expect(course.course).toMatchObject({ id: a.course.id, title: 'Going Train for a Wall Regulator' });
    expect(course.skills.map((s) => s.key)).toEqual(a.course.skills.map((s) => s.key));
    expect(course.skills.every((s) => s.standard.length > 20)).toBe(true);

    const layout = skillOf(course, 'plate-layout');
    expect(layout.status).toBe('ready');
    expect(layout.signOff).toBeNull();
    expect(layout.minutes).toBe(95);
    expect(layout.evidence).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ kind: 'submission', id: a.passed.id, outcome: 'passed', score: 4 }),
        expect.objectContaining({ kind: 'log-entry', id: a.entryId, title: 'Scribed the datum lines', score: 3 }),
      ]),
    );
    expect(layout.evidence.find((e) => e.kind === 'submission')!.photoIds).toEqual(a.passed.uploadIds);
    expect(skillOf(course, 'pivot-holes')).toMatchObject({
      status: 'gathering',
      evidence: [expect.objectContaining({ kind: 'submission', id: a.reworked.id, outcome: 'rework', score: 1 })],
    });
    expect(skillOf(course, 'train-design')).toMatchObject({ status: 'not-started', evidence: [], minutes: 0 });
    expect(course.minutes).toBe(95);
  });

  it('when the class asks for bench hours a week, then the record shows the weeks against it and says when the apprentice is behind', async () => {
    const a = await apprenticeWithWork();
    const start = new Date(Date.now() - 20 * 24 * 3600 * 1000).toISOString().slice(0, 10);
    await GuildClass.update(
      { requiredMinutesPerWeek: 600, startsOn: start, endsOn: '2099-12-31' },
      { where: { id: a.cls.id } },
    );
    const res = await a.mentor.agent.get(`/api/apprentices/${a.apprentice.user.id}/record`);
    const hours = (res.body.courses[0] as RecordCourse).hours!;
    expect(hours.class.id).toBe(a.cls.id);
    expect(hours.requiredMinutesPerWeek).toBe(600);
    expect(hours.weeks.length).toBeGreaterThanOrEqual(3);
    expect(hours.loggedMinutes).toBe(95);
    expect(hours.requiredMinutes).toBe(600 * hours.weeks.length);
    expect(hours.behind).toBe(true);
  });

  it('when someone outside the class asks for the record, then it does not exist for them', async () => {
    const a = await apprenticeWithWork();
    const other = await recordClass(t);
    const url = `/api/apprentices/${a.apprentice.user.id}/record`;
    expect((await other.mentor.agent.get(url)).status).toBe(404);
    expect((await other.apprentice.agent.get(url)).status).toBe(404);
    expect((await t.anon().get(url)).status).toBe(401);
    const office = await t.signIn('admin');
    expect((await office.agent.get(url)).status).toBe(200);
    expect((await office.agent.get(`/api/apprentices/${a.mentor.user.id}/record`)).status).toBe(404);
  });
});

describe('sign-offs', () => {
  it('when the mentor signs off without evidence, then 422 EVIDENCE_REQUIRED and nothing is stored', async () => {
    const a = await apprenticeWithWork();
    const res = await a.mentor.agent
      .post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`)
      .send({ courseId: a.course.id, skillKey: 'plate-layout', note: 'Square plates.', evidence: [] });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('EVIDENCE_REQUIRED');
    expect(res.body.error.fields.evidence).toHaveLength(1);
    const bare = await a.mentor.agent
      .post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`)
      .send({ courseId: a.course.id, skillKey: 'plate-layout' });
    expect([bare.status, bare.body.error.code]).toEqual([422, 'EVIDENCE_REQUIRED']);
    const noNote = await a.mentor.agent
      .post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`)
      .send({ courseId: a.course.id, skillKey: 'plate-layout', evidence: [{ kind: 'submission', id: a.passed.id }] });
    expect([noNote.status, noNote.body.error.fields.note]).toEqual([400, ['Say in a line what you saw.']]);
    expect(await SignOff.count({ where: { apprenticeId: a.apprentice.user.id } })).toBe(0);
  });

  it('when the evidence holds no passed piece, or is not the skill’s, then 422 EVIDENCE_REQUIRED', async () => {
    const a = await apprenticeWithWork();
    const url = `/api/apprentices/${a.apprentice.user.id}/sign-offs`;
    const onlyLog = await a.mentor.agent.post(url).send({
      courseId: a.course.id,
      skillKey: 'plate-layout',
      note: 'Good log.',
      evidence: [{ kind: 'log-entry', id: a.entryId }],
    });
    expect([onlyLog.status, onlyLog.body.error.code]).toEqual([422, 'EVIDENCE_REQUIRED']);
    const reworked = await a.mentor.agent.post(url).send({
      courseId: a.course.id,
      skillKey: 'pivot-holes',
      note: 'Nearly.',
      evidence: [{ kind: 'submission', id: a.reworked.id }],
    });
    expect([reworked.status, reworked.body.error.code]).toEqual([422, 'EVIDENCE_REQUIRED']);
    const wrongSkill = await a.mentor.agent.post(url).send({
      courseId: a.course.id,
      skillKey: 'pivot-holes',
      note: 'Borrowed evidence.',
      evidence: [{ kind: 'submission', id: a.passed.id }],
    });
    expect([wrongSkill.status, wrongSkill.body.error.code]).toEqual([422, 'EVIDENCE_REQUIRED']);
    expect(await SignOff.count({ where: { apprenticeId: a.apprentice.user.id } })).toBe(0);
  });

  it('when the mentor signs off with a passed piece, then 201, the skill is signed off, audited and the apprentice told; twice answers 409', async () => {
    const a = await apprenticeWithWork();
    const url = `/api/apprentices/${a.apprentice.user.id}/sign-offs`;
    const body = {
      courseId: a.course.id,
      skillKey: 'plate-layout',
      note: 'Datum lines true, pins tight.',
      evidence: [
        { kind: 'submission', id: a.passed.id },
        { kind: 'log-entry', id: a.entryId },
      ],
    };
    const res = await a.mentor.agent.post(url).send(body);
    expect(res.status).toBe(201);
    const row = (await SignOff.findByPk(res.body.id))!;
    expect(row).toMatchObject({
      apprenticeId: a.apprentice.user.id,
      courseId: a.course.id,
      skillKey: 'plate-layout',
      mentorId: a.mentor.user.id,
      note: 'Datum lines true, pins tight.',
      withdrawnAt: null,
    });
    expect(row.evidence).toEqual(body.evidence);
    expect(await AuditEvent.count({ where: { action: 'sign-off.recorded', targetId: row.id } })).toBe(1);
    expect(await Notification.count({ where: { userId: a.apprentice.user.id, kind: 'sign-off' } })).toBe(1);
    expect(
      (await t.deliverMail()).some((m) => m.to === a.apprentice.user.email && m.subject.includes('Signed off')),
    ).toBe(true);

    const record = await a.apprentice.agent.get(`/api/apprentices/${a.apprentice.user.id}/record`);
    expect(skillOf(record.body.courses[0], 'plate-layout')).toMatchObject({
      status: 'signed-off',
      signOff: { id: row.id, by: { id: a.mentor.user.id, name: a.mentor.user.name }, note: body.note },
    });

    const again = await a.mentor.agent.post(url).send(body);
    expect(again.status).toBe(409);
    expect(await SignOff.count({ where: { apprenticeId: a.apprentice.user.id } })).toBe(1);
  });

  it('when a mentor of another class, or the apprentice, tries to sign off, then 404 and 403', async () => {
    const a = await apprenticeWithWork();
    const other = await recordClass(t);
    const url = `/api/apprentices/${a.apprentice.user.id}/sign-offs`;
    const body = {
      courseId: a.course.id,
      skillKey: 'plate-layout',
      note: 'Looks fine.',
      evidence: [{ kind: 'submission', id: a.passed.id }],
    };
    expect((await other.mentor.agent.post(url).send(body)).status).toBe(404);
    expect((await a.apprentice.agent.post(url).send(body)).status).toBe(403);
    expect(await SignOff.count({ where: { apprenticeId: a.apprentice.user.id } })).toBe(0);
  });

  it('when the signing mentor withdraws a sign-off, then the row is kept with who, when and why, and the skill is ready again', async () => {
    const a = await apprenticeWithWork();
    const signed = await a.mentor.agent.post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`).send({
      courseId: a.course.id,
      skillKey: 'bench-practice',
      note: 'Tidy bench.',
      evidence: [{ kind: 'submission', id: a.passed.id }],
    });
    const other = await recordClass(t);
    expect(
      (await other.mentor.agent.post(`/api/sign-offs/${signed.body.id}/withdraw`).send({ reason: 'No.' })).status,
    ).toBe(404);
    const res = await a.mentor.agent
      .post(`/api/sign-offs/${signed.body.id}/withdraw`)
      .send({ reason: 'Guards were off the lathe on Tuesday.' });
    expect(res.status).toBe(200);
    const row = (await SignOff.findByPk(signed.body.id))!;
    expect(row.withdrawnAt).toBeInstanceOf(Date);
    expect(row).toMatchObject({
      withdrawnById: a.mentor.user.id,
      withdrawReason: 'Guards were off the lathe on Tuesday.',
    });
    expect(await AuditEvent.count({ where: { action: 'sign-off.withdrawn', targetId: row.id } })).toBe(1);
    expect(await Notification.count({ where: { userId: a.apprentice.user.id, kind: 'sign-off-withdrawn' } })).toBe(1);

    const record = await a.apprentice.agent.get(`/api/apprentices/${a.apprentice.user.id}/record`);
    const skill = skillOf(record.body.courses[0], 'bench-practice');
    expect(skill).toMatchObject({ status: 'ready', signOff: null });
    expect(skill.withdrawn).toEqual([
      expect.objectContaining({ id: row.id, reason: 'Guards were off the lathe on Tuesday.' }),
    ]);
    const twice = await a.mentor.agent.post(`/api/sign-offs/${signed.body.id}/withdraw`).send({ reason: 'Again.' });
    expect(twice.status).toBe(409);
    const resigned = await a.mentor.agent.post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`).send({
      courseId: a.course.id,
      skillKey: 'bench-practice',
      note: 'Guards back on, seen twice.',
      evidence: [{ kind: 'submission', id: a.passed.id }],
    });
    expect(resigned.status).toBe(201);
  });
});

describe('the portfolio', () => {
  it('when the apprentice exports the portfolio, then a ZIP streams holding portfolio.pdf with the evidence and the photos', async () => {
    const a = await apprenticeWithWork();
    await a.mentor.agent.post(`/api/apprentices/${a.apprentice.user.id}/sign-offs`).send({
      courseId: a.course.id,
      skillKey: 'plate-layout',
      note: 'Datum lines true.',
      evidence: [{ kind: 'submission', id: a.passed.id }],
    });
    const res = await a.apprentice.agent.raw
      .get(`/api/apprentices/${a.apprentice.user.id}/portfolio.zip`)
      .buffer(true)
      .parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/zip');
    const files = zipEntries(res.body as Buffer);
    expect([...files.keys()].sort()).toEqual([
      `photos/piece-${a.passed.id}-v1-1.jpg`,
      `photos/piece-${a.reworked.id}-v1-1.jpg`,
      'portfolio.pdf',
    ]);
    const photo = files.get(`photos/piece-${a.passed.id}-v1-1.jpg`)!;
    expect([photo[0], photo[1]]).toEqual([0xff, 0xd8]);
    const pdf = files.get('portfolio.pdf')!;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain(`Portfolio of ${a.apprentice.user.name}`);
    expect(text).toContain('Laying out, drilling and pinning plates');
    expect(text).toContain('Lays out the datum lines from one reference edge');
    expect(text).toContain('Pin 1: Look here');
    expect(text).toContain('Clean and square.');
    expect(text).toMatch(/Signed off on .* by .*Datum lines true\./);
    expect(pdf.toString('latin1')).toMatch(/\/Subtype \/Image/);
  });

  it('when a mentor of another class asks for the portfolio, then it does not exist for them', async () => {
    const a = await apprenticeWithWork();
    const other = await recordClass(t);
    expect((await other.mentor.agent.get(`/api/apprentices/${a.apprentice.user.id}/portfolio.zip`)).status).toBe(404);
  });
});
