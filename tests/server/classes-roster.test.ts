import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Enrolment } from '../../server/features/classes/class.model';
import { Invitation } from '../../server/features/classes/invitation.model';
import { Lesson, Project } from '../../server/features/courses/course.model';
import { courseId, makeClass } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
});
afterAll(() => t.close());

const BOM = '\uFEFF';
const preview = (classId: number, content: Buffer | string, filename = 'roster.csv', contentType = 'text/csv') =>
  admin.agent
    .post(`/api/classes/${classId}/roster/preview`)
    .attach('file', Buffer.from(content), { filename, contentType });
type Row = { line: number; name: string; email: string; outcome: string; ok: boolean };

describe('roster files', () => {
  it('when the file has a BOM, semicolons and an "E-mail" header, then every row is read cleanly', async () => {
    const cls = await makeClass();
    const csv = `${BOM}Name;E-mail\r\nMabli Treharne;mabli@example.test\r\n\r\n"Lowe; Perpetua";Perpetua@Example.test\r\n`;
    const res = await preview(cls.id, csv);
    expect(res.status).toBe(200);
    expect(res.body.rows.map((r: Row) => [r.line, r.name, r.email, r.outcome])).toEqual([
      [2, 'Mabli Treharne', 'mabli@example.test', 'invited'],
      [4, 'Lowe; Perpetua', 'Perpetua@Example.test', 'invited'],
    ]);
    expect(res.body).toMatchObject({ okCount: 2, problemCount: 0 });
  });

  it('when rows have problems, then each is flagged and the preview stores nothing', async () => {
    const enrolled = await t.createUser('apprentice', { email: 'osric@example.test' });
    const cls = await makeClass({ capacity: 3, apprenticeIds: [enrolled.id] });
    const csv = [
      'email,name',
      'caspian@example.test,Caspian Merryweather',
      'linnet@,Linnet Sowerby',
      'CASPIAN@example.test,Caspian Again',
      'osric@example.test,Osric Fenwright',
      'hollis@example.test,Hollis Dunstable',
      'wren@example.test,Wren Halloran',
    ].join('\n');
    const res = await preview(cls.id, csv);
    expect(res.status).toBe(200);
    expect(res.body.rows.map((r: Row) => [r.line, r.outcome, r.ok])).toEqual([
      [2, 'invited', true],
      [3, 'bad-address', false],
      [4, 'duplicate', false],
      [5, 'already-enrolled', false],
      [6, 'invited', true],
      [7, 'class-full', false],
    ]);
    expect(res.body).toMatchObject({ okCount: 2, problemCount: 4 });
    expect(await Invitation.count({ where: { classId: cls.id } })).toBe(0);
    expect((await t.deliverMail()).filter((m) => m.to === 'caspian@example.test')).toEqual([]);
  });

  it('when the file is not a CSV, then it is refused with a message and nothing is stored', async () => {
    const cls = await makeClass();
    const png = Buffer.from([
      0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00, 0x00, 0x0d, 0x49, 0x48, 0x44, 0x52, 0xff, 0xfe,
    ]);
    const asCsv = await preview(cls.id, png, 'roster.csv');
    expect(asCsv.status).toBe(415);
    expect(asCsv.body.error.message).toMatch(/not a readable CSV/);
    const asImage = await preview(cls.id, png, 'photo.png', 'image/png');
    expect(asImage.status).toBe(415);
    const noHeader = await preview(cls.id, 'just some words\nand more words\n', 'notes.txt', 'text/plain');
    expect(noHeader.status).toBe(400);
    expect(noHeader.body.error.message).toMatch(/name.*e-mail/);
    const noFile = await admin.agent.post(`/api/classes/${cls.id}/roster/preview`);
    expect(noFile.status).toBe(400);
    expect(await Invitation.count({ where: { classId: cls.id } })).toBe(0);
  });

  it('when the confirmed rows are imported, then they are checked again and only the good ones are invited', async () => {
    const cls = await makeClass();
    const res = await admin.agent.post(`/api/classes/${cls.id}/roster/import`).send({
      rows: [
        { name: 'Tamsin Quarrell', email: 'tamsin@example.test' },
        { name: 'Jago Penhallow', email: 'jago@example' },
        { name: 'Elias Brindlecombe', email: 'elias@example.test' },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body.results.map((r: { outcome: string }) => r.outcome)).toEqual(['invited', 'bad-address', 'invited']);
    const rows = await Invitation.findAll({ where: { classId: cls.id }, order: [['email', 'ASC']] });
    expect(rows.map((r) => [r.email, r.name])).toEqual([
      ['elias@example.test', 'Elias Brindlecombe'],
      ['tamsin@example.test', 'Tamsin Quarrell'],
    ]);
    expect((await t.deliverMail()).filter((m) => m.to === 'tamsin@example.test')[0].text).toMatch(
      /Hello Tamsin Quarrell/,
    );
  });
});

describe('the class roster', () => {
  it('when apprentices are active, withdrawn and invited, then the roster shows each with lessons done and projects passed', async () => {
    const ned = await t.createUser('apprentice', { name: 'Ned Pellow' });
    const ruth = await t.createUser('apprentice', { name: 'Ruth Ashdown' });
    const cls = await makeClass({ apprenticeIds: [ned.id, ruth.id] });
    await admin.agent.post(`/api/classes/${cls.id}/invitations`).send({ emails: ['wren@example.test'] });
    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ruth.id}/withdraw`);

    const lessons = await Lesson.findAll({ where: { courseId: await courseId() }, order: [['position', 'ASC']] });
    const project = (await Project.findOne({ where: { lessonId: lessons.map((l) => l.id) } }))!;
    await recordProgress(
      ned.id,
      lessons.slice(0, 3).map((l) => l.id),
      project.id,
    );

    const res = await admin.agent.get(`/api/classes/${cls.id}/roster`);
    expect(res.status).toBe(200);
    expect(res.body.lessonsTotal).toBe(lessons.length);
    expect(
      res.body.entries.map((e: { name: string; status: string; lessonsDone: number; projectsPassed: number }) => [
        e.name,
        e.status,
        e.lessonsDone,
        e.projectsPassed,
      ]),
    ).toEqual([
      ['Ned Pellow', 'active', 3, 1],
      ['', 'invited', 0, 0],
      ['Ruth Ashdown', 'withdrawn', 0, 0],
    ]);
  });

  it('when an apprentice is withdrawn and re-enrolled, then their work is kept and the class counts follow', async () => {
    const ned = await t.createUser('apprentice');
    const cls = await makeClass({ capacity: 1, apprenticeIds: [ned.id] });
    const lesson = (await Lesson.findOne({ where: { courseId: await courseId() } }))!;
    await recordProgress(ned.id, [lesson.id]);

    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/withdraw`);
    expect((await admin.agent.get(`/api/classes/${cls.id}`)).body.counts).toMatchObject({
      active: 0,
      withdrawn: 1,
      seatsLeft: 1,
    });
    const back = await admin.agent.post(`/api/classes/${cls.id}/enrolments/${ned.id}/reenrol`);
    expect(back.status).toBe(200);
    expect(back.body.entries[0]).toMatchObject({ userId: ned.id, status: 'active', lessonsDone: 1 });
    expect(await Enrolment.count({ where: { classId: cls.id } })).toBe(1);
  });

  it('when re-enrolling into a full class, then it is refused and the apprentice stays withdrawn', async () => {
    const a = await t.createUser('apprentice');
    const b = await t.createUser('apprentice');
    const cls = await makeClass({ capacity: 1, apprenticeIds: [a.id] });
    await admin.agent.post(`/api/classes/${cls.id}/enrolments/${a.id}/withdraw`);
    await admin.agent.post(`/api/classes/${cls.id}/invitations`).send({ emails: [b.email] });
    const res = await admin.agent.post(`/api/classes/${cls.id}/enrolments/${a.id}/reenrol`);
    expect(res.status).toBe(409);
    expect((await Enrolment.findOne({ where: { classId: cls.id, userId: a.id } }))!.status).toBe('withdrawn');
  });
});

/** Writes progress rows as the lessons and submissions features store them, creating their tables if not yet there. */
async function recordProgress(userId: number, lessonIds: number[], passedProjectId?: number) {
  const q = (sql: string, replacements: Record<string, unknown> = {}) =>
    t.sequelize.query(sql, { replacements, type: QueryTypes.RAW });
  await q(
    'CREATE TABLE IF NOT EXISTS lesson_progress (id INTEGER PRIMARY KEY AUTOINCREMENT, userId INTEGER NOT NULL, lessonId INTEGER NOT NULL, completedAt DATETIME NOT NULL)',
  );
  for (const lessonId of lessonIds)
    await q('INSERT INTO lesson_progress (userId, lessonId, completedAt) VALUES (:userId, :lessonId, :now)', {
      userId,
      lessonId,
      now: new Date().toISOString(),
    });
  if (passedProjectId === undefined) return;
  await q(
    "CREATE TABLE IF NOT EXISTS submissions (id INTEGER PRIMARY KEY AUTOINCREMENT, apprenticeId INTEGER NOT NULL, projectId INTEGER NOT NULL, status TEXT NOT NULL DEFAULT 'draft', createdAt DATETIME NOT NULL, updatedAt DATETIME NOT NULL)",
  );
  const now = new Date().toISOString();
  await q(
    "INSERT INTO submissions (apprenticeId, projectId, status, createdAt, updatedAt) VALUES (:userId, :projectId, 'passed', :now, :now)",
    { userId, projectId: passedProjectId, now },
  );
}
