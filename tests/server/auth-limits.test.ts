import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** The app trusts X-Forwarded-For from loopback (a local reverse proxy), which lets a test speak as several clients. */
const attempt = (client: string, email: string, password = 'a-wrong-guess') =>
  t.anon().raw.post('/api/auth/login').set('Origin', ORIGIN).set('X-Forwarded-For', client).send({ email, password });

// Each attempt runs a cost-12 bcrypt check (a fraction of a second), and a test makes a dozen of them.
describe('brute-force limit on sign-in', { timeout: 60_000 }, () => {
  it('when one client fails 10 times, then its 11th attempt answers 429 with Retry-After, whatever the address', async () => {
    const client = '203.0.113.10';
    for (let i = 1; i <= 10; i++) expect((await attempt(client, `guess-${i}@example.test`)).status).toBe(401);
    const eleventh = await attempt(client, 'guess-11@example.test');
    expect(eleventh.status).toBe(429);
    expect(eleventh.body.error.code).toBe('TOO_MANY_ATTEMPTS');
    const retryAfter = Number(eleventh.headers['retry-after']);
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    expect(eleventh.body.error.message).toMatch(/wait 15 minutes/);
  });

  it('when one address fails 10 times from different clients, then the 11th attempt is refused even with the right password', async () => {
    const user = await t.createUser('apprentice');
    for (let i = 1; i <= 10; i++) expect((await attempt(`198.51.100.${i}`, user.email)).status).toBe(401);
    const right = await attempt('198.51.100.99', user.email.toUpperCase(), TEST_PASSWORD);
    expect(right.status).toBe(429);
    expect(right.headers['retry-after']).toMatch(/^\d+$/);
    const other = await t.createUser('apprentice');
    expect((await attempt('198.51.100.99', other.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when sign-ins succeed between failures, then only the failures count toward the limit', async () => {
    const client = '192.0.2.20';
    const user = await t.createUser('mentor');
    for (let i = 1; i <= 9; i++) expect((await attempt(client, `miss-${i}@example.test`)).status).toBe(401);
    for (let i = 1; i <= 4; i++) expect((await attempt(client, user.email, TEST_PASSWORD)).status).toBe(200);
    expect((await attempt(client, 'miss-10@example.test')).status).toBe(401);
    expect((await attempt(client, 'miss-11@example.test')).status).toBe(429);
  });

  it('when a client is refused, then other clients can still sign in', async () => {
    const user = await t.createUser('admin');
    expect((await attempt('203.0.113.77', user.email, TEST_PASSWORD)).status).toBe(200);
  });
});
