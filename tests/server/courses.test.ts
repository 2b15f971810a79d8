import { cpSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CONTENT_DIR } from '../../server/boot';
import { seedDemo } from '../../server/demo/seed';
import { User } from '../../server/features/auth/user.model';
import { Enrolment, GuildClass } from '../../server/features/classes/class.model';
import { Lesson } from '../../server/features/courses/course.model';
import { syncContent } from '../../server/features/courses/content-sync';
import { LessonProgress } from '../../server/features/courses/lesson-progress.model';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

const GOING = 'going-train-wall-regulator';
const SPRINGS = 'springs-heat-treatment';
const BROACHING = '04-broaching-pivot-holes';
const lessonFiles = (course: string) => readdirSync(path.join(CONTENT_DIR, course)).filter((f) => /^\d{2}-/.test(f));

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('courses and lessons, read by each role', () => {
  it('when nobody is signed in, then every course, lesson, search and progress route answers 401', async () => {
    const anon = t.anon();
    for (const url of [
      '/api/courses',
      `/api/courses/${GOING}`,
      `/api/courses/${GOING}/lessons/broaching-pivot-holes`,
      '/api/lessons/1',
      '/api/search?q=broach',
      `/api/content/${GOING}/images/hole-taper.svg`,
    ]) {
      expect((await anon.get(url)).status, url).toBe(401);
    }
    expect((await anon.put('/api/lessons/1/done')).status).toBe(401);
    expect(await LessonProgress.count()).toBe(0);
  });

  it('when an apprentice lists courses, then both courses come with lesson counts, minutes and zero progress', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent.get('/api/courses');
    expect(res.status).toBe(200);
    const slugs = res.body.courses.map((c: { slug: string }) => c.slug);
    expect(slugs).toEqual(expect.arrayContaining([GOING, SPRINGS]));
    const going = res.body.courses.find((c: { slug: string }) => c.slug === GOING);
    expect(going.lessonCount).toBe(lessonFiles(GOING).length);
    const minutes = (await Lesson.findAll({ where: { courseId: going.id, retiredAt: null } })).reduce(
      (s, l) => s + l.minutes,
      0,
    );
    expect(going.minutes).toBe(minutes);
    expect(going).toMatchObject({ lessonsDone: 0, progress: 0 });
  });

  it('when a mentor or the admin lists courses, then they see both courses without progress figures', async () => {
    for (const role of ['mentor', 'admin'] as const) {
      const { agent } = await t.signIn(role);
      const res = await agent.get('/api/courses');
      expect(res.status).toBe(200);
      expect(res.body.courses).toHaveLength(2);
      for (const c of res.body.courses) expect(c).toMatchObject({ lessonsDone: null, progress: null });
    }
  });

  it('when a course is opened, then its lessons come in order with minutes, project badges and done marks', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent.get(`/api/courses/${GOING}`);
    expect(res.status).toBe(200);
    const positions = res.body.lessons.map((l: { position: number }) => l.position);
    expect(positions).toEqual([...positions].sort((a, b) => a - b));
    const broaching = res.body.lessons.find((l: { slug: string }) => l.slug === 'broaching-pivot-holes');
    expect(broaching).toMatchObject({ title: 'Opening pivot holes with broaches', done: false });
    expect(broaching.minutes).toBeGreaterThan(0);
    expect(broaching.project.title).toBe('A pair of upright pivot holes');
    expect(res.body.course.intro.length).toBeGreaterThan(100);
    expect((await agent.get('/api/courses/no-such-course')).status).toBe(404);
  });

  it('when each role opens a lesson, then it gets the body, outline, neighbours and the project with criteria', async () => {
    for (const role of ['apprentice', 'mentor', 'admin'] as const) {
      const { agent } = await t.signIn(role);
      const res = await agent.get(`/api/courses/${GOING}/lessons/broaching-pivot-holes`);
      expect(res.status, role).toBe(200);
      expect(res.body.lesson.body).toContain('::calculator{name="broach-taper"}');
      expect(res.body.lesson.done).toBe(role === 'apprentice' ? false : null);
      expect(res.body.previous.slug).toBe('turning-and-burnishing-pivots');
      expect(res.body.next.slug).toBe('form-cutters-and-cutting-teeth');
      expect(res.body.project.passMark).toBe(3);
      expect(res.body.project.criteria.map((c: { key: string }) => c.key)).toContain('uprightness');
      expect(res.body.project.criteria[0].scores).toHaveLength(5);
      expect(res.body.lesson.outline.some((h: { text: string; id: string }) => h.id === 'the-tools')).toBe(true);
    }
  });

  it('when a lesson is read again unchanged, then the ETag answers 304 with no body; marking it done changes the answer', async () => {
    const { agent } = await t.signIn('apprentice');
    const url = `/api/courses/${GOING}/lessons/broaching-pivot-holes`;
    const first = await agent.get(url);
    expect(first.status).toBe(200);
    const etag = first.headers.etag as string;
    expect(etag).toMatch(/^W\//);
    const again = await agent.get(url).set('If-None-Match', etag);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    expect((await agent.put(`/api/lessons/${first.body.lesson.id}/done`)).status).toBe(200);
    const changed = await agent.get(url).set('If-None-Match', etag);
    expect(changed.status).toBe(200);
    expect(changed.body.lesson.done).toBe(true);
  });

  it('when a lesson row is changed behind the catalogue’s back, then reads still answer what was prepared at sync', async () => {
    // Reads come from the catalogue prepared at sync, not from parsing the stored Markdown on each request.
    const { agent } = await t.signIn('mentor');
    const url = `/api/courses/${GOING}/lessons/shop-and-safety`;
    const before = (await agent.get(url)).body.lesson;
    await Lesson.update({ body: '# Something else' }, { where: { id: before.id } });
    const after = (await agent.get(url)).body.lesson;
    expect(after.body).toBe(before.body);
    expect(after.outline).toEqual(before.outline);
    await Lesson.update({ body: before.body }, { where: { id: before.id } });
  });

  it('when the first lesson is opened, then it has no previous lesson', async () => {
    const { agent } = await t.signIn('mentor');
    const res = await agent.get(`/api/courses/${GOING}/lessons/shop-and-safety`);
    expect(res.status).toBe(200);
    expect(res.body.previous).toBeNull();
  });

  it('when a lesson is asked by id, then its title and course come back; an unknown id is 404', async () => {
    const { agent } = await t.signIn('mentor');
    const lesson = await Lesson.findOne({ where: { slug: 'broaching-pivot-holes' }, rejectOnEmpty: true });
    const res = await agent.get(`/api/lessons/${lesson.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      lesson: { id: lesson.id, title: 'Opening pivot holes with broaches', retired: false },
      course: { slug: GOING },
    });
    expect((await agent.get('/api/lessons/999999')).status).toBe(404);
    expect((await agent.get('/api/lessons/abc')).status).toBe(404);
  });

  it('when a lesson image is asked, then only files in that course’s images folder are served', async () => {
    const { agent } = await t.signIn('apprentice');
    const ok = await agent.get(`/api/content/${GOING}/images/hole-taper.svg`);
    expect(ok.status).toBe(200);
    expect(ok.headers['content-type']).toContain('image/svg+xml');
    expect(ok.headers['content-security-policy']).toContain("default-src 'none'");
    expect((await agent.get(`/api/content/${GOING}/images/missing.svg`)).status).toBe(404);
    expect((await agent.get(`/api/content/${GOING}/images/..%2Fcourse.md`)).status).toBe(404);
    expect((await agent.get(`/api/content/${GOING}/images/.env`)).status).toBe(404);
    expect((await agent.get(`/api/content/..%2F..%2Fserver/images/app.ts`)).status).toBe(404);
  });
});

describe('done marks', () => {
  it('when an apprentice marks a lesson done, then it survives signing out and in, and can be undone', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const lesson = await Lesson.findOne({ where: { slug: 'broaching-pivot-holes' }, rejectOnEmpty: true });
    const put = await agent.put(`/api/lessons/${lesson.id}/done`);
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ lessonId: lesson.id, done: true });
    expect((await agent.put(`/api/lessons/${lesson.id}/done`)).status).toBe(200);
    expect(await LessonProgress.count({ where: { userId: user.id, lessonId: lesson.id } })).toBe(1);

    expect((await agent.post('/api/auth/logout')).status).toBeLessThan(300);
    expect((await agent.get('/api/courses')).status).toBe(401);
    await agent.raw.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: TEST_PASSWORD });

    const lessonRes = await agent.get(`/api/courses/${GOING}/lessons/broaching-pivot-holes`);
    expect(lessonRes.body.lesson.done).toBe(true);
    const list = await agent.get('/api/courses');
    const going = list.body.courses.find((c: { slug: string }) => c.slug === GOING);
    expect(going.lessonsDone).toBe(1);
    expect(going.progress).toBeCloseTo(1 / going.lessonCount, 6);

    const del = await agent.delete(`/api/lessons/${lesson.id}/done`);
    expect(del.body).toMatchObject({ lessonId: lesson.id, done: false, completedAt: null });
    expect(await LessonProgress.count({ where: { userId: user.id } })).toBe(0);
  });

  it('when one apprentice marks a lesson, then another apprentice’s progress is untouched', async () => {
    const a = await t.signIn('apprentice');
    const b = await t.signIn('apprentice');
    const lesson = await Lesson.findOne({ where: { slug: 'shop-and-safety' }, rejectOnEmpty: true });
    await a.agent.put(`/api/lessons/${lesson.id}/done`);
    const res = await b.agent.get(`/api/courses/${GOING}`);
    expect(res.body.lessons.find((l: { id: number }) => l.id === lesson.id).done).toBe(false);
    expect(await LessonProgress.count({ where: { userId: b.user.id } })).toBe(0);
  });

  it('when a mentor or the admin tries to mark a lesson done, then it is refused and nothing is stored', async () => {
    const lesson = await Lesson.findOne({ where: { slug: 'shop-and-safety' }, rejectOnEmpty: true });
    for (const role of ['mentor', 'admin'] as const) {
      const { agent, user } = await t.signIn(role);
      expect((await agent.put(`/api/lessons/${lesson.id}/done`)).status).toBe(403);
      expect(await LessonProgress.count({ where: { userId: user.id } })).toBe(0);
    }
  });

  it('when the lesson does not exist or the Origin is foreign, then marking is refused', async () => {
    const { agent, user } = await t.signIn('apprentice');
    expect((await agent.put('/api/lessons/999999/done')).status).toBe(404);
    const lesson = await Lesson.findOne({ where: { slug: 'shop-and-safety' }, rejectOnEmpty: true });
    const foreign = await agent.raw.put(`/api/lessons/${lesson.id}/done`).set('Origin', 'http://elsewhere.test');
    expect(foreign.status).toBe(403);
    expect(await LessonProgress.count({ where: { userId: user.id } })).toBe(0);
  });

  it('when an enrolled apprentice asks for the next lesson, then it is the first one not yet done', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const first = await Lesson.findOne({ where: { slug: 'shop-and-safety' }, rejectOnEmpty: true });
    const cls = await GuildClass.create({
      name: `Test Bench ${Date.now()}`,
      courseId: first.courseId,
      startsOn: '2026-09-07',
      endsOn: '2026-12-18',
      capacity: 4,
    });
    expect((await agent.get('/api/lessons/next')).body).toEqual({ course: null, lesson: null });
    await Enrolment.create({ classId: cls.id, userId: user.id });
    expect((await agent.get('/api/lessons/next')).body.lesson.slug).toBe('shop-and-safety');
    await agent.put(`/api/lessons/${first.id}/done`);
    const next = await agent.get('/api/lessons/next');
    expect(next.body.lesson.slug).toBe('plates-and-datum-lines');
    expect(next.body.course).toMatchObject({ slug: GOING, lessonsDone: 1 });
  });
});

describe('retired lessons', () => {
  let copy: string;
  let r: TestApp;
  let apprentice: Awaited<ReturnType<TestApp['signIn']>>;
  beforeAll(async () => {
    r = await createTestApp();
    apprentice = await r.signIn('apprentice');
    copy = mkdtempSync(path.join(tmpdir(), 'tickwright-content-'));
    cpSync(CONTENT_DIR, copy, { recursive: true });
  });
  afterAll(async () => {
    rmSync(copy, { recursive: true, force: true });
    await r.close();
  });

  it('when a done lesson is removed from content and synced, then it leaves the lists but its progress row stays', async () => {
    const { agent, user } = apprentice;
    const lesson = await Lesson.findOne({ where: { slug: 'broaching-pivot-holes' }, rejectOnEmpty: true });
    await agent.put(`/api/lessons/${lesson.id}/done`);
    const before = (await agent.get(`/api/courses/${GOING}`)).body.course.lessonCount;

    rmSync(path.join(copy, GOING, `${BROACHING}.md`));
    await syncContent(r.sequelize, copy);

    expect((await lesson.reload()).retiredAt).not.toBeNull();
    expect(await LessonProgress.count({ where: { userId: user.id, lessonId: lesson.id } })).toBe(1);
    const detail = await agent.get(`/api/courses/${GOING}`);
    expect(detail.body.course.lessonCount).toBe(before - 1);
    expect(detail.body.course.lessonsDone).toBe(0);
    expect(detail.body.lessons.map((l: { slug: string }) => l.slug)).not.toContain('broaching-pivot-holes');
    expect((await agent.get(`/api/courses/${GOING}/lessons/broaching-pivot-holes`)).status).toBe(404);
    expect((await agent.get(`/api/lessons/${lesson.id}`)).body.lesson).toMatchObject({ retired: true });
    const search = await agent.get('/api/search?q=broach');
    expect(search.body.results.map((x: { lessonId: number }) => x.lessonId)).not.toContain(lesson.id);
  });

  it('when the lesson comes back into content, then it keeps its id and the old done mark counts again', async () => {
    const { agent } = apprentice;
    cpSync(path.join(CONTENT_DIR, GOING, `${BROACHING}.md`), path.join(copy, GOING, `${BROACHING}.md`));
    const lesson = await Lesson.findOne({ where: { slug: 'broaching-pivot-holes' }, rejectOnEmpty: true });
    await syncContent(r.sequelize, copy);
    expect((await lesson.reload()).retiredAt).toBeNull();
    const res = await agent.get(`/api/courses/${GOING}/lessons/broaching-pivot-holes`);
    expect(res.body.lesson).toMatchObject({ id: lesson.id, done: true });
    expect((await agent.get(`/api/courses/${GOING}`)).body.course.lessonsDone).toBe(1);
  });
});

describe('demo progress', () => {
  it('when the demo data is loaded twice, then Ned has his first three lessons done, once each', async () => {
    const d = await createTestApp();
    try {
      await seedDemo(d.sequelize);
      await seedDemo(d.sequelize);
      const ned = await User.findOne({ where: { email: 'ned@saltmarsh-guild.test' }, rejectOnEmpty: true });
      const rows = await LessonProgress.findAll({ where: { userId: ned.id } });
      const lessons = await Lesson.findAll({
        where: { id: rows.map((r) => r.lessonId) },
        order: [['position', 'ASC']],
      });
      expect(lessons.map((l) => l.position)).toEqual([1, 2, 3]);
    } finally {
      await d.close();
    }
  });
});
