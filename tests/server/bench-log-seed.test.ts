import { afterAll, beforeAll, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed';
import { User } from '../../server/features/auth/user.model';
import { LogEntry, LogGrade, LogMeasurement } from '../../server/features/bench-log/log-entry.model';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

it('when the demo data is loaded twice, then Ned’s and Ruth’s entries are there once, with one graded entry', async () => {
  await seedDemo(t.sequelize);
  const counts = {
    entries: await LogEntry.count(),
    measurements: await LogMeasurement.count(),
    grades: await LogGrade.count(),
  };
  await seedDemo(t.sequelize);
  expect({
    entries: await LogEntry.count(),
    measurements: await LogMeasurement.count(),
    grades: await LogGrade.count(),
  }).toEqual(counts);
  expect(counts.grades).toBe(1);
  const ned = await User.findOne({ where: { email: 'ned@saltmarsh-guild.test' } });
  const ruth = await User.findOne({ where: { email: 'ruth@saltmarsh-guild.test' } });
  expect(await LogEntry.count({ where: { apprenticeId: ned!.id } })).toBeGreaterThanOrEqual(3);
  expect(await LogEntry.count({ where: { apprenticeId: ruth!.id } })).toBeGreaterThanOrEqual(2);
  const graded = await LogEntry.findByPk((await LogGrade.findOne())!.entryId);
  expect(graded?.apprenticeId).toBe(ned!.id);
  expect(
    await LogMeasurement.findAll({ where: { entryId: graded!.id }, order: [['position', 'ASC']], raw: true }),
  ).toEqual([
    expect.objectContaining({ name: 'end shake', value: 0.15, unit: 'mm' }),
    expect.objectContaining({ name: 'side shake', value: 0.03, unit: 'mm' }),
  ]);
});
