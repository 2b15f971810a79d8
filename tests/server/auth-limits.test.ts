import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { SIGN_IN_LIMITS, RESET_REQUEST_LIMITS } from '../../server/features/auth/auth-limits';
import { PasswordReset } from '../../server/features/auth/password-reset.model';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** The app trusts X-Forwarded-For from loopback (a local reverse proxy), which lets a test speak as several clients. */
const attempt = (client: string, email: string, password = 'a-wrong-guess') =>
  t.anon().raw.post('/api/auth/login').set('Origin', ORIGIN).set('X-Forwarded-For', client).send({ email, password });
const askReset = (client: string, email: string) =>
  t.anon().raw.post('/api/auth/password-reset').set('Origin', ORIGIN).set('X-Forwarded-For', client).send({ email });

function expectRefused(res: { status: number; headers: Record<string, string>; body: unknown }, maxSeconds: number) {
  expect(res.status).toBe(429);
  expect(res.body).toEqual({
    error: { code: 'TOO_MANY_ATTEMPTS', message: expect.stringMatching(/wait \d+ minutes?/i) },
  });
  const retryAfter = Number(res.headers['retry-after']);
  expect(retryAfter).toBeGreaterThan(0);
  expect(retryAfter).toBeLessThanOrEqual(maxSeconds);
}

// Each attempt runs a cost-12 bcrypt check (a fraction of a second), and a test makes dozens of them.
describe('brute-force limits on sign-in', { timeout: 120_000 }, () => {
  it('when one client fails 10 times for an address, then it is refused there, and the right password still gets in from a fresh client', async () => {
    const user = await t.createUser('apprentice');
    for (let i = 1; i <= 10; i++) expect((await attempt('203.0.113.10', user.email)).status).toBe(401);
    expectRefused(await attempt('203.0.113.10', user.email.toUpperCase(), TEST_PASSWORD), 15 * 60);
    expect((await attempt('203.0.113.11', user.email, TEST_PASSWORD)).status).toBe(200);
    // The refused client may still sign in to another account: only the pair is held.
    const other = await t.createUser('apprentice');
    expect((await attempt('203.0.113.10', other.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when one client fails across many addresses, then it is refused after the per-client limit, whatever the address', async () => {
    const client = '198.51.100.20';
    for (let i = 1; i <= SIGN_IN_LIMITS.client.limit; i++) {
      expect((await attempt(client, `spray-${i}@example.test`)).status).toBe(401);
    }
    expectRefused(await attempt(client, 'spray-next@example.test'), 15 * 60);
    const user = await t.createUser('mentor');
    expect((await attempt('198.51.100.21', user.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when an address draws failures from many clients, then the slower per-address limit refuses even the right password', async () => {
    const user = await t.createUser('admin');
    const perClient = SIGN_IN_LIMITS.pair.limit;
    for (let i = 0; i < SIGN_IN_LIMITS.address.limit; i++) {
      expect((await attempt(`192.0.2.${1 + Math.floor(i / perClient)}`, user.email)).status).toBe(401);
    }
    expectRefused(await attempt('192.0.2.200', user.email, TEST_PASSWORD), 60 * 60);
  });

  it('when a refused client keeps trying, then its refusals do not count toward the address, so others still get in', async () => {
    const user = await t.createUser('apprentice');
    for (let i = 1; i <= 10; i++) await attempt('203.0.113.30', user.email);
    for (let i = 1; i <= SIGN_IN_LIMITS.address.limit; i++) {
      expect((await attempt('203.0.113.30', user.email)).status).toBe(429);
    }
    expect((await attempt('203.0.113.31', user.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when sign-ins succeed between failures, then only the failures count toward the limit', async () => {
    const client = '192.0.2.250';
    const user = await t.createUser('mentor');
    for (let i = 1; i <= 9; i++) expect((await attempt(client, user.email)).status).toBe(401);
    for (let i = 1; i <= 4; i++) expect((await attempt(client, user.email, TEST_PASSWORD)).status).toBe(200);
    expect((await attempt(client, user.email)).status).toBe(401);
    expect((await attempt(client, user.email)).status).toBe(429);
  });
});

describe('limits on reset requests', () => {
  it('when one address is asked for 25 times, then a handful of e-mails go out, the rest answer 429, and one link stays open', async () => {
    const user = await t.createUser('apprentice');
    const before = (await t.deliverMail()).length;
    const statuses: number[] = [];
    for (let i = 0; i < 25; i++) {
      const res = await askReset(`203.0.113.${100 + i}`, i % 2 ? user.email.toUpperCase() : user.email);
      statuses.push(res.status);
      if (res.status === 429) expectRefused(res, 60 * 60);
    }
    const allowed = RESET_REQUEST_LIMITS.address.limit;
    expect(statuses).toEqual([...Array(allowed).fill(202), ...Array(25 - allowed).fill(429)]);
    await vi.waitFor(async () => expect((await t.deliverMail()).length).toBe(before + allowed));
    expect(t.sent.slice(before).every((m) => m.to === user.email)).toBe(true);
    expect(await PasswordReset.count({ where: { userId: user.id, usedAt: null } })).toBe(1);
    expect(await PasswordReset.count({ where: { userId: user.id } })).toBe(1);
  });

  it('when an unknown address is asked for, then the replies are exactly those of a known one', async () => {
    const known = await t.createUser('mentor');
    const replies = async (email: string) => {
      const out: [number, unknown][] = [];
      for (let i = 0; i < 5; i++) {
        const res = await askReset(`198.51.100.${50 + i}`, email);
        out.push([res.status, res.body]);
      }
      return out;
    };
    expect(await replies('nobody-at-all@example.test')).toEqual(await replies(known.email));
  });

  it('when one client asks for many addresses, then it is refused after the per-client limit', async () => {
    const client = '192.0.2.77';
    for (let i = 0; i < RESET_REQUEST_LIMITS.client.limit; i++) {
      expect((await askReset(client, `someone-${i}@example.test`)).status).toBe(202);
    }
    expectRefused(await askReset(client, 'one-more@example.test'), 60 * 60);
  });
});
