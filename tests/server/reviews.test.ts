import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Project } from '../../server/features/courses/course.model';
import { Notification } from '../../server/features/notifications/notification.model';
import { Pin, Review } from '../../server/features/reviews/review.model';
import { Submission, SubmissionVersion } from '../../server/features/submissions/submission.model';
import { firstProject, makeClass, makeJpeg, sentPiece, uploadPhoto } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let project: Project;
beforeAll(async () => {
  t = await createTestApp();
  project = await firstProject();
});
afterAll(() => t.close());

const allScores = (n: number) => Object.fromEntries(project.criteria.map((c) => [c.key, n]));

async function waitingPiece(photos = 1) {
  const cls = await makeClass(t);
  const piece = await sentPiece(cls.apprentices[0].agent, project.id, photos);
  return { ...cls, ...piece, apprentice: cls.apprentices[0] };
}

describe('reviews', () => {
  it('when the mentor asks for rework with pins, then the server computes the weighted score, stores the pins and tells the apprentice', async () => {
    const { id, uploadIds, mentor, apprentice } = await waitingPiece(2);
    const [first] = project.criteria;
    const scores = { ...allScores(3), [first.key]: 1 };
    const res = await mentor.agent.post(`/api/submissions/${id}/reviews`).send({
      scores,
      comment: 'A burr is left at the *oil sink*.',
      pins: [
        { uploadId: uploadIds[1], x: 0.25, y: 0.75, note: 'Burr here' },
        { uploadId: uploadIds[0], x: 0, y: 1, note: 'Chamfer heavy at the edge' },
      ],
      outcome: 'rework',
      weightedScore: 4,
    });
    expect(res.status).toBe(201);
    expect(res.body.status).toBe('rework');
    const totalWeight = project.criteria.reduce((s, c) => s + c.weight, 0);
    const expected = (3 * (totalWeight - first.weight) + first.weight) / totalWeight; // (computed) from the weights in content
    const review = (await Review.findOne({ where: { versionId: res.body.versions[0].id } }))!;
    expect(review.weightedScore).toBeCloseTo(expected, 10);
    expect(review).toMatchObject({ mentorId: mentor.user.id, outcome: 'rework', scores });
    const pins = await Pin.findAll({ where: { reviewId: review.id }, order: [['number', 'ASC']] });
    expect(pins.map((p) => [p.number, p.uploadId, p.x, p.y, p.note])).toEqual([
      [1, uploadIds[1], 0.25, 0.75, 'Burr here'],
      [2, uploadIds[0], 0, 1, 'Chamfer heavy at the edge'],
    ]);
    expect((await Submission.findByPk(id))!.status).toBe('rework');
    const mail = (await t.deliverMail()).filter((m) => m.to === apprentice.user.email);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toMatch(/needs rework/);
    expect(mail[0].text).toContain('2 pins');
    expect(await Notification.count({ where: { userId: apprentice.user.id, kind: 'submission-rework' } })).toBe(1);

    const seen = await apprentice.agent.get(`/api/submissions/${id}`);
    expect(seen.body.versions[0].review).toMatchObject({
      outcome: 'rework',
      mentor: { id: mentor.user.id },
      pins: [{ number: 1 }, { number: 2 }],
    });
  });

  it('when a reworked piece is changed and sent again, then it becomes version 2 and can pass, with version 1 and its review kept', async () => {
    const { id, uploadIds, mentor, apprentice } = await waitingPiece();
    await mentor.agent
      .post(`/api/submissions/${id}/reviews`)
      .send({ scores: allScores(2), comment: '', pins: [], outcome: 'rework' });
    const extra = (await uploadPhoto(apprentice.agent, await makeJpeg())).body.id;
    const v2 = await apprentice.agent.patch(`/api/submissions/${id}`).send({
      notes: 'Reworked the sink.',
      photos: [
        { uploadId: uploadIds[0], caption: 'Same view' },
        { uploadId: extra, caption: 'Sink after rework' },
      ],
    });
    expect(v2.status).toBe(200);
    expect(v2.body).toMatchObject({ status: 'rework', currentVersion: 2 });
    expect(
      v2.body.versions.map((v: { number: number; sentAt: string | null }) => [v.number, v.sentAt === null]),
    ).toEqual([
      [1, false],
      [2, true],
    ]);
    const mentorView = await mentor.agent.get(`/api/submissions/${id}`);
    expect(mentorView.body.versions).toHaveLength(1);

    expect((await apprentice.agent.post(`/api/submissions/${id}/send`)).body.status).toBe('waiting');
    const passed = await mentor.agent.post(`/api/submissions/${id}/reviews`).send({
      scores: allScores(3),
      comment: 'Clean.',
      pins: [{ uploadId: extra, x: 0.5, y: 0.5, note: 'Good sink' }],
      outcome: 'passed',
    });
    expect(passed.status).toBe(201);
    expect(passed.body.status).toBe('passed');
    expect(passed.body.versions.map((v: { review: { outcome: string } }) => v.review.outcome)).toEqual([
      'rework',
      'passed',
    ]);
    expect(await SubmissionVersion.count({ where: { submissionId: id } })).toBe(2);
    expect((await Submission.findByPk(id))!.status).toBe('passed');
    expect((await apprentice.agent.patch(`/api/submissions/${id}`).send({ notes: 'more' })).status).toBe(409);
  });

  describe('refusals', () => {
    const cases: [string, (ids: number[]) => object, string][] = [
      [
        'a criterion is missing',
        () => ({ scores: Object.fromEntries(Object.entries(allScores(3)).slice(1)) }),
        'scores',
      ],
      ['a criterion is unknown', () => ({ scores: { ...allScores(3), sparkle: 2 } }), 'scores'],
      ['a score is above 4', () => ({ scores: { ...allScores(3), [project.criteria[0].key]: 5 } }), 'scores'],
      ['a score is negative', () => ({ scores: { ...allScores(3), [project.criteria[0].key]: -1 } }), 'scores'],
      ['a score is not whole', () => ({ scores: { ...allScores(3), [project.criteria[0].key]: 2.5 } }), 'scores'],
      [
        'a pin lies right of the image',
        (ids) => ({ pins: [{ uploadId: ids[0], x: 1.01, y: 0.5, note: 'off' }] }),
        'pins',
      ],
      ['a pin lies above the image', (ids) => ({ pins: [{ uploadId: ids[0], x: 0.5, y: -0.2, note: 'off' }] }), 'pins'],
      ['a pin has no note', (ids) => ({ pins: [{ uploadId: ids[0], x: 0.5, y: 0.5, note: '  ' }] }), 'pins'],
      [
        'a pin is on a photo not in this version',
        () => ({ pins: [{ uploadId: 999999, x: 0.5, y: 0.5, note: 'elsewhere' }] }),
        'pins',
      ],
      ['the outcome is missing', () => ({ outcome: undefined }), 'outcome'],
      ['it passes below the pass mark', () => ({ scores: allScores(2), outcome: 'passed' }), 'outcome'],
      [
        'it passes with a criterion not shown',
        () => ({ scores: { ...allScores(4), [project.criteria[0].key]: 0 }, outcome: 'passed' }),
        'outcome',
      ],
    ];
    it.each(cases)(
      'when %s, then it answers 400 naming the field and stores no review',
      async (_name, change, field) => {
        const { id, uploadIds, mentor } = await waitingPiece();
        const res = await mentor.agent
          .post(`/api/submissions/${id}/reviews`)
          .send({ scores: allScores(3), comment: '', pins: [], outcome: 'rework', ...change(uploadIds) });
        expect(res.status).toBe(400);
        expect(Object.keys(res.body.error.fields ?? {})).toContain(field);
        expect(
          await Review.count({
            where: { versionId: (await SubmissionVersion.findOne({ where: { submissionId: id } }))!.id },
          }),
        ).toBe(0);
        expect((await Submission.findByPk(id))!.status).toBe('waiting');
      },
    );

    it('when the piece is not waiting, then it answers 409 (reviewed) or 404 (a draft)', async () => {
      const { id, mentor, apprentice } = await waitingPiece();
      const body = { scores: allScores(3), comment: '', pins: [], outcome: 'passed' };
      expect((await mentor.agent.post(`/api/submissions/${id}/reviews`).send(body)).status).toBe(201);
      const again = await mentor.agent.post(`/api/submissions/${id}/reviews`).send(body);
      expect(again.status).toBe(409);
      expect(
        await Review.count({ include: [{ model: SubmissionVersion, as: 'version', where: { submissionId: id } }] }),
      ).toBe(1);
      const other = await firstProject('going-train-wall-regulator');
      const draft = await Submission.findOne({ where: { apprenticeId: apprentice.user.id, projectId: other.id } });
      expect(draft?.status).toBe('passed');
      const fresh = await makeClass(t);
      const draftId = (await fresh.apprentices[0].agent.post('/api/submissions').send({ projectId: project.id })).body
        .id;
      expect((await fresh.mentor.agent.post(`/api/submissions/${draftId}/reviews`).send(body)).status).toBe(404);
    });

    it('when two mentors review the same version at once, then exactly one review is stored', async () => {
      const { id, mentor, cls } = await waitingPiece();
      const second = await t.signIn('mentor');
      const { ClassMentor } = await import('../../server/features/classes/class.model');
      await ClassMentor.create({ classId: cls.id, userId: second.user.id });
      const body = { scores: allScores(3), comment: '', pins: [], outcome: 'rework' };
      const results = await Promise.all(
        [mentor.agent, second.agent].map((a) => a.post(`/api/submissions/${id}/reviews`).send(body)),
      );
      expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    });

    it('when someone who does not mentor the apprentice reviews, then they get 404; apprentices 403; nobody signed in 401', async () => {
      const { id, apprentice } = await waitingPiece();
      const body = { scores: allScores(3), comment: '', pins: [], outcome: 'rework' };
      expect((await (await t.signIn('mentor')).agent.post(`/api/submissions/${id}/reviews`).send(body)).status).toBe(
        404,
      );
      expect((await apprentice.agent.post(`/api/submissions/${id}/reviews`).send(body)).status).toBe(403);
      expect((await t.anon().post(`/api/submissions/${id}/reviews`).send(body)).status).toBe(401);
      expect((await (await t.signIn('mentor')).agent.post('/api/submissions/999999/reviews').send(body)).status).toBe(
        404,
      );
      expect((await (await t.signIn('admin')).agent.post(`/api/submissions/${id}/reviews`).send(body)).status).toBe(
        201,
      );
    });
  });

  it('when reviews exist, then /api/reviews lists the apprentice’s own and the mentor’s written ones, newest first', async () => {
    const { id, mentor, apprentice } = await waitingPiece();
    await mentor.agent
      .post(`/api/submissions/${id}/reviews`)
      .send({ scores: allScores(3), comment: '', pins: [], outcome: 'passed' });
    const mine = await apprentice.agent.get('/api/reviews');
    expect(mine.body.items).toHaveLength(1);
    expect(mine.body.items[0]).toMatchObject({
      submissionId: id,
      outcome: 'passed',
      mentor: { id: mentor.user.id },
      pinCount: 0,
    });
    expect(new Date(mine.body.items[0].createdAt).getTime()).toBeGreaterThan(Date.now() - 60_000);
    expect(
      (await mentor.agent.get('/api/reviews')).body.items.map((r: { submissionId: number }) => r.submissionId),
    ).toEqual([id]);
    expect((await (await t.signIn('apprentice')).agent.get('/api/reviews')).body.items).toEqual([]);
  });
});
