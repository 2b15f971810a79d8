import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Calculation } from '../../server/features/calculations/calculation.model';
import { LogComment, LogEntry } from '../../server/features/bench-log/log-entry.model';
import { Enrolment } from '../../server/features/classes/class.model';
import { daysAgo, entryBody, type Agent } from './support/bench-log';
import { makeClass } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

async function apprentices(n: number, classId: number) {
  const list: { agent: Agent; id: number }[] = [];
  for (let i = 0; i < n; i++) {
    const a = await t.signIn('apprentice');
    await Enrolment.create({ classId, userId: a.user.id });
    list.push({ agent: a.agent, id: a.user.id });
  }
  return list;
}

/** Ten short entries on ten different days, so that no day passes its 24 hours. */
const entries = (agent: Agent, tag: string) =>
  Array.from({ length: 10 }, (_, i) =>
    agent.post('/api/log-entries').send(entryBody({ date: daysAgo(i + 1), minutes: 30, title: `${tag} entry ${i}` })),
  );

describe('many writes at once', () => {
  it('when six apprentices each send ten entries at the same moment, then all sixty are stored and health keeps answering', async () => {
    const cls = await makeClass();
    const six = await apprentices(6, cls.id);
    const writes = six.flatMap((a, i) => entries(a.agent, `burst ${i}`));
    const health = t.anon().get('/api/health');
    const [replies, healthReply] = await Promise.all([Promise.all(writes), health]);
    expect(replies.map((r) => r.status)).toEqual(Array(60).fill(201));
    expect(healthReply.status).toBe(200);
    expect(await LogEntry.count({ where: { apprenticeId: six.map((a) => a.id) } })).toBe(60);
  });

  it('when a hundred writes of different kinds arrive together, then every one is committed', async () => {
    const mentor = await t.signIn('mentor');
    const cls = await makeClass({ mentorIds: [mentor.user.id] });
    const four = await apprentices(4, cls.id);
    const [first] = four;
    const toComment = await first.agent.post('/api/log-entries').send(entryBody({ date: daysAgo(20), minutes: 30 }));
    expect(toComment.status).toBe(201);
    const calc = (agent: Agent, i: number) =>
      agent.post('/api/calculations').send({
        calculator: 'spring-temper',
        title: `Click spring ${i}`,
        inputs: { mode: 'brass', numbersHard: 2 },
      });
    const writes = [
      ...four.flatMap((a, i) => entries(a.agent, `mixed ${i}`)),
      ...Array.from({ length: 40 }, (_, i) => calc(four[i % 4].agent, i)),
      ...Array.from({ length: 20 }, (_, i) =>
        mentor.agent.post(`/api/log-entries/${toComment.body.id}/comments`).send({ body: `Note ${i}` }),
      ),
    ];
    const replies = await Promise.all(writes);
    expect(replies.filter((r) => r.status !== 201).map((r) => [r.status, r.body])).toEqual([]);
    expect(await LogEntry.count({ where: { apprenticeId: four.map((a) => a.id) } })).toBe(41);
    expect(await Calculation.count({ where: { userId: four.map((a) => a.id) } })).toBe(40);
    expect(await LogComment.count({ where: { entryId: toComment.body.id } })).toBe(20);
  });

  it('when a transaction fails half-way, then none of its rows remain and the next write still goes through', async () => {
    const a = (await apprentices(1, (await makeClass()).id))[0];
    const bad = await a.agent
      .post('/api/log-entries')
      .send(entryBody({ date: daysAgo(3), minutes: 30, uploadIds: [999999] }));
    expect(bad.status).toBe(400);
    expect(await LogEntry.count({ where: { apprenticeId: a.id } })).toBe(0);
    const good = await a.agent.post('/api/log-entries').send(entryBody({ date: daysAgo(3), minutes: 30 }));
    expect(good.status).toBe(201);
  });
});
