import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Notification } from '../../server/features/notifications/notification.model';
import { Submission, SubmissionPhoto, SubmissionVersion } from '../../server/features/submissions/submission.model';
import { Upload } from '../../server/features/uploads/upload.model';
import { firstProject, makeClass, makeJpeg, sentPiece, uploadPhoto } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let projectId: number;
beforeAll(async () => {
  t = await createTestApp();
  projectId = (await firstProject()).id;
});
afterAll(() => t.close());

describe('submissions', () => {
  it('when an apprentice saves a draft, reorders photos and sends it, then the version is stored and the mentor is told by mail and notice', async () => {
    const { mentor, apprentices } = await makeClass(t);
    const { agent, user } = apprentices[0];
    const [a, b] = [
      (await uploadPhoto(agent, await makeJpeg())).body.id,
      (await uploadPhoto(agent, await makeJpeg())).body.id,
    ];
    const created = await agent
      .post('/api/submissions')
      .send({ projectId, notes: 'First try', photos: [{ uploadId: a, caption: 'Face' }] });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ status: 'draft', currentVersion: 1, apprentice: { id: user.id } });
    expect(created.body.project.criteria.length).toBeGreaterThanOrEqual(3);
    const id = created.body.id;

    const patched = await agent.patch(`/api/submissions/${id}`).send({
      notes: '**Opened** from both faces.',
      photos: [
        { uploadId: b, caption: 'Against the square' },
        { uploadId: a, caption: 'Oil sink' },
      ],
    });
    expect(patched.status).toBe(200);
    expect(patched.body.versions[0].photos.map((p: { uploadId: number }) => p.uploadId)).toEqual([b, a]);
    expect(patched.body.versions[0].notes).toBe('**Opened** from both faces.');

    const sent = await agent.post(`/api/submissions/${id}/send`);
    expect(sent.status).toBe(200);
    expect(sent.body.status).toBe('waiting');
    const row = (await Submission.findByPk(id))!;
    expect(row.status).toBe('waiting');
    expect(row.sentAt).toBeInstanceOf(Date);
    expect((await SubmissionVersion.findOne({ where: { submissionId: id, number: 1 } }))!.sentAt).toBeInstanceOf(Date);
    expect(await SubmissionPhoto.count({ where: { versionId: sent.body.versions[0].id } })).toBe(2);
    expect((await Upload.findByPk(a))!.claimedAt).toBeInstanceOf(Date);

    const mail = (await t.deliverMail()).filter((m) => m.to === mentor.user.email);
    expect(mail).toHaveLength(1);
    expect(mail[0].subject).toContain(user.name);
    expect(mail[0].text).toContain(`http://localhost:3000/review/${id}`);
    const notices = await Notification.findAll({ where: { userId: mentor.user.id } });
    expect(notices.map((n) => [n.kind, n.link])).toEqual([['submission-sent', `/review/${id}`]]);
  });

  it('when a piece is waiting or has no photo, then editing or sending is refused', async () => {
    const { apprentices } = await makeClass(t);
    const { agent } = apprentices[0];
    const empty = await agent.post('/api/submissions').send({ projectId });
    const noPhoto = await agent.post(`/api/submissions/${empty.body.id}/send`);
    expect(noPhoto.status).toBe(400);
    expect(noPhoto.body.error.fields.photos).toBeDefined();
    expect((await Submission.findByPk(empty.body.id))!.status).toBe('draft');

    const { agent: other } = (await makeClass(t)).apprentices[0];
    const { id } = await sentPiece(other, projectId);
    expect((await other.patch(`/api/submissions/${id}`).send({ notes: 'late change' })).status).toBe(409);
    expect((await other.post(`/api/submissions/${id}/send`)).status).toBe(409);
    expect((await SubmissionVersion.findOne({ where: { submissionId: id } }))!.notes).not.toBe('late change');
  });

  it('when the input breaks the rules, then it answers 400 with the field named and stores nothing', async () => {
    const { apprentices } = await makeClass(t);
    const { agent, user } = apprentices[0];
    const stranger = (await t.signIn('apprentice')).agent;
    const foreign = (await uploadPhoto(stranger, await makeJpeg())).body.id;
    const notMine = await agent
      .post('/api/submissions')
      .send({ projectId, photos: [{ uploadId: foreign, caption: '' }] });
    expect(notMine.status).toBe(400);
    expect(notMine.body.error.fields.uploadIds).toBeDefined();
    const tooMany = await agent
      .post('/api/submissions')
      .send({ projectId, photos: Array.from({ length: 13 }, (_, i) => ({ uploadId: i + 1 })) });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields.photos).toBeDefined();
    const twice = await agent.post('/api/submissions').send({ projectId, photos: [{ uploadId: 1 }, { uploadId: 1 }] });
    expect(twice.status).toBe(400);
    const badLink = await agent.post('/api/submissions').send({ projectId, calculationIds: [424242] });
    expect(badLink.status).toBe(400);
    expect(badLink.body.error.fields.calculationIds).toBeDefined();
    expect(await Submission.count({ where: { apprenticeId: user.id } })).toBe(0);
  });

  it('when the project is not in a course of the apprentice’s class, then it is not found; a second piece for one project is refused', async () => {
    const { apprentices } = await makeClass(t, 'going-train-wall-regulator');
    const { agent } = apprentices[0];
    const other = await firstProject('springs-heat-treatment');
    expect((await agent.post('/api/submissions').send({ projectId: other.id })).status).toBe(404);
    expect((await agent.get(`/api/submissions/projects/${other.id}`)).status).toBe(404);
    expect((await agent.post('/api/submissions').send({ projectId })).status).toBe(201);
    const again = await agent.post('/api/submissions').send({ projectId });
    expect(again.status).toBe(409);
    const start = await agent.get(`/api/submissions/projects/${projectId}`);
    expect(start.status).toBe(200);
    expect(start.body.submissionId).toEqual(expect.any(Number));
  });

  it('when people other than the owner ask, then drafts are private and strangers get 404 on every route', async () => {
    const { mentor, apprentices } = await makeClass(t);
    const { agent } = apprentices[0];
    const draft = (await agent.post('/api/submissions').send({ projectId })).body.id;
    const { id: sent } = await sentPiece((await makeClass(t)).apprentices[0].agent, projectId);
    const strangerApprentice = (await t.signIn('apprentice')).agent;
    const strangerMentor = (await t.signIn('mentor')).agent;

    expect((await mentor.agent.get(`/api/submissions/${draft}`)).status).toBe(404);
    for (const who of [strangerApprentice, strangerMentor, mentor.agent])
      expect((await who.get(`/api/submissions/${sent}`)).status).toBe(404);
    expect((await (await t.signIn('admin')).agent.get(`/api/submissions/${sent}`)).status).toBe(200);
    expect((await strangerApprentice.patch(`/api/submissions/${draft}`).send({ notes: 'x' })).status).toBe(404);
    expect((await strangerApprentice.post(`/api/submissions/${draft}/send`)).status).toBe(404);
    expect((await mentor.agent.patch(`/api/submissions/${draft}`).send({ notes: 'x' })).status).toBe(403);
    expect((await mentor.agent.post('/api/submissions').send({ projectId })).status).toBe(403);
    expect((await t.anon().get(`/api/submissions/${sent}`)).status).toBe(401);
    expect((await t.anon().get('/api/submissions')).status).toBe(401);
    expect((await strangerMentor.get(`/api/submissions?apprentice=${apprentices[0].user.id}`)).status).toBe(404);
  });

  it('when listing, then the apprentice sees their own pieces newest first and the mentor sees the sent ones of a named apprentice', async () => {
    const { mentor, apprentices } = await makeClass(t);
    const { agent, user } = apprentices[0];
    const { id } = await sentPiece(agent, projectId, 2);
    const mine = await agent.get('/api/submissions');
    expect(mine.status).toBe(200);
    expect(mine.body.items).toHaveLength(1);
    expect(mine.body.items[0]).toMatchObject({ id, status: 'waiting', currentVersion: 1, lastReview: null });
    expect(mine.body.items[0].thumbUrl).toMatch(/size=thumb$/);
    const theirs = await mentor.agent.get(`/api/submissions?apprentice=${user.id}`);
    expect(theirs.body.items.map((i: { id: number }) => i.id)).toEqual([id]);
    expect((await mentor.agent.get('/api/submissions')).status).toBe(400);
  });
});

describe('linked records', () => {
  async function insert(table: 'log_entries' | 'calculations', ownerId: number, title: string) {
    const now = new Date();
    const sql =
      table === 'log_entries'
        ? 'INSERT INTO log_entries (apprenticeId, date, minutes, title, notes, version, createdAt, updatedAt) VALUES (:ownerId, :date, 90, :title, "", 1, :now, :now)'
        : 'INSERT INTO calculations (userId, calculator, title, inputs, results, warnings, createdAt, updatedAt) VALUES (:ownerId, "broach-taper", :title, "{}", "{}", "[]", :now, :now)';
    await t.sequelize.query(sql, { replacements: { ownerId, title, now, date: '2026-10-02' } });
    const [[row]] = (await t.sequelize.query(`SELECT MAX(id) AS id FROM ${table}`)) as [{ id: number }[], unknown];
    return row.id;
  }

  it('when an apprentice links their own log entry and calculation, then the piece shows them by name and the picker offers them', async () => {
    const { apprentices } = await makeClass(t);
    const { agent, user } = apprentices[0];
    const entry = await insert('log_entries', user.id, 'Broached the third-wheel holes');
    const calc = await insert('calculations', user.id, 'Broach for the 1.0 mm pivot');
    const options = await agent.get('/api/submissions/link-options');
    expect(options.status).toBe(200);
    expect(options.body.logEntries).toEqual([{ id: entry, label: '2026-10-02 · Broached the third-wheel holes' }]);
    expect(options.body.calculations).toEqual([{ id: calc, label: 'Broach for the 1.0 mm pivot' }]);
    const created = await agent
      .post('/api/submissions')
      .send({ projectId, logEntryIds: [entry], calculationIds: [calc] });
    expect(created.status).toBe(201);
    expect(created.body.versions[0].logEntries).toEqual([
      { id: entry, label: '2026-10-02 · Broached the third-wheel holes' },
    ]);
    expect(created.body.versions[0].calculations).toEqual([{ id: calc, label: 'Broach for the 1.0 mm pivot' }]);
    expect((await SubmissionVersion.findOne({ where: { submissionId: created.body.id } }))!.logEntryIds).toEqual([
      entry,
    ]);
  });

  it('when someone else’s log entry is linked, then it answers 400 naming logEntryIds', async () => {
    const { apprentices } = await makeClass(t);
    const other = await t.createUser('apprentice');
    const theirs = await insert('log_entries', other.id, 'Not mine');
    const res = await apprentices[0].agent.post('/api/submissions').send({ projectId, logEntryIds: [theirs] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.logEntryIds).toBeDefined();
  });

  it('when a mentor, the admin or nobody asks for the apprentice-only routes, then they are refused', async () => {
    const mentor = (await t.signIn('mentor')).agent;
    const admin = (await t.signIn('admin')).agent;
    for (const url of ['/api/submissions/link-options', `/api/submissions/projects/${projectId}`]) {
      expect((await mentor.get(url)).status).toBe(403);
      expect((await admin.get(url)).status).toBe(403);
      expect((await t.anon().get(url)).status).toBe(401);
    }
    expect((await t.anon().get('/api/reviews')).status).toBe(401);
  });
});
