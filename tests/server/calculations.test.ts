import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Calculation } from '../../server/features/calculations/calculation.model';
import { assertOwnCalculations } from '../../server/features/calculations/calculations.service';
import { ClassMentor, Enrolment, GuildClass } from '../../server/features/classes/class.model';
import { Course } from '../../server/features/courses/course.model';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

// TRADE.md §1 check values: taper k = 1/50, round broach 0.50 mm at the reference, target 1.05 mm -> 27.5 mm to
// the entry face; opened from both faces (the default) the target is at mid-plate, t/2 = 1 mm deeper: 28.5 mm (computed).
const BROACH = {
  taperPerMm: 0.02,
  refDiameterMm: 0.5,
  targetDiameterMm: 1.05,
  plateThicknessMm: 2,
  pivotDiameterMm: 1,
};

/** An apprentice in a class with one mentor, plus a mentor of another class: the people every access rule needs. */
async function classWithPeople() {
  const course = await Course.findOne();
  const makeClass = (name: string) =>
    GuildClass.create({ name, courseId: course!.id, startsOn: '2026-09-01', endsOn: '2026-12-18', capacity: 8 });
  const [ours, theirs] = [await makeClass('Bench A'), await makeClass('Bench B')];
  const apprentice = await t.signIn('apprentice');
  const mentor = await t.signIn('mentor');
  const otherMentor = await t.signIn('mentor');
  await Enrolment.create({ classId: ours.id, userId: apprentice.user.id });
  await ClassMentor.create({ classId: ours.id, userId: mentor.user.id });
  await ClassMentor.create({ classId: theirs.id, userId: otherMentor.user.id });
  return { apprentice, mentor, otherMentor };
}

type Agent = Awaited<ReturnType<TestApp['signIn']>>['agent'];
async function save(agent: Agent, body: object) {
  const res = await agent.post('/api/calculations').send(body);
  expect(res.status).toBe(201);
  return res.body as { id: number };
}

describe('saving a result', () => {
  it('when the client sends results of its own, then the server stores only what it computed itself', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const res = await agent.post('/api/calculations').send({
      calculator: 'broach-taper',
      title: 'Third wheel, back plate',
      inputs: BROACH,
      results: { insertionDepthMm: 999 },
      warnings: [],
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ calculator: 'broach-taper', title: 'Third wheel, back plate', inputs: BROACH });
    expect(res.body.results.insertionDepthMm).toBeCloseTo(28.5, 9); // TRADE.md §1 (computed)
    expect(typeof res.body.createdAt).toBe('string');
    const row = await Calculation.findByPk(res.body.id);
    expect(row?.userId).toBe(user.id);
    expect((row?.results as { insertionDepthMm: number }).insertionDepthMm).toBeCloseTo(28.5, 9);
  });

  it('when the inputs carry a sneaked-in result, then it is dropped from the stored inputs and defaults are filled', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent.post('/api/calculations').send({
      calculator: 'pivot-burnish',
      inputs: { loadN: 10, leverArmMm: 0.75, pivotDiameterMm: 1, minDiameterMm: 0.1 },
    });
    expect(res.status).toBe(201);
    const row = await Calculation.findByPk(res.body.id);
    expect(row?.inputs).not.toHaveProperty('minDiameterMm');
    expect(row?.inputs).toMatchObject({ allowableStressMPa: 200 });
    // TRADE.md §2 check values: F = 10 N, a = 0.75 mm, σ_allow = 200 MPa -> d_min = 0.726 mm (computed)
    expect((row?.results as { minDiameterMm: number }).minDiameterMm).toBeCloseTo(0.726, 3);
    expect(row?.title).toBe('Pivot & burnish');
  });

  it('when a spring-temper brass result is saved, then the reduction is the server’s and the warnings are kept', async () => {
    const { agent } = await t.signIn('apprentice');
    const half = await agent
      .post('/api/calculations')
      .send({ calculator: 'spring-temper', inputs: { mode: 'brass', numbersHard: 2 } });
    expect(half.status).toBe(201);
    // TRADE.md §3c: ½ hard, 2 numbers, 20.70 % by the formula (computed); published 20.7 (Precision Steel Warehouse)
    expect(half.body.results.reductionPercent).toBeCloseTo(20.7, 1);
    const beyond = await agent
      .post('/api/calculations')
      .send({ calculator: 'spring-temper', inputs: { mode: 'brass', numbersHard: 12 } });
    expect(beyond.body.warnings.length).toBeGreaterThan(0);
    const row = await Calculation.findByPk(beyond.body.id);
    expect(row?.warnings).toEqual(beyond.body.warnings);
  });

  it('when an input is out of range or missing, then the answer is 400 with a field error per input and nothing is stored', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const { refDiameterMm: _dropped, ...rest } = BROACH;
    const res = await agent
      .post('/api/calculations')
      .send({ calculator: 'broach-taper', inputs: { ...rest, taperPerMm: -1 } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['refDiameterMm', 'taperPerMm']);
    expect(await Calculation.count({ where: { userId: user.id } })).toBe(0);
  });

  it('when the calculator is unknown or the title too long, then the answer is 400 on that field', async () => {
    const { agent } = await t.signIn('apprentice');
    const unknown = await agent.post('/api/calculations').send({ calculator: 'escapement', inputs: {} });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields.calculator).toEqual(['There is no calculator by that name.']);
    const proto = await agent.post('/api/calculations').send({ calculator: 'toString', inputs: {} });
    expect(proto.body.error.fields.calculator).toBeDefined();
    const long = await agent
      .post('/api/calculations')
      .send({ calculator: 'broach-taper', inputs: BROACH, title: 'x'.repeat(121) });
    expect(long.status).toBe(400);
    expect(long.body.error.fields.title).toBeDefined();
  });

  it('when someone other than an apprentice saves, then it is refused (401 signed out, 403 mentor and office)', async () => {
    const body = { calculator: 'broach-taper', inputs: BROACH };
    expect((await t.anon().post('/api/calculations').send(body)).status).toBe(401);
    expect((await (await t.signIn('mentor')).agent.post('/api/calculations').send(body)).status).toBe(403);
    expect((await (await t.signIn('admin')).agent.post('/api/calculations').send(body)).status).toBe(403);
  });
});

describe('reading saved results', () => {
  it('when an apprentice lists, then they see their own, newest first, and nobody else’s', async () => {
    const { apprentice } = await classWithPeople();
    const stranger = await t.signIn('apprentice');
    const first = await save(apprentice.agent, { calculator: 'broach-taper', inputs: BROACH, title: 'First' });
    const second = await save(apprentice.agent, { calculator: 'broach-taper', inputs: BROACH, title: 'Second' });
    await save(stranger.agent, { calculator: 'broach-taper', inputs: BROACH, title: 'Not yours' });
    const res = await apprentice.agent.get('/api/calculations');
    expect(res.status).toBe(200);
    expect(res.body.calculations.map((c: { id: number }) => c.id)).toEqual([second.id, first.id]);
    const peek = await stranger.agent.get(`/api/calculations?apprentice=${apprentice.user.id}`);
    expect(peek.status).toBe(404);
    expect((await t.anon().get('/api/calculations')).status).toBe(401);
  });

  it('when a mentor or the office names an apprentice, then only the class’s mentors and the office see the list', async () => {
    const { apprentice, mentor, otherMentor } = await classWithPeople();
    const saved = await save(apprentice.agent, { calculator: 'broach-taper', inputs: BROACH });
    const url = `/api/calculations?apprentice=${apprentice.user.id}`;
    const mine = await mentor.agent.get(url);
    expect(mine.status).toBe(200);
    expect(mine.body.calculations.map((c: { id: number }) => c.id)).toEqual([saved.id]);
    expect((await otherMentor.agent.get(url)).status).toBe(404);
    const admin = await t.signIn('admin');
    expect((await admin.agent.get(url)).body.calculations).toHaveLength(1);
    expect((await mentor.agent.get('/api/calculations')).body.calculations).toEqual([]);
    expect((await mentor.agent.get('/api/calculations?apprentice=abc')).status).toBe(400);
  });

  it('when one result is opened, then the owner, their mentor and the office see it and everyone else gets 404', async () => {
    const { apprentice, mentor, otherMentor } = await classWithPeople();
    const stranger = await t.signIn('apprentice');
    const admin = await t.signIn('admin');
    const saved = await save(apprentice.agent, { calculator: 'broach-taper', inputs: BROACH });
    const url = `/api/calculations/${saved.id}`;
    for (const who of [apprentice, mentor, admin]) {
      const res = await who.agent.get(url);
      expect(res.status).toBe(200);
      expect(res.body.results.insertionDepthMm).toBeCloseTo(28.5, 9); // TRADE.md §1 (computed)
    }
    for (const who of [stranger, otherMentor]) expect((await who.agent.get(url)).status).toBe(404);
    expect((await t.anon().get(url)).status).toBe(401);
    expect((await apprentice.agent.get('/api/calculations/999999')).status).toBe(404);
    expect((await apprentice.agent.get('/api/calculations/abc')).status).toBe(404);
  });
});

describe('deleting a saved result', () => {
  it('when the owner deletes, then the row is gone; mentors are refused and strangers told it does not exist', async () => {
    const { apprentice, mentor, otherMentor } = await classWithPeople();
    const stranger = await t.signIn('apprentice');
    const admin = await t.signIn('admin');
    const saved = await save(apprentice.agent, { calculator: 'broach-taper', inputs: BROACH });
    const url = `/api/calculations/${saved.id}`;
    expect((await t.anon().delete(url)).status).toBe(401);
    expect((await stranger.agent.delete(url)).status).toBe(404);
    expect((await otherMentor.agent.delete(url)).status).toBe(404);
    expect((await mentor.agent.delete(url)).status).toBe(403);
    expect((await admin.agent.delete(url)).status).toBe(403);
    expect(await Calculation.findByPk(saved.id)).not.toBeNull();
    expect((await apprentice.agent.delete(url)).status).toBe(204);
    expect(await Calculation.findByPk(saved.id)).toBeNull();
    expect((await apprentice.agent.get(url)).status).toBe(404);
    expect((await apprentice.agent.delete(url)).status).toBe(404);
  });
});

describe('attaching saved results elsewhere', () => {
  it('when every id is the user’s own, then they come back in the order asked; otherwise 400 on the named field', async () => {
    const owner = await t.signIn('apprentice');
    const other = await t.signIn('apprentice');
    const a = await save(owner.agent, { calculator: 'broach-taper', inputs: BROACH, title: 'A' });
    const b = await save(owner.agent, { calculator: 'broach-taper', inputs: BROACH, title: 'B' });
    const theirs = await save(other.agent, { calculator: 'broach-taper', inputs: BROACH });
    const got = await assertOwnCalculations(owner.user.id, [b.id, a.id, b.id]);
    expect(got.map((c) => c.title)).toEqual(['B', 'A']);
    expect(await assertOwnCalculations(owner.user.id, [])).toEqual([]);
    await expect(
      assertOwnCalculations(owner.user.id, [a.id, theirs.id], { field: 'attachments' }),
    ).rejects.toMatchObject({
      status: 400,
      fields: { attachments: ['Attach only results you saved yourself.'] },
    });
  });
});
