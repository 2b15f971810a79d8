import { afterAll, beforeAll, expect, it } from 'vitest';
import { makeClass } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

// A file of its own: it drops other features' tables, which no other test should have to live with.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

it('when the progress tables are absent, then the roster still answers, with nothing done', async () => {
  await t.sequelize.query('PRAGMA foreign_keys = OFF');
  await t.sequelize.query('DROP TABLE IF EXISTS lesson_progress');
  await t.sequelize.query('DROP TABLE IF EXISTS submissions');
  const ned = await t.createUser('apprentice');
  const cls = await makeClass({ apprenticeIds: [ned.id] });
  const { agent } = await t.signIn('admin');
  const res = await agent.get(`/api/classes/${cls.id}/roster`);
  expect(res.status).toBe(200);
  expect(res.body.entries[0]).toMatchObject({ userId: ned.id, lessonsDone: 0, projectsPassed: 0 });
});
