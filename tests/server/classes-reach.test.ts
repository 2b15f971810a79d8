import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Enrolment } from '../../server/features/classes/class.model';
import { Lesson, type Project } from '../../server/features/courses/course.model';
import { Submission } from '../../server/features/submissions/submission.model';
import { addEntry } from './support/bench-log';
import { firstProject, makeClass, sentPiece } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

/**
 * A mentor's reach: an apprentice's work only while the apprentice is actively enrolled in one of the mentor's classes,
 * and only work for that class's course. Ned is in two classes: Odile's on the going-train course and Bram's on the
 * springs course.
 */
let t: TestApp;
let odile: Awaited<ReturnType<typeof makeClass>>['mentor'];
let bram: Awaited<ReturnType<typeof makeClass>>['mentor'];
let ned: Awaited<ReturnType<typeof makeClass>>['apprentices'][number];
let odileClassId: number;
let trainProject: Project;
let springsProject: Project;
let trainPiece: { id: number; uploadIds: number[] };
let springsPiece: { id: number; uploadIds: number[] };
let trainEntry: number;
let springsEntry: number;
let looseEntry: number;
let calculation: number;

const scoresFor = (project: Project) => Object.fromEntries(project.criteria.map((c) => [c.key, 3]));
const review = (project: Project) => ({ scores: scoresFor(project), comment: '', pins: [], outcome: 'rework' });
const queueIds = async (agent: typeof odile.agent) =>
  ((await agent.get('/api/review-queue')).body.rows as { submissionId: number }[]).map((r) => r.submissionId);

beforeAll(async () => {
  t = await createTestApp();
  const train = await makeClass(t, 'going-train-wall-regulator', 1);
  const springs = await makeClass(t, 'springs-heat-treatment', 0);
  odile = train.mentor;
  bram = springs.mentor;
  ned = train.apprentices[0];
  odileClassId = train.cls.id;
  await Enrolment.create({ classId: springs.cls.id, userId: ned.user.id });
  trainProject = await firstProject('going-train-wall-regulator');
  springsProject = await firstProject('springs-heat-treatment');
  trainPiece = await sentPiece(ned.agent, trainProject.id);
  springsPiece = await sentPiece(ned.agent, springsProject.id);
  const trainLesson = (await Lesson.findByPk(trainProject.lessonId))!;
  const springsLesson = (await Lesson.findByPk(springsProject.lessonId))!;
  trainEntry = (await addEntry(ned.agent, { title: 'Train plates', lessonId: trainLesson.id, minutes: 60 })).id;
  springsEntry = (await addEntry(ned.agent, { title: 'Click spring', lessonId: springsLesson.id, minutes: 60 })).id;
  looseEntry = (await addEntry(ned.agent, { title: 'Cleaned the bench', minutes: 30 })).id;
  const saved = await ned.agent.post('/api/calculations').send({
    calculator: 'broach-taper',
    inputs: { taperPerMm: 0.02, refDiameterMm: 0.5, targetDiameterMm: 1.05, plateThicknessMm: 2, pivotDiameterMm: 1 },
  });
  expect(saved.status).toBe(201);
  calculation = saved.body.id;
});
afterAll(() => t.close());

describe('a mentor reaches only the course of the class they teach', () => {
  it('when an apprentice sends a piece for another course, then its mentor does not see, queue or grade it', async () => {
    expect((await odile.agent.get(`/api/submissions/${springsPiece.id}`)).status).toBe(404);
    expect(await queueIds(odile.agent)).toEqual([trainPiece.id]);
    expect((await odile.agent.get('/api/review-queue/count')).body).toEqual({ count: 1 });
    const graded = await odile.agent.post(`/api/submissions/${springsPiece.id}/reviews`).send(review(springsProject));
    expect(graded.status).toBe(404);
    expect((await Submission.findByPk(springsPiece.id))!.status).toBe('waiting');
    expect((await odile.agent.get(`/api/uploads/${springsPiece.uploadIds[0]}`)).status).toBe(404);
    const listed = await odile.agent.get(`/api/submissions?apprentice=${ned.user.id}`);
    expect(listed.body.items.map((i: { id: number }) => i.id)).toEqual([trainPiece.id]);

    expect((await bram.agent.get(`/api/submissions/${springsPiece.id}`)).status).toBe(200);
    expect(await queueIds(bram.agent)).toEqual([springsPiece.id]);
    expect((await bram.agent.get(`/api/submissions/${trainPiece.id}`)).status).toBe(404);
    expect((await bram.agent.get(`/api/uploads/${springsPiece.uploadIds[0]}`)).status).toBe(200);
    // Each piece was announced only to the mentor of its course's class.
    const sent = await t.deliverMail();
    const mailsTo = (email: string) => sent.filter((m) => m.to === email).map((m) => m.subject);
    expect(mailsTo(odile.user.email)).toEqual([expect.stringContaining(trainProject.title)]);
    expect(mailsTo(bram.user.email)).toEqual([expect.stringContaining(springsProject.title)]);
  });

  it('when a log entry belongs to a lesson of another course, then that mentor does not read it; an entry with no lesson both do', async () => {
    expect((await odile.agent.get(`/api/log-entries/${trainEntry}`)).status).toBe(200);
    expect((await odile.agent.get(`/api/log-entries/${springsEntry}`)).status).toBe(404);
    expect((await odile.agent.post(`/api/log-entries/${springsEntry}/comments`).send({ body: 'Nice.' })).status).toBe(
      404,
    );
    expect((await odile.agent.get(`/api/log-entries/${looseEntry}`)).status).toBe(200);
    expect((await bram.agent.get(`/api/log-entries/${springsEntry}`)).status).toBe(200);
    expect((await bram.agent.get(`/api/log-entries/${trainEntry}`)).status).toBe(404);
    const list = await odile.agent.get(`/api/log-entries?apprentice=${ned.user.id}`);
    expect(list.body.entries.map((e: { id: number }) => e.id).sort()).toEqual([trainEntry, looseEntry].sort());
    expect(list.body.total).toBe(2);
    const csv = await odile.agent.get(`/api/log-entries/export.csv?apprentice=${ned.user.id}`);
    expect(csv.text).toContain('Train plates');
    expect(csv.text).not.toContain('Click spring');
    const summary = await odile.agent.get(`/api/log-entries/summary?apprentice=${ned.user.id}`);
    expect(summary.body).toMatchObject({ totalMinutes: 90, entryCount: 2 });
    const toRead = await odile.agent.get('/api/log-entries/to-read');
    expect(toRead.body.entries.map((e: { id: number }) => e.id)).not.toContain(springsEntry);
    const people = await odile.agent.get('/api/log-entries/apprentices');
    expect(people.body.apprentices).toEqual([expect.objectContaining({ id: ned.user.id, entries: 2 })]);
  });
});

describe('a withdrawn apprentice leaves the reach of the mentor', () => {
  it('when withdrawn, then the former mentor gets 404 on every record and an empty queue; on re-enrolment all returns', async () => {
    const reviewed = await odile.agent.post(`/api/submissions/${trainPiece.id}/reviews`).send(review(trainProject));
    expect(reviewed.status).toBe(201);
    await Submission.update({ status: 'waiting' }, { where: { id: trainPiece.id } });
    expect((await odile.agent.get('/api/reviews')).body.items).toHaveLength(1);

    await Enrolment.update({ status: 'withdrawn' }, { where: { classId: odileClassId, userId: ned.user.id } });
    const me = odile.agent;
    const urls = [
      `/api/submissions/${trainPiece.id}`,
      `/api/submissions?apprentice=${ned.user.id}`,
      `/api/uploads/${trainPiece.uploadIds[0]}`,
      `/api/log-entries/${trainEntry}`,
      `/api/log-entries/${looseEntry}`,
      `/api/log-entries?apprentice=${ned.user.id}`,
      `/api/log-entries/summary?apprentice=${ned.user.id}`,
      `/api/log-entries/export.csv?apprentice=${ned.user.id}`,
      `/api/calculations/${calculation}`,
      `/api/calculations?apprentice=${ned.user.id}`,
    ];
    for (const url of urls) expect([url, (await me.get(url)).status]).toEqual([url, 404]);
    expect(await queueIds(me)).toEqual([]);
    expect((await me.get('/api/review-queue/count')).body).toEqual({ count: 0 });
    expect((await me.get('/api/reviews')).body.items).toEqual([]);
    expect((await me.get('/api/log-entries/to-read')).body).toEqual({ entries: [], total: 0 });
    expect((await me.get('/api/log-entries/apprentices')).body).toEqual({ apprentices: [] });
    expect((await me.post(`/api/submissions/${trainPiece.id}/reviews`).send(review(trainProject))).status).toBe(404);
    expect(
      (
        await me
          .post(`/api/log-entries/${trainEntry}/grades`)
          .send({ completeness: 3, measurements: 3, photos: 3, comment: '' })
      ).status,
    ).toBe(404);
    // The springs mentor still reaches Ned, whose enrolment there is active.
    expect((await bram.agent.get(`/api/calculations/${calculation}`)).status).toBe(200);

    await Enrolment.update({ status: 'active' }, { where: { classId: odileClassId, userId: ned.user.id } });
    expect((await me.get(`/api/submissions/${trainPiece.id}`)).status).toBe(200);
    expect(await queueIds(me)).toEqual([trainPiece.id]);
  });
});
