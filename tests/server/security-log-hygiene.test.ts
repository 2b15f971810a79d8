import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { redactUrl } from '../../server/lib/logger';
import { makeClass, tokenFromMail } from './support/classes-fixture';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

const logLines: string[] = [];
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ LOG_LEVEL: 'info' }, { logLines });
});
afterAll(() => t.close());

/** The value of every tickwright.sid cookie the app handed out, as it appears in a Set-Cookie header. */
const sidValues = (setCookie: string[] | string | undefined) =>
  [setCookie ?? []].flat().flatMap((c) => /tickwright\.sid=([^;]+)/.exec(c)?.[1] ?? []);

async function mailAfter(before: number, to: string) {
  return vi.waitFor(async () => {
    const found = (await t.deliverMail()).slice(before).find((m) => m.to === to);
    if (!found) throw new Error('no mail yet');
    return found;
  });
}

describe('log hygiene', { timeout: 60_000 }, () => {
  it('when a scripted session signs in, resets a password and accepts an invitation, then the log holds no session id, token or password', async () => {
    const secrets: string[] = [TEST_PASSWORD];
    const cookies: string[] = [];
    const user = await t.createUser('apprentice');

    // Sign in: once wrong, then right, then read a page and sign out.
    const wrong = await t.anon().post('/api/auth/login').send({ email: user.email, password: 'wrong-guess-123' });
    expect(wrong.status).toBe(401);
    secrets.push('wrong-guess-123');
    const agent = t.anon();
    const login = await agent.post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    cookies.push(...sidValues(login.headers['set-cookie']));
    expect((await agent.get('/api/auth/me')).status).toBe(200);

    // A reset: the e-mailed link opened as a page, checked, then used.
    let before = (await t.deliverMail()).length;
    expect((await t.anon().post('/api/auth/password-reset').send({ email: user.email })).status).toBe(202);
    const resetToken = /\/reset-password\/([A-Za-z0-9_-]+)/.exec((await mailAfter(before, user.email)).text)![1];
    secrets.push(resetToken);
    await t.anon().get(`/reset-password/${resetToken}`).set('Referer', `${ORIGIN}/reset-password/${resetToken}`);
    expect((await t.anon().get(`/api/auth/password-reset/${resetToken}`)).status).toBe(204);
    const newPassword = 'mainspring-barrel-77';
    secrets.push(newPassword);
    const reset = await t
      .anon()
      .post(`/api/auth/password-reset/${resetToken}`)
      .set('Referer', `${ORIGIN}/reset-password/${resetToken}`)
      .send({ password: newPassword });
    expect(reset.status).toBe(204);

    // An invitation, accepted by a newcomer who is signed in by it.
    const admin = await t.signIn('admin');
    const cls = await makeClass();
    const invitee = 'newcomer-log@example.test';
    before = (await t.deliverMail()).length;
    const invited = await admin.agent.post(`/api/classes/${cls.id}/invitations`).send({ emails: [invitee] });
    expect(invited.status).toBe(200);
    const invitationToken = tokenFromMail((await mailAfter(before, invitee)).text);
    secrets.push(invitationToken);
    await t.anon().get(`/invitation/${invitationToken}`);
    expect((await t.anon().get(`/api/invitations/${invitationToken}`)).status).toBe(200);
    const newcomerPassword = 'click-spring-temper-9';
    secrets.push(newcomerPassword);
    const accepted = await t
      .anon()
      .post(`/api/invitations/${invitationToken}/accept`)
      .send({ name: 'Wren Tallack', password: newcomerPassword });
    expect(accepted.status).toBe(201);
    cookies.push(...sidValues(accepted.headers['set-cookie']));
    expect((await agent.post('/api/auth/logout')).status).toBe(204);

    expect(cookies.length).toBeGreaterThanOrEqual(2);
    const log = logLines.join('');
    expect(log).toContain('/api/auth/password-reset/:token');
    expect(log).toContain('/api/invitations/:token/accept');
    expect(log).not.toMatch(/tickwright\.sid=/);
    expect(log).not.toMatch(/"cookie"|"set-cookie"|"authorization"|"referer"/i);
    for (const value of [...cookies, ...cookies.map(decodeURIComponent), ...secrets]) expect(log).not.toContain(value);
  });

  it('when a request is logged, then its line keeps the request id, method, path, status and duration', async () => {
    logLines.length = 0;
    await t.anon().get('/api/courses?x=1');
    const line = JSON.parse(logLines.find((l) => l.includes('/api/courses?x=1'))!);
    expect(line.req).toEqual({
      id: expect.anything(),
      method: 'GET',
      url: '/api/courses?x=1',
      remoteAddress: expect.any(String),
    });
    expect(line.res).toEqual({ statusCode: 401 });
    expect(line.responseTime).toEqual(expect.any(Number));
  });

  it('when a URL carries a link token, then the token is replaced and numeric invitation ids are kept', () => {
    expect(redactUrl('/api/auth/password-reset/abc_DEF-123')).toBe('/api/auth/password-reset/:token');
    expect(redactUrl('/api/invitations/abc_DEF-123/accept')).toBe('/api/invitations/:token/accept');
    expect(redactUrl('/api/invitations/42/resend')).toBe('/api/invitations/42/resend');
    expect(redactUrl('/api/invitations/?classId=3')).toBe('/api/invitations/?classId=3');
    expect(redactUrl('/api/invitations/12345abc')).toBe('/api/invitations/:token');
    expect(redactUrl('/reset-password/abc?from=mail')).toBe('/reset-password/:token?from=mail');
    expect(redactUrl('/invitation/abc')).toBe('/invitation/:token');
    expect(redactUrl('/api/courses/going-train')).toBe('/api/courses/going-train');
  });
});
