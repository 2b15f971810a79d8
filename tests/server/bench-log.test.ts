import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  LogEntry,
  LogEntryCalculation,
  LogEntryUpload,
  LogGrade,
  LogMeasurement,
} from '../../server/features/bench-log/log-entry.model';
import { Lesson } from '../../server/features/courses/course.model';
import { Notification } from '../../server/features/notifications/notification.model';
import { addEntry, daysAgo, entryBody, type Agent } from './support/bench-log';
import { castOfClass } from './support/classes-fixture';
import { makeJpeg, uploadPhoto } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let cast: Awaited<ReturnType<typeof castOfClass>>;
let ned: Agent;
beforeAll(async () => {
  t = await createTestApp();
  cast = await castOfClass(t);
  ned = cast.apprenticeIn.agent;
});
afterAll(() => t.close());

/** A fresh apprentice in the cast's class, so that day totals and lists start empty. */
async function freshApprentice() {
  const a = await t.signIn('apprentice');
  const { Enrolment } = await import('../../server/features/classes/class.model');
  await Enrolment.create({ classId: cast.cls.id, userId: a.user.id });
  return a;
}

async function photo(agent: Agent) {
  const res = await uploadPhoto(agent, await makeJpeg({ width: 64, height: 48 }));
  expect(res.status).toBe(201);
  return res.body.id as number;
}

async function savedResult(agent: Agent) {
  // TRADE.md §1 check values: taper 1/50, broach 0.50 mm at the reference, target 1.05 mm (computed: 27.5 mm).
  const res = await agent.post('/api/calculations').send({
    calculator: 'broach-taper',
    title: 'Third wheel, back plate',
    inputs: { taperPerMm: 0.02, refDiameterMm: 0.5, targetDiameterMm: 1.05, plateThicknessMm: 2, pivotDiameterMm: 1 },
  });
  expect(res.status).toBe(201);
  return res.body.id as number;
}

describe('creating an entry', () => {
  it('when an apprentice logs time with a measurement, a photo and a saved result, then all of it is stored and answered', async () => {
    const a = await freshApprentice();
    const uploadId = await photo(a.agent);
    const calculationId = await savedResult(a.agent);
    const lesson = await Lesson.findOne({ order: [['id', 'ASC']] });
    const res = await a.agent
      .post('/api/log-entries')
      .send(entryBody({ lessonId: lesson!.id, uploadIds: [uploadId], calculationIds: [calculationId] }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      id: expect.any(Number),
      apprentice: { id: a.user.id },
      minutes: 150,
      version: 1,
      editedAt: null,
      lesson: { id: lesson!.id, course: { slug: expect.any(String) } },
      measurements: [
        { name: 'end shake', value: 0.15, unit: 'mm' },
        { name: 'side shake', value: 0.03, unit: 'mm' },
      ],
      photos: [{ id: uploadId, thumbUrl: `/api/uploads/${uploadId}?size=thumb` }],
      calculations: [{ id: calculationId, title: 'Third wheel, back plate' }],
      comments: [],
      grades: [],
    });
    const id = res.body.id;
    expect(await LogMeasurement.count({ where: { entryId: id } })).toBe(2);
    expect(await LogEntryUpload.count({ where: { entryId: id, uploadId } })).toBe(1);
    expect(await LogEntryCalculation.count({ where: { entryId: id, calculationId } })).toBe(1);
  });

  it('when the list is read, then entries come newest first and the filters and pages apply', async () => {
    const a = await freshApprentice();
    const lesson = await Lesson.findOne({ order: [['id', 'DESC']] });
    for (let i = 0; i < 23; i += 1)
      await addEntry(a.agent, { date: daysAgo(i + 1), minutes: 10, title: `Day ${i + 1}` });
    await addEntry(a.agent, { date: daysAgo(40), minutes: 10, title: 'With lesson', lessonId: lesson!.id });
    const first = await a.agent.get('/api/log-entries');
    expect(first.body).toMatchObject({ total: 24, page: 1, pageSize: 20 });
    expect(first.body.entries).toHaveLength(20);
    expect(first.body.entries[0].title).toBe('Day 1');
    const second = await a.agent.get('/api/log-entries?page=2');
    expect(second.body.entries.map((e: { title: string }) => e.title)).toEqual([
      'Day 21',
      'Day 22',
      'Day 23',
      'With lesson',
    ]);
    const range = await a.agent.get(`/api/log-entries?from=${daysAgo(5)}&to=${daysAgo(3)}`);
    expect(range.body.entries.map((e: { title: string }) => e.title)).toEqual(['Day 3', 'Day 4', 'Day 5']);
    const byLesson = await a.agent.get(`/api/log-entries?lessonId=${lesson!.id}`);
    expect(byLesson.body).toMatchObject({ total: 1, entries: [{ title: 'With lesson' }] });
    const backwards = await a.agent.get(`/api/log-entries?from=${daysAgo(3)}&to=${daysAgo(5)}`);
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields).toHaveProperty('to');
  });
});

describe('validation', () => {
  const cases: [string, Record<string, unknown>, string][] = [
    ['a date in the future', { date: daysAgo(-1) }, 'date'],
    ['a date that is not on the calendar', { date: '2026-02-30' }, 'date'],
    ['0 minutes', { minutes: 0 }, 'minutes'],
    ['1441 minutes', { minutes: 1441 }, 'minutes'],
    ['a fraction of a minute', { minutes: 12.5 }, 'minutes'],
    ['no title', { title: '  ' }, 'title'],
    ['a measurement without a unit', { measurements: [{ name: 'end shake', value: 0.15, unit: '' }] }, 'measurements'],
    [
      'a measurement value that is text',
      { measurements: [{ name: 'end shake', value: '0.15', unit: 'mm' }] },
      'measurements',
    ],
    [
      'a measurement value that is not a number',
      { measurements: [{ name: 'end shake', value: null, unit: 'mm' }] },
      'measurements',
    ],
  ];
  for (const [what, fields, field] of cases) {
    it(`when an entry has ${what}, then the answer is 400 naming ${field} and nothing is stored`, async () => {
      const title = `Invalid: ${what}`;
      const res = await ned.post('/api/log-entries').send(entryBody({ title, ...fields }));
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toContain(field);
      expect(await LogEntry.count({ where: { title } })).toBe(0);
    });
  }

  it('when the second measurement lacks a unit, then the error names its row and cell', async () => {
    const res = await ned.post('/api/log-entries').send(
      entryBody({
        measurements: [
          { name: 'end shake', value: 0.15, unit: 'mm' },
          { name: 'side shake', value: 0.03, unit: ' ' },
        ],
      }),
    );
    expect(res.status).toBe(400);
    expect(res.body.error.fields.measurements[0]).toMatch(/^Row 2: Give a unit/);
    expect(res.body.error.fields['measurements.1.unit']).toEqual([expect.stringMatching(/unit/)]);
  });

  it('when the entries of one date would pass 24 h, then the answer is 400 on minutes and the day keeps its total', async () => {
    const a = await freshApprentice();
    const date = daysAgo(2);
    await addEntry(a.agent, { date, minutes: 800, title: 'Long morning' });
    const res = await a.agent.post('/api/log-entries').send(entryBody({ date, minutes: 641, title: 'One too many' }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.minutes[0]).toMatch(/13 h 20 min.*24 h 1 min.*at most 24 h/);
    expect(await LogEntry.sum('minutes', { where: { apprenticeId: a.user.id, date } })).toBe(800);
    const exactly = await a.agent
      .post('/api/log-entries')
      .send(entryBody({ date, minutes: 640, title: 'Exactly full' }));
    expect(exactly.status).toBe(201);
  });

  it('when an edit moves an entry onto a full date, then it is refused and the entry stays where it was', async () => {
    const a = await freshApprentice();
    await addEntry(a.agent, { date: daysAgo(3), minutes: 1400 });
    const { id } = await addEntry(a.agent, { date: daysAgo(4), minutes: 60 });
    const res = await a.agent.patch(`/api/log-entries/${id}`).send({ date: daysAgo(3) });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('minutes');
    expect((await LogEntry.findByPk(id))?.date).toBe(daysAgo(4));
    const own = await a.agent.patch(`/api/log-entries/${id}`).send({ minutes: 1440 });
    expect(own.status).toBe(200);
  });
});

describe('nothing half-saved', () => {
  it('when one photo is another apprentice’s, then the answer is 400 on uploadIds and no entry, measurement or link remains', async () => {
    const a = await freshApprentice();
    const mine = await photo(a.agent);
    const theirs = await photo(cast.apprenticeOut.agent);
    const before = {
      entries: await LogEntry.count(),
      measurements: await LogMeasurement.count(),
      links: await LogEntryUpload.count(),
    };
    const res = await a.agent
      .post('/api/log-entries')
      .send(entryBody({ title: 'Rolled back', uploadIds: [mine, theirs] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('uploadIds');
    expect(await LogEntry.count({ where: { title: 'Rolled back' } })).toBe(0);
    expect({
      entries: await LogEntry.count(),
      measurements: await LogMeasurement.count(),
      links: await LogEntryUpload.count(),
    }).toEqual(before);
  });

  it('when a saved result is not the apprentice’s, then the answer is 400 on calculationIds and no entry remains', async () => {
    const a = await freshApprentice();
    const theirs = await savedResult(cast.apprenticeOut.agent);
    const res = await a.agent
      .post('/api/log-entries')
      .send(entryBody({ title: 'Other result', calculationIds: [theirs] }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('calculationIds');
    expect(await LogEntry.count({ where: { apprenticeId: a.user.id } })).toBe(0);
  });

  it('when an edit carries a bad photo, then neither the text nor the measurements change and the version stays', async () => {
    const a = await freshApprentice();
    const { id } = await addEntry(a.agent, { title: 'Kept' });
    const res = await a.agent
      .patch(`/api/log-entries/${id}`)
      .send({ title: 'Changed', measurements: [], uploadIds: [999_999] });
    expect(res.status).toBe(400);
    const row = await LogEntry.findByPk(id);
    expect({ title: row?.title, version: row?.version }).toEqual({ title: 'Kept', version: 1 });
    expect(await LogMeasurement.count({ where: { entryId: id } })).toBe(2);
  });
});

describe('grading and edits', () => {
  it('when an entry is edited after a grade, then it says when, the grade keeps its version, and a new grade clears it', async () => {
    const { id } = await addEntry(ned, { title: 'Graded then edited', minutes: 20 });
    const graded = await cast.mentorThis.agent
      .post(`/api/log-entries/${id}/grades`)
      .send({ completeness: 3, measurements: 4, photos: 0, comment: 'No photo of the plate.' });
    expect(graded.status).toBe(201);
    expect(graded.body).toMatchObject({
      version: 1,
      changedAfterGradingAt: null,
      grades: [{ entryVersion: 1, photos: 0 }],
    });

    const edited = await ned.patch(`/api/log-entries/${id}`).send({ notes: 'Added the missing detail.' });
    expect(edited.status).toBe(200);
    expect(edited.body.version).toBe(2);
    expect(edited.body.editedAt).toEqual(expect.any(String));
    expect(edited.body.changedAfterGradingAt).toBe(edited.body.editedAt);
    expect(edited.body.grades).toEqual([
      expect.objectContaining({
        entryVersion: 1,
        mentor: { id: cast.mentorThis.user.id, name: cast.mentorThis.user.name },
      }),
    ]);
    expect((await LogEntry.findByPk(id))?.version).toBe(2);

    const regraded = await cast.mentorThis.agent
      .post(`/api/log-entries/${id}/grades`)
      .send({ completeness: 4, measurements: 4, photos: 2 });
    expect(regraded.body.changedAfterGradingAt).toBeNull();
    expect(regraded.body.grades.map((g: { entryVersion: number }) => g.entryVersion)).toEqual([1, 2]);
    expect(await LogGrade.count({ where: { entryId: id } })).toBe(2);
  });

  it('when a score is outside 0 to 4, then the answer is 400 naming it and no grade is stored', async () => {
    const { id } = await addEntry(ned, { title: 'Bad score', minutes: 5 });
    const res = await cast.mentorThis.agent
      .post(`/api/log-entries/${id}/grades`)
      .send({ completeness: 5, measurements: 2, photos: -1 });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(['completeness', 'photos']));
    expect(await LogGrade.count({ where: { entryId: id } })).toBe(0);
  });

  it('when a mentor comments and grades, then the apprentice is told in the app and by e-mail with a link to the entry', async () => {
    const { id } = await addEntry(ned, { title: 'Tell me', minutes: 5 });
    const mailsBefore = (await t.deliverMail()).length;
    await cast.mentorThis.agent.post(`/api/log-entries/${id}/comments`).send({ body: 'Measure the end shake twice.' });
    await cast.mentorThis.agent
      .post(`/api/log-entries/${id}/grades`)
      .send({ completeness: 2, measurements: 2, photos: 2 });
    const notices = await Notification.findAll({
      where: { userId: cast.apprenticeIn.user.id, link: `/bench-log/${id}` },
    });
    expect(notices.map((n) => n.title)).toEqual([
      `${cast.mentorThis.user.name} commented on “Tell me”`,
      `${cast.mentorThis.user.name} graded “Tell me”`,
    ]);
    const mails = (await t.deliverMail()).slice(mailsBefore);
    expect(mails.map((m) => m.to)).toEqual([cast.apprenticeIn.user.email, cast.apprenticeIn.user.email]);
    expect(mails[0].text).toContain(`/bench-log/${id}`);
  });
});

describe('export and summary', () => {
  it('when the log is exported, then the CSV has one row per entry with readable measurements and formulas defused', async () => {
    const a = await freshApprentice();
    await addEntry(a.agent, { date: daysAgo(6), title: 'Pivots turned', minutes: 95 });
    await addEntry(a.agent, { date: daysAgo(5), title: '=HYPERLINK("x")', minutes: 30, measurements: [] });
    await addEntry(a.agent, { date: daysAgo(30), title: 'Outside the range', minutes: 30 });
    const res = await a.agent.get(`/api/log-entries/export.csv?from=${daysAgo(10)}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(
      /attachment; filename="?bench-log-apprentice-[a-z0-9]+-\d{4}-\d{2}-\d{2}\.csv/,
    );
    const { data } = Papa.parse<Record<string, string>>(res.text.replace(/^\uFEFF/, ''), { header: true });
    expect(data).toHaveLength(2);
    expect(data[1]).toMatchObject({
      Date: daysAgo(6),
      'Time spent': '1 h 35 min',
      Minutes: '95',
      Title: 'Pivots turned',
      Measurements: 'end shake 0.15 mm; side shake 0.03 mm',
      Notes: 'Broached from the inside face, **smoothed** after.',
    });
    expect(data[0].Title).toBe(`'=HYPERLINK("x")`);
  });

  it('when a cell holds a formula on a later line, then every such line of every cell is defused', async () => {
    const a = await freshApprentice();
    await addEntry(a.agent, {
      title: '=1+\n1',
      notes: 'Pivots fine.\n=HYPERLINK("http://example.test/x","open")\n+2\r\n-3\r@SUM(A1)\n\tindented',
      measurements: [{ name: 'end shake', value: -0.02, unit: 'mm' }],
    });
    const res = await a.agent.get('/api/log-entries/export.csv');
    const { data } = Papa.parse<Record<string, string>>(res.text.replace(/^\uFEFF/, ''), { header: true });
    expect(data[0].Title).toBe("'=1+\n1");
    expect(data[0].Notes).toBe(
      "Pivots fine.\n'=HYPERLINK(\"http://example.test/x\",\"open\")\n'+2\r\n'-3\r'@SUM(A1)\n'\tindented",
    );
    expect(data[0].Measurements).toBe('end shake -0.02 mm');
    const risky = /(^|[\r\n])[=+\-@\t\r]/;
    for (const cell of Object.values(data[0])) expect(cell).not.toMatch(risky);
  });

  it('when the summary is asked, then this week, eight weeks of hours and totals per course add up', async () => {
    const a = await freshApprentice();
    const lesson = await Lesson.findOne({ order: [['id', 'ASC']] });
    await addEntry(a.agent, { date: daysAgo(0), minutes: 90, lessonId: lesson!.id });
    await addEntry(a.agent, { date: daysAgo(14), minutes: 60 });
    await addEntry(a.agent, { date: daysAgo(200), minutes: 30, lessonId: lesson!.id });
    const res = await a.agent.get('/api/log-entries/summary');
    expect(res.status).toBe(200);
    expect(res.body.weeks).toHaveLength(8);
    expect(new Date(`${res.body.weeks[7].weekStart}T00:00:00Z`).getUTCDay()).toBe(1);
    expect(res.body.thisWeekMinutes).toBe(90);
    expect(res.body.weeks.reduce((s: number, w: { minutes: number }) => s + w.minutes, 0)).toBe(150);
    expect(res.body).toMatchObject({ totalMinutes: 180, entryCount: 3 });
    expect(res.body.courses).toEqual([
      { course: { id: expect.any(Number), title: expect.any(String) }, minutes: 120, entries: 2 },
      { course: null, minutes: 60, entries: 1 },
    ]);
  });
});

describe('deleting', () => {
  it('when the owner deletes an entry with feedback, then its measurements, links, comments and grades go with it', async () => {
    const uploadId = await photo(ned);
    const { id } = await addEntry(ned, { title: 'Gone', minutes: 5, uploadIds: [uploadId] });
    await cast.mentorThis.agent.post(`/api/log-entries/${id}/comments`).send({ body: 'Fine.' });
    await cast.mentorThis.agent
      .post(`/api/log-entries/${id}/grades`)
      .send({ completeness: 2, measurements: 2, photos: 2 });
    expect((await ned.delete(`/api/log-entries/${id}`)).status).toBe(204);
    expect(await LogEntry.findByPk(id)).toBeNull();
    expect(await LogMeasurement.count({ where: { entryId: id } })).toBe(0);
    expect(await LogEntryUpload.count({ where: { entryId: id } })).toBe(0);
    expect(await LogGrade.count({ where: { entryId: id } })).toBe(0);
    expect((await ned.get(`/api/log-entries/${id}`)).status).toBe(404);
  });
});
