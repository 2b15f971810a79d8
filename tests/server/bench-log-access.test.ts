import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LogEntry } from '../../server/features/bench-log/log-entry.model';
import { addEntry, entryBody, type Agent } from './support/bench-log';
import { castOfClass } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let cast: Awaited<ReturnType<typeof castOfClass>>;
beforeAll(async () => {
  t = await createTestApp();
  cast = await castOfClass(t);
});
afterAll(() => t.close());

type Who = 'owner' | 'otherApprentice' | 'mentor' | 'otherMentor' | 'admin' | 'anonymous';
const agentOf = (who: Who): Agent =>
  ({
    owner: cast.apprenticeIn.agent,
    otherApprentice: cast.apprenticeOut.agent,
    mentor: cast.mentorThis.agent,
    otherMentor: cast.mentorOther.agent,
    admin: cast.admin.agent,
    anonymous: cast.anon.agent,
  })[who];

const readers = { owner: 200, otherApprentice: 404, mentor: 200, otherMentor: 404, admin: 200, anonymous: 401 };
const ownerOnly = { owner: 200, otherApprentice: 404, mentor: 403, otherMentor: 404, admin: 403, anonymous: 401 };
const mentorsOnly = { owner: 403, otherApprentice: 404, mentor: 201, otherMentor: 404, admin: 403, anonymous: 401 };

describe('reading one entry and one log', () => {
  let id: number;
  let owner: number;
  beforeAll(async () => {
    id = (await addEntry(cast.apprenticeIn.agent, { title: 'Readable entry' })).id;
    owner = cast.apprenticeIn.user.id;
  });

  for (const [who, status] of Object.entries(readers) as [Who, number][]) {
    it(`when ${who} opens the entry, then the answer is ${status}`, async () => {
      const res = await agentOf(who).get(`/api/log-entries/${id}`);
      expect(res.status).toBe(status);
      if (status === 200) expect(res.body).toMatchObject({ id, title: 'Readable entry' });
      else expect(res.body).not.toHaveProperty('title');
    });

    it(`when ${who} lists the apprentice's log, then the answer is ${status}`, async () => {
      const res = await agentOf(who).get(`/api/log-entries?apprentice=${owner}`);
      expect(res.status).toBe(status);
      if (status === 200) expect(res.body.entries.map((e: { id: number }) => e.id)).toContain(id);
    });

    it(`when ${who} exports the apprentice's log, then the answer is ${status}`, async () => {
      const res = await agentOf(who).get(`/api/log-entries/export.csv?apprentice=${owner}`);
      expect(res.status).toBe(status);
      if (status === 200) expect(res.text).toContain('Readable entry');
      else expect(res.text).not.toContain('Readable entry');
    });

    it(`when ${who} asks for the apprentice's summary, then the answer is ${status}`, async () => {
      const res = await agentOf(who).get(`/api/log-entries/summary?apprentice=${owner}`);
      expect(res.status).toBe(status);
      if (status === 200) expect(res.body.entryCount).toBeGreaterThanOrEqual(1);
    });
  }

  it('when another apprentice lists without naming anyone, then they see only their own (empty) log', async () => {
    const res = await cast.apprenticeOut.agent.get('/api/log-entries');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ entries: [], total: 0, page: 1 });
  });
});

describe('changing and deleting an entry', () => {
  for (const [who, status] of Object.entries(ownerOnly) as [Who, number][]) {
    it(`when ${who} edits the entry, then the answer is ${status} and the row changes only for the owner`, async () => {
      const { id } = await addEntry(cast.apprenticeIn.agent, { title: 'Before', minutes: 30 });
      const res = await agentOf(who).patch(`/api/log-entries/${id}`).send({ title: 'After' });
      expect(res.status).toBe(status);
      const row = await LogEntry.findByPk(id);
      expect(row?.title).toBe(status === 200 ? 'After' : 'Before');
    });

    it(`when ${who} deletes the entry, then the answer is ${status === 200 ? 204 : status}`, async () => {
      const { id } = await addEntry(cast.apprenticeIn.agent, { title: 'To delete', minutes: 30 });
      const res = await agentOf(who).delete(`/api/log-entries/${id}`);
      expect(res.status).toBe(status === 200 ? 204 : status);
      expect(await LogEntry.findByPk(id)).toEqual(status === 200 ? null : expect.anything());
    });
  }
});

describe('feedback on an entry', () => {
  let id: number;
  beforeAll(async () => {
    id = (await addEntry(cast.apprenticeIn.agent, { title: 'For feedback', minutes: 30 })).id;
  });

  for (const [who, status] of Object.entries(mentorsOnly) as [Who, number][]) {
    it(`when ${who} comments, then the answer is ${status}`, async () => {
      const res = await agentOf(who)
        .post(`/api/log-entries/${id}/comments`)
        .send({ body: `From ${who}` });
      expect(res.status).toBe(status);
      const entry = await cast.apprenticeIn.agent.get(`/api/log-entries/${id}`);
      const bodies = entry.body.comments.map((c: { body: string }) => c.body);
      expect(bodies.includes(`From ${who}`)).toBe(status === 201);
    });

    it(`when ${who} grades, then the answer is ${status}`, async () => {
      const comment = `Grade from ${who}`;
      const res = await agentOf(who)
        .post(`/api/log-entries/${id}/grades`)
        .send({ completeness: 3, measurements: 2, photos: 1, comment });
      expect(res.status).toBe(status);
      const entry = await cast.apprenticeIn.agent.get(`/api/log-entries/${id}`);
      const comments = entry.body.grades.map((g: { comment: string }) => g.comment);
      expect(comments.includes(comment)).toBe(status === 201);
    });
  }
});

describe('creating entries and the mentor lists', () => {
  const creators = { owner: 201, mentor: 403, admin: 403, anonymous: 401 } as const;
  for (const [who, status] of Object.entries(creators) as [Who, number][]) {
    it(`when ${who} creates an entry, then the answer is ${status}`, async () => {
      const title = `Created by ${who}`;
      const res = await agentOf(who)
        .post('/api/log-entries')
        .send(entryBody({ title, minutes: 5 }));
      expect(res.status).toBe(status);
      expect(await LogEntry.count({ where: { title } })).toBe(status === 201 ? 1 : 0);
    });
  }

  it('when each role asks for entries to read, then only their own apprentices’ ungraded entries are listed', async () => {
    const { id } = await addEntry(cast.apprenticeIn.agent, { title: 'Still to read', minutes: 5 });
    const ids = async (who: Who) => {
      const res = await agentOf(who).get('/api/log-entries/to-read');
      return { status: res.status, ids: (res.body.entries ?? []).map((e: { id: number }) => e.id) };
    };
    expect(await ids('mentor')).toMatchObject({ status: 200, ids: expect.arrayContaining([id]) });
    expect((await ids('otherMentor')).ids).not.toContain(id);
    expect(await ids('admin')).toMatchObject({ status: 200, ids: expect.arrayContaining([id]) });
    expect((await ids('owner')).status).toBe(403);
    expect((await ids('anonymous')).status).toBe(401);
  });

  it('when each role asks for the apprentices whose logs they read, then a mentor sees only their classes', async () => {
    const names = async (who: Who) => {
      const res = await agentOf(who).get('/api/log-entries/apprentices');
      return { status: res.status, ids: (res.body.apprentices ?? []).map((a: { id: number }) => a.id) };
    };
    const mine = cast.apprenticeIn.user.id;
    expect(await names('mentor')).toEqual({ status: 200, ids: [mine] });
    expect((await names('otherMentor')).ids).toEqual([cast.apprenticeOut.user.id]);
    expect((await names('admin')).ids).toEqual(expect.arrayContaining([mine, cast.apprenticeOut.user.id]));
    expect((await names('owner')).status).toBe(403);
    expect((await names('anonymous')).status).toBe(401);
  });
});
