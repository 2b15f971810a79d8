import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Enrolment } from '../../server/features/classes/class.model';
import { Submission, SubmissionVersion } from '../../server/features/submissions/submission.model';
import { User } from '../../server/features/auth/user.model';
import { firstProject, makeClass, sentPiece } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let cls: Awaited<ReturnType<typeof makeClass>>;
let ids: number[];
let otherClassPiece: number;
beforeAll(async () => {
  t = await createTestApp();
  const project = await firstProject();
  cls = await makeClass(t, 'going-train-wall-regulator', 3);
  const names = ['Carys Vell', 'amos Brook', 'Bettany Rule'];
  ids = [];
  for (const [i, a] of cls.apprentices.entries()) {
    await User.update({ name: names[i] }, { where: { id: a.user.id } });
    ids.push((await sentPiece(a.agent, project.id)).id);
    // Distinct sending times, oldest first: Carys, then amos, then Bettany.
    await Submission.update({ sentAt: new Date(Date.UTC(2026, 9, 1 + i)) }, { where: { id: ids[i] } });
  }
  const other = await makeClass(t);
  otherClassPiece = (await sentPiece(other.apprentices[0].agent, project.id)).id;
}, 60_000);
afterAll(() => t.close());

const rowIds = (res: { body: { rows: { submissionId: number }[] } }) => res.body.rows.map((r) => r.submissionId);

describe('review queue', () => {
  it('when the mentor opens the queue, then it lists only their classes’ waiting pieces, longest waiting first', async () => {
    const res = await cls.mentor.agent.get('/api/review-queue');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 20 });
    expect(rowIds(res)).toEqual(ids);
    expect(res.body.rows[0]).toMatchObject({
      apprentice: { name: 'Carys Vell' },
      version: 1,
      photoCount: 1,
      className: cls.cls.name,
    });
    expect(res.body.rows[0].thumbUrl).toMatch(/size=thumb$/);
    expect(rowIds(res)).not.toContain(otherClassPiece);
  });

  it('when sorted by apprentice or project in either direction, then the server orders the rows (names case-insensitively)', async () => {
    expect(rowIds(await cls.mentor.agent.get('/api/review-queue?sort=apprentice&dir=asc'))).toEqual([
      ids[1],
      ids[2],
      ids[0],
    ]);
    expect(rowIds(await cls.mentor.agent.get('/api/review-queue?sort=apprentice&dir=desc'))).toEqual([
      ids[0],
      ids[2],
      ids[1],
    ]);
    expect(rowIds(await cls.mentor.agent.get('/api/review-queue?sort=waiting&dir=desc'))).toEqual([...ids].reverse());
    expect(rowIds(await cls.mentor.agent.get('/api/review-queue?sort=project'))).toHaveLength(3);
    expect((await cls.mentor.agent.get('/api/review-queue?sort=name')).status).toBe(400);
  });

  it('when filtered by class, course or project, then only matching pieces remain; another mentor’s class gives none', async () => {
    const byClass = await cls.mentor.agent.get(`/api/review-queue?classId=${cls.cls.id}`);
    expect(byClass.body.total).toBe(3);
    const byCourse = await cls.mentor.agent.get(`/api/review-queue?courseId=${cls.course.id + 1000}`);
    expect(byCourse.body.total).toBe(0);
    const otherProject = await cls.mentor.agent.get(`/api/review-queue?projectId=999999`);
    expect(otherProject.body.rows).toEqual([]);
    const notMine = await cls.mentor.agent.get(`/api/review-queue?classId=${cls.cls.id + 1}`);
    expect(notMine.body.total).toBe(0);
    const filters = await cls.mentor.agent.get('/api/review-queue/filters');
    expect(filters.body.classes).toEqual([{ id: cls.cls.id, label: cls.cls.name }]);
    expect(filters.body.projects.length).toBeGreaterThan(0);
  });

  it('when the admin opens it, then every waiting piece is there and the pages split at 20', async () => {
    const admin = (await t.signIn('admin')).agent;
    expect((await admin.get('/api/review-queue')).body.total).toBe(4);
    const project = await firstProject();
    const people = await User.bulkCreate(
      Array.from({ length: 19 }, (_, i) => ({
        name: `Zed ${i}`,
        email: `zed${i}@example.test`,
        role: 'apprentice' as const,
        passwordHash: null,
      })),
    );
    const subs = await Submission.bulkCreate(
      people.map((p) => ({
        apprenticeId: p.id,
        projectId: project.id,
        status: 'waiting' as const,
        sentAt: new Date(),
      })),
    );
    await SubmissionVersion.bulkCreate(
      subs.map((s) => ({
        submissionId: s.id,
        number: 1,
        notes: '',
        logEntryIds: [],
        calculationIds: [],
        sentAt: new Date(),
      })),
    );
    const page1 = await admin.get('/api/review-queue?sort=apprentice');
    const page2 = await admin.get('/api/review-queue?sort=apprentice&page=2');
    expect(page1.body.total).toBe(23);
    expect(page1.body.rows).toHaveLength(20);
    expect(page2.body.rows).toHaveLength(3);
    expect(new Set([...rowIds(page1), ...rowIds(page2)]).size).toBe(23);
    expect(page2.body.rows.map((r: { apprentice: { name: string } }) => r.apprentice.name)).toEqual([
      'Zed 7',
      'Zed 8',
      'Zed 9',
    ]);
    expect((await admin.get('/api/review-queue/count')).body).toEqual({ count: 23 });
    await Submission.update({ status: 'passed' }, { where: { id: subs.map((s) => s.id) } });
  });

  it('when counted for the navigation, then the mentor gets their number; a withdrawn apprentice’s piece leaves it', async () => {
    expect((await cls.mentor.agent.get('/api/review-queue/count')).body).toEqual({ count: 3 });
    await Enrolment.update({ status: 'withdrawn' }, { where: { userId: cls.apprentices[0].user.id } });
    expect((await cls.mentor.agent.get('/api/review-queue/count')).body).toEqual({ count: 2 });
    await Enrolment.update({ status: 'active' }, { where: { userId: cls.apprentices[0].user.id } });
    expect((await cls.mentor.agent.get('/api/review-queue/count')).body).toEqual({ count: 3 });
    expect((await (await t.signIn('mentor')).agent.get('/api/review-queue/count')).body).toEqual({ count: 0 });
  });

  it('when an apprentice or nobody asks for the queue, then it is refused', async () => {
    for (const url of ['/api/review-queue', '/api/review-queue/count', '/api/review-queue/filters']) {
      expect((await cls.apprentices[0].agent.get(url)).status).toBe(403);
      expect((await t.anon().get(url)).status).toBe(401);
    }
  });
});
