import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/features/auth/user.model';
import { Enrolment } from '../../server/features/classes/class.model';
import { Invitation } from '../../server/features/classes/invitation.model';
import { hashLinkToken } from '../../server/lib/link-token';
import { makeClass, tokenFromMail } from './support/classes-fixture';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await t.signIn('admin');
});
afterAll(() => t.close());

const DAY_MS = 24 * 3600 * 1000;
const invite = (classId: number, emails: string[]) =>
  admin.agent.post(`/api/classes/${classId}/invitations`).send({ emails });
const mailTo = async (email: string) => (await t.deliverMail()).filter((m) => m.to === email);

/** Invites one new address and returns the token from its e-mail. */
async function invitedToken(classId: number, email: string) {
  const res = await invite(classId, [email]);
  expect(res.body.results[0].outcome).toBe('invited');
  return tokenFromMail((await mailTo(email)).at(-1)!.text);
}

describe('inviting by e-mail', () => {
  it('when a list mixes every case, then each address is answered with what happened or why not', async () => {
    const enrolled = await t.createUser('apprentice', { email: 'enrolled@example.test' });
    const existing = await t.createUser('apprentice', { email: 'existing@example.test', name: 'Ned Pellow' });
    await t.createUser('mentor', { email: 'a-mentor@example.test' });
    const cls = await makeClass({ capacity: 3, apprenticeIds: [enrolled.id] });

    const res = await invite(cls.id, [
      'existing@example.test',
      'New.Person@Example.test',
      'not-an-address',
      'new.person@example.test',
      'enrolled@example.test',
      'a-mentor@example.test',
      'one-too-many@example.test',
    ]);
    expect(res.status).toBe(200);
    expect(res.body.results.map((r: { email: string; outcome: string }) => [r.email, r.outcome])).toEqual([
      ['existing@example.test', 'enrolled'],
      ['new.person@example.test', 'invited'],
      ['not-an-address', 'bad-address'],
      ['new.person@example.test', 'duplicate'],
      ['enrolled@example.test', 'already-enrolled'],
      ['a-mentor@example.test', 'not-an-apprentice'],
      ['one-too-many@example.test', 'class-full'],
    ]);
    expect(
      await Enrolment.findOne({ where: { classId: cls.id, userId: existing.id, status: 'active' } }),
    ).not.toBeNull();
    expect((await mailTo('existing@example.test'))[0].subject).toMatch(/enrolled/i);
    expect((await mailTo('existing@example.test'))[0].text).toContain('/courses/going-train-wall-regulator');

    const rows = await Invitation.findAll({ where: { classId: cls.id } });
    expect(rows.map((r) => r.email)).toEqual(['new.person@example.test']);
    const token = tokenFromMail((await mailTo('new.person@example.test'))[0].text);
    expect(rows[0].tokenHash).toBe(hashLinkToken(token));
    expect(rows[0].tokenHash).not.toContain(token);
    const days = (rows[0].expiresAt.getTime() - Date.now()) / DAY_MS;
    expect(days).toBeGreaterThan(13.99);
    expect(days).toBeLessThanOrEqual(14);
    expect(await mailTo('one-too-many@example.test')).toEqual([]);
  });

  it('when an address already has an open invitation, then it is not invited twice', async () => {
    const cls = await makeClass();
    await invitedToken(cls.id, 'twice@example.test');
    const again = await invite(cls.id, ['twice@example.test']);
    expect(again.body.results[0].outcome).toBe('already-invited');
    expect(await Invitation.count({ where: { classId: cls.id, email: 'twice@example.test' } })).toBe(1);
    expect(await mailTo('twice@example.test')).toHaveLength(1);
  });

  it('when the class is archived, then nobody can be invited to it', async () => {
    const cls = await makeClass({ archived: true });
    const res = await invite(cls.id, ['late@example.test']);
    expect(res.status).toBe(409);
    expect(await Invitation.count({ where: { classId: cls.id } })).toBe(0);
  });

  it('when the list is empty, then the request is refused with a field message', async () => {
    const cls = await makeClass();
    const res = await invite(cls.id, []);
    expect(res.status).toBe(400);
    expect(res.body.error.fields.emails[0]).toMatch(/at least one/);
  });
});

describe('accepting an invitation', () => {
  it('when the invitee accepts, then an apprentice account is made, enrolled and signed in, and the link is spent', async () => {
    const cls = await makeClass({ name: 'Autumn Bench 2026' });
    const token = await invitedToken(cls.id, 'ruth@example.test');
    const visitor = t.anon();

    const preview = await visitor.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({
      email: 'ruth@example.test',
      className: 'Autumn Bench 2026',
      courseSlug: 'going-train-wall-regulator',
    });

    const res = await visitor
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Ruth Ashdown', password: 'a-long-passphrase' });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ name: 'Ruth Ashdown', email: 'ruth@example.test', role: 'apprentice' });
    const me = await visitor.get('/api/auth/me');
    expect(me.body.user.id).toBe(res.body.user.id);

    const user = (await User.findOne({ where: { email: 'ruth@example.test' } }))!;
    expect(await bcrypt.compare('a-long-passphrase', user.passwordHash!)).toBe(true);
    expect(await Enrolment.findOne({ where: { classId: cls.id, userId: user.id, status: 'active' } })).not.toBeNull();
    expect((await Invitation.findOne({ where: { email: 'ruth@example.test' } }))!.acceptedAt).not.toBeNull();

    const again = await t
      .anon()
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Someone Else', password: 'another-passphrase' });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/ask the guild office for a new one/i);
    expect((await t.anon().get(`/api/invitations/${token}`)).status).toBe(410);
    expect(await User.count({ where: { email: 'ruth@example.test' } })).toBe(1);
  });

  it('when the invitation has expired, then both the page and accepting answer 410 and no account is made', async () => {
    const cls = await makeClass();
    const token = await invitedToken(cls.id, 'expired@example.test');
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: 'expired@example.test' } });
    expect((await t.anon().get(`/api/invitations/${token}`)).status).toBe(410);
    const res = await t
      .anon()
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Too Late', password: 'a-long-passphrase' });
    expect(res.status).toBe(410);
    expect(await User.count({ where: { email: 'expired@example.test' } })).toBe(0);
  });

  it('when the token is unknown or malformed, then the answer is the same 410', async () => {
    const unknown = await t
      .anon()
      .post(`/api/invitations/${'x'.repeat(43)}/accept`)
      .send({ name: 'Nobody', password: 'a-long-passphrase' });
    const malformed = await t.anon().get('/api/invitations/%20');
    expect(unknown.status).toBe(410);
    expect(malformed.status).toBe(410);
    expect(unknown.body).toEqual(malformed.body);
  });

  it('when the password is too short, then the answer is 400 and the link still works', async () => {
    const cls = await makeClass();
    const token = await invitedToken(cls.id, 'short@example.test');
    const res = await t.anon().post(`/api/invitations/${token}/accept`).send({ name: 'Short Word', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toBeDefined();
    expect((await t.anon().get(`/api/invitations/${token}`)).status).toBe(200);
  });

  it('when the admin revokes an invitation, then its link answers 410', async () => {
    const cls = await makeClass();
    const token = await invitedToken(cls.id, 'revoked@example.test');
    const inv = (await Invitation.findOne({ where: { email: 'revoked@example.test' } }))!;
    expect((await admin.agent.post(`/api/invitations/${inv.id}/revoke`)).status).toBe(204);
    const res = await t
      .anon()
      .post(`/api/invitations/${token}/accept`)
      .send({ name: 'Revoked Person', password: 'a-long-passphrase' });
    expect(res.status).toBe(410);
    const pending = await admin.agent.get(`/api/invitations?classId=${cls.id}`);
    expect(pending.body.invitations).toEqual([]);
  });

  it('when the admin resends an expired invitation, then the old link dies and the new one works for 14 more days', async () => {
    const cls = await makeClass();
    const oldToken = await invitedToken(cls.id, 'resend@example.test');
    const inv = (await Invitation.findOne({ where: { email: 'resend@example.test' } }))!;
    await inv.update({ expiresAt: new Date(Date.now() - DAY_MS) });

    const listed = await admin.agent.get(`/api/invitations?classId=${cls.id}`);
    expect(listed.body.invitations).toMatchObject([{ id: inv.id, email: 'resend@example.test', expired: true }]);

    const res = await admin.agent.post(`/api/invitations/${inv.id}/resend`);
    expect(res.status).toBe(200);
    expect(res.body.mail).toEqual({ state: 'queued', lastError: null });
    const newToken = tokenFromMail((await mailTo('resend@example.test')).at(-1)!.text);
    const after = await admin.agent.get(`/api/invitations?classId=${cls.id}`);
    expect(after.body.invitations[0].mail).toEqual({ state: 'sent', lastError: null });
    expect(newToken).not.toBe(oldToken);
    expect((await Invitation.findByPk(inv.id))!.expiresAt.getTime()).toBeGreaterThan(Date.now() + 13.9 * DAY_MS);
    expect((await t.anon().get(`/api/invitations/${oldToken}`)).status).toBe(410);
    const accepted = await t
      .anon()
      .post(`/api/invitations/${newToken}/accept`)
      .send({ name: 'Resent Person', password: 'a-long-passphrase' });
    expect(accepted.status).toBe(201);
  });

  it('when an open invitation holds a seat, then the last seat cannot be given twice', async () => {
    const cls = await makeClass({ capacity: 1 });
    await invitedToken(cls.id, 'seat-one@example.test');
    const res = await invite(cls.id, ['seat-two@example.test']);
    expect(res.body.results[0].outcome).toBe('class-full');
    const shown = await admin.agent.get(`/api/classes/${cls.id}`);
    expect(shown.body.counts).toEqual({ active: 0, withdrawn: 0, invited: 1, seatsLeft: 0 });
  });
});
