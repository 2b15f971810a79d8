import { afterAll, beforeAll, expect, it } from 'vitest';
import { makeClass, tokenFromMail } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

// A file of its own: once the limit is reached, this client gets no further with any invitation link.
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

it('when one client keeps trying wrong invitation links, then it is stopped with 429 and told when to come back', async () => {
  const { agent } = await t.signIn('admin');
  const cls = await makeClass();
  await agent.post(`/api/classes/${cls.id}/invitations`).send({ emails: ['patient@example.test'] });
  const token = tokenFromMail((await t.deliverMail()).at(-1)!.text);

  const visitor = t.anon();
  for (let i = 0; i < 3; i++) expect((await visitor.get(`/api/invitations/${token}`)).status).toBe(200);
  const statuses: number[] = [];
  for (let i = 0; i < 31; i++)
    statuses.push((await visitor.get(`/api/invitations/guess-${String(i).padStart(20, '0')}`)).status);
  expect(statuses.slice(0, 30).every((s) => s === 410)).toBe(true);
  const stopped = await visitor.get(`/api/invitations/${token}`);
  expect(statuses[30]).toBe(429);
  expect(stopped.status).toBe(429);
  expect(stopped.headers['retry-after']).toBe('900');
});
