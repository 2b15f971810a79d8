import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/features/auth/user.model';
import { LogEntry } from '../../server/features/bench-log/log-entry.model';
import { entryBody } from './support/bench-log';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
let apprentice: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
  apprentice = await t.signIn('apprentice');
});
afterAll(() => t.close());

const errorShape = {
  error: { code: 'BAD_REQUEST', message: expect.any(String) },
};

describe('null characters and broken characters are refused everywhere', () => {
  it('when a path or a query value holds a null character, then it answers 400 in the error shape', async () => {
    for (const url of ['/api/courses/%00', '/api/courses/a%00b', '/api/users?q=%00', '/api/search?q=ab%00cd', '/%00']) {
      const res = await admin.agent.get(url);
      expect([url, res.status]).toEqual([url, 400]);
      expect(res.body).toMatchObject(errorShape);
    }
    const query = await admin.agent.get('/api/users?q=%00');
    expect(query.body.error.fields).toEqual({ q: [expect.stringMatching(/not allowed/)] });
    // A path whose escapes do not decode is refused the same way.
    expect((await admin.agent.get('/api/courses/%E0%A4%A')).status).toBe(400);
  });

  it('when a JSON body holds a null character or half a character pair, at any depth or in a key, then nothing is stored', async () => {
    const raw = (body: string) =>
      apprentice.agent.patch('/api/account').set('Content-Type', 'application/json').send(body);
    const before = (await User.findByPk(apprentice.user.id))!.name;
    for (const body of [
      '{"name":"Ned\\u0000Pellow"}',
      '{"name":"Ned \\ud800"}',
      '{"name":"Ned \\udc00 Pellow"}',
      '{"name":"Ned","unitSystem":{"deep":[["x\\u0000"]]}}',
      '{"name\\u0000":"Ned"}',
    ]) {
      const res = await raw(body);
      expect([body, res.status]).toEqual([body, 400]);
      expect(res.body).toMatchObject(errorShape);
    }
    expect((await raw('{"name":"Ned \\ud83d\\udd70 Pellow"}')).status).toBe(200);
    expect((await User.findByPk(apprentice.user.id))!.name).toBe('Ned \u{1F570} Pellow');
    await User.update({ name: before }, { where: { id: apprentice.user.id } });
    const entry = await apprentice.agent.post('/api/log-entries').send(entryBody({ notes: 'Burnished\u0000' }));
    expect(entry.status).toBe(400);
    expect(entry.body.error.fields).toEqual({ notes: [expect.any(String)] });
    expect(await LogEntry.count({ where: { apprenticeId: apprentice.user.id } })).toBe(0);
  });
});

describe('bench-log dates', () => {
  it('when an entry is dated before 1900 or a filter reaches past next year, then it is refused on the date field', async () => {
    const old = await apprentice.agent.post('/api/log-entries').send(entryBody({ date: '1899-12-31' }));
    expect(old.status).toBe(400);
    expect(old.body.error.fields.date).toEqual(['Use a date from 1900 on.']);
    expect((await apprentice.agent.post('/api/log-entries').send(entryBody({ date: '1900-01-01' }))).status).toBe(201);
    const far = new Date().getFullYear() + 2;
    const filter = await apprentice.agent.get(`/api/log-entries?to=${far}-01-01`);
    expect(filter.status).toBe(400);
    expect(filter.body.error.fields.to).toEqual(['Use a date no later than next year.']);
    expect((await apprentice.agent.get('/api/log-entries?from=0001-01-01')).status).toBe(400);
    expect((await apprentice.agent.get(`/api/log-entries?to=${far - 1}-12-31`)).status).toBe(200);
  });
});
