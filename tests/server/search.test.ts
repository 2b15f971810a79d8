import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let agent: Awaited<ReturnType<TestApp['signIn']>>['agent'];
beforeAll(async () => {
  t = await createTestApp();
  agent = (await t.signIn('apprentice')).agent;
});
afterAll(() => t.close());

interface Hit {
  lessonSlug: string;
  courseSlug: string;
  title: string;
  snippet: string;
  terms: string[];
  score: number;
}

describe('lesson search', () => {
  it('when an apprentice searches "broach", then the broaching lesson comes first with a snippet and its terms', async () => {
    const res = await agent.get('/api/search?q=broach');
    expect(res.status).toBe(200);
    const [first, ...rest] = res.body.results as Hit[];
    expect(first).toMatchObject({ lessonSlug: 'broaching-pivot-holes', courseSlug: 'going-train-wall-regulator' });
    expect(first.terms.some((term) => term.startsWith('broach'))).toBe(true);
    expect(first.snippet.toLowerCase()).toContain('broach');
    expect(first.snippet.length).toBeLessThanOrEqual(210);
    for (const hit of rest) expect(hit.score).toBeLessThanOrEqual(first.score);
  });

  it('when a search names a term of the springs course, then the results come from that course first', async () => {
    const res = await agent.get('/api/search?q=fusee');
    expect(res.status).toBe(200);
    expect((res.body.results as Hit[])[0].courseSlug).toBe('springs-heat-treatment');
  });

  it('when a mentor searches two words, then lessons holding both come before the rest', async () => {
    const mentor = (await t.signIn('mentor')).agent;
    const res = await mentor.get('/api/search?q=' + encodeURIComponent('quench oil'));
    expect(res.status).toBe(200);
    const hits = res.body.results as Hit[];
    expect(hits.length).toBeGreaterThan(0);
    expect(hits[0].terms).toEqual(expect.arrayContaining(['quench', 'oil']));
  });

  it('when the query is empty or one letter, then it answers 400 naming the q field', async () => {
    for (const q of ['', 'b']) {
      const res = await agent.get(`/api/search?q=${q}`);
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields ?? {})).toContain('q');
    }
  });

  it('when nothing matches, then the result list is empty', async () => {
    const res = await agent.get('/api/search?q=zzqxvw');
    expect(res.status).toBe(200);
    expect(res.body.results).toEqual([]);
  });
});
