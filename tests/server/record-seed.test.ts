import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RecordCourse, SkillStatus } from '@shared/schemas/record';
import { seedDemo } from '../../server/demo/seed';
import { hashPassword } from '../../server/features/auth/passwords';
import { User } from '../../server/features/auth/user.model';
import { GuildClass } from '../../server/features/classes/class.model';
import { Certificate, SignOff } from '../../server/features/record/record.model';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.sequelize);
}, 180_000);
afterAll(() => t.close());

async function signInDemo(key: string) {
  const user = (await User.findOne({ where: { email: `${key}@saltmarsh-guild.test` } }))!;
  await user.update({ passwordHash: await hashPassword(TEST_PASSWORD) });
  return { agent: (await t.signIn(user)).agent, user };
}

const statuses = (course: RecordCourse) => Object.fromEntries(course.skills.map((s) => [s.key, s.status]));
const count = (course: RecordCourse, status: SkillStatus) => course.skills.filter((s) => s.status === status).length;

describe('demo record', () => {
  it('when the demo is loaded, then the apprentice of the archived class has finished the springs course with a certificate anyone can check', async () => {
    const office = await signInDemo('office');
    const morwenna = (await User.findOne({ where: { email: 'morwenna@saltmarsh-guild.test' } }))!;
    const earlier = (await GuildClass.findOne({ where: { name: 'Spring Bench 2026' } }))!;
    expect(earlier.archivedAt).not.toBeNull();
    const record = await office.agent.get(`/api/apprentices/${morwenna.id}/record`);
    expect(record.status).toBe(200);
    const [springs] = record.body.courses as RecordCourse[];
    expect(springs.course.slug).toBe('springs-heat-treatment');
    expect(count(springs, 'signed-off')).toBe(7);
    expect(springs.hours).toMatchObject({ class: { name: 'Spring Bench 2026' }, behind: false });
    const listed = await office.agent.get(`/api/certificates?apprenticeId=${morwenna.id}`);
    expect(listed.body.certificates).toHaveLength(1);
    const check = await t.anon().get(`/api/verify/${listed.body.certificates[0].code}`);
    expect(check.body).toMatchObject({ valid: true, apprentice: { name: 'Morwenna Trelease' } });
  });

  it('when Ned and Ruth open their records, then each has some skills signed off and some ready', async () => {
    for (const key of ['ned', 'ruth']) {
      const { agent, user } = await signInDemo(key);
      const res = await agent.get(`/api/apprentices/${user.id}/record`);
      const [train] = res.body.courses as RecordCourse[];
      expect(statuses(train)).toMatchObject({
        'plate-layout': 'signed-off',
        'bench-practice': 'signed-off',
        pivots: 'ready',
      });
      expect(train.hours?.requiredMinutesPerWeek).toBe(480);
    }
  });

  it('when the demo is loaded twice, then nothing is added', async () => {
    const before = [await SignOff.count(), await Certificate.count(), await GuildClass.count()];
    await seedDemo(t.sequelize);
    expect([await SignOff.count(), await Certificate.count(), await GuildClass.count()]).toEqual(before);
  });
});
