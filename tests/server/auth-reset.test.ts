import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { PasswordReset } from '../../server/features/auth/password-reset.model';
import { Session } from '../../server/features/auth/session.model';
import { User } from '../../server/features/auth/user.model';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const NEW_PASSWORD = 'escapement-oil-2026';
const LINK = new RegExp(`${ORIGIN}/reset-password/([A-Za-z0-9_-]+)`);

/** Asks for a reset and reads the token from the link in the e-mail the user receives. */
async function requestLink(email: string): Promise<string> {
  const before = (await t.deliverMail()).length;
  expect((await t.anon().post('/api/auth/password-reset').send({ email })).status).toBe(202);
  const mail = await vi.waitFor(async () => {
    const found = (await t.deliverMail()).slice(before).find((m) => m.to === email.toLowerCase());
    if (!found) throw new Error('no mail yet');
    return found;
  });
  const match = LINK.exec(mail.text);
  if (!match) throw new Error(`no link in: ${mail.text}`);
  return match[1];
}

const signInWith = (email: string, password: string) => t.anon().post('/api/auth/login').send({ email, password });

describe('password reset by e-mail', () => {
  it('when the link from the e-mail is used, then the new password works, the old fails, the link is spent and other sessions end', async () => {
    const { agent: otherSession, user } = await t.signIn('apprentice');
    const token = await requestLink(user.email.toUpperCase());

    const row = await PasswordReset.findOne({ where: { userId: user.id } });
    expect(row?.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(row?.tokenHash).not.toContain(token);
    expect(row!.expiresAt.getTime() - Date.now()).toBeGreaterThan(59 * 60 * 1000);
    expect(row!.expiresAt.getTime() - Date.now()).toBeLessThanOrEqual(60 * 60 * 1000);

    const reset = await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: NEW_PASSWORD });
    expect(reset.status).toBe(204);
    expect((await row!.reload()).usedAt).toBeInstanceOf(Date);
    expect(await Session.count({ where: { userId: user.id } })).toBe(0);
    expect((await otherSession.get('/api/auth/me')).status).toBe(401);

    expect((await signInWith(user.email, TEST_PASSWORD)).status).toBe(401);
    expect((await signInWith(user.email, NEW_PASSWORD)).status).toBe(200);

    const again = await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: 'yet-another-one-1' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('RESET_LINK_GONE');
    expect(again.body.error.message).toMatch(/already been used or is more than an hour old/);
    expect((await signInWith(user.email, NEW_PASSWORD)).status).toBe(200);
  });

  it('when the address is unknown or deactivated, then the answer is the same and no e-mail or token is made', async () => {
    const known = await t.createUser('mentor');
    const gone = await t.createUser('apprentice', { active: false });
    const before = (await t.deliverMail()).length;
    const replies = await Promise.all(
      [known.email, 'nobody-here@example.test', gone.email].map((email) =>
        t.anon().post('/api/auth/password-reset').send({ email }),
      ),
    );
    expect(replies.map((r) => r.status)).toEqual([202, 202, 202]);
    expect(replies[1].body).toEqual(replies[0].body);
    expect(replies[2].body).toEqual(replies[0].body);
    await vi.waitFor(async () => expect((await t.deliverMail()).length).toBe(before + 1));
    expect(t.sent.slice(before).map((m) => m.to)).toEqual([known.email]);
    expect(await PasswordReset.count({ where: { userId: gone.id } })).toBe(0);
  });

  it('when the reset page checks a link, then an open one answers 204 and a spent or unknown one 410', async () => {
    const user = await t.createUser('apprentice');
    const token = await requestLink(user.email);
    expect((await t.anon().get(`/api/auth/password-reset/${token}`)).status).toBe(204);
    await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: NEW_PASSWORD });
    const spent = await t.anon().get(`/api/auth/password-reset/${token}`);
    expect(spent.status).toBe(410);
    expect(spent.body.error.code).toBe('RESET_LINK_GONE');
    expect((await t.anon().get('/api/auth/password-reset/not-a-real-token')).status).toBe(410);
  });

  it('when a link is more than an hour old, then it answers 410 and the password stays', async () => {
    const user = await t.createUser('mentor');
    const token = await requestLink(user.email);
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const res = await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: NEW_PASSWORD });
    expect(res.status).toBe(410);
    expect((await signInWith(user.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('when a newer link is used, then an older one still in the mailbox stops working too', async () => {
    const user = await t.createUser('admin');
    const older = await requestLink(user.email);
    const newer = await requestLink(user.email);
    expect((await t.anon().post(`/api/auth/password-reset/${newer}`).send({ password: NEW_PASSWORD })).status).toBe(
      204,
    );
    expect(
      (await t.anon().post(`/api/auth/password-reset/${older}`).send({ password: 'sneaky-other-pw' })).status,
    ).toBe(410);
    expect((await signInWith(user.email, NEW_PASSWORD)).status).toBe(200);
  });

  it('when the account is deactivated after the e-mail was sent, then the link no longer works', async () => {
    const user = await t.createUser('apprentice');
    const token = await requestLink(user.email);
    await user.update({ active: false });
    expect((await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: NEW_PASSWORD })).status).toBe(
      410,
    );
    const stored = await User.findByPk(user.id);
    expect(stored?.passwordHash).toBe(user.passwordHash);
  });

  it('when the new password is shorter than 10 characters, then it is refused with a field error and the link stays usable', async () => {
    const user = await t.createUser('apprentice');
    const token = await requestLink(user.email);
    const short = await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: 'nine-char' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password[0]).toMatch(/at least 10 characters/);
    expect((await PasswordReset.findOne({ where: { userId: user.id } }))?.usedAt).toBeNull();
    expect((await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: 'ten-chars!' })).status).toBe(
      204,
    );
  });

  it('when the password is changed on the account page, then an open reset link answers 410', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const token = await requestLink(user.email);
    const changed = await agent
      .post('/api/account/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: NEW_PASSWORD });
    expect(changed.status).toBe(204);
    expect((await t.anon().get(`/api/auth/password-reset/${token}`)).status).toBe(410);
    const used = await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: 'taken-over-pw-1' });
    expect(used.status).toBe(410);
    expect(await PasswordReset.count({ where: { userId: user.id, usedAt: null } })).toBe(0);
    expect((await signInWith(user.email, NEW_PASSWORD)).status).toBe(200);
  });

  it('when the person signs in with their password after a reset was asked, then the open link is spent', async () => {
    const user = await t.createUser('mentor');
    const token = await requestLink(user.email);
    expect((await signInWith(user.email, 'not-my-password')).status).toBe(401);
    expect((await t.anon().get(`/api/auth/password-reset/${token}`)).status).toBe(204);
    expect((await signInWith(user.email, TEST_PASSWORD)).status).toBe(200);
    expect((await t.anon().get(`/api/auth/password-reset/${token}`)).status).toBe(410);
    expect((await t.anon().post(`/api/auth/password-reset/${token}`).send({ password: NEW_PASSWORD })).status).toBe(
      410,
    );
    expect((await PasswordReset.findOne({ where: { userId: user.id } }))!.usedAt).toBeInstanceOf(Date);
  });

  it('when the request has no valid e-mail, then it answers 400 with a field error', async () => {
    const res = await t.anon().post('/api/auth/password-reset').send({ email: 'not an address' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toBeDefined();
  });
});
