import type { Transaction } from 'sequelize';
import { AppError } from '../../lib/app-error';
import { hashLinkToken, newLinkToken } from '../../lib/link-token';
import { queueMail } from '../outbox/outbox.service';
import { endSessions } from './auth.service';
import { hashPassword } from './passwords';
import { PasswordReset } from './password-reset.model';
import { User } from './user.model';

const VALID_FOR_MS = 60 * 60 * 1000;

export const resetLinkGone = () =>
  new AppError(
    'RESET_LINK_GONE',
    'This link has already been used or is more than an hour old. Ask for a new one from the sign-in page.',
    410,
  );

/**
 * Does nothing visible for an unknown or deactivated address: the caller answers the same either way. A new link
 * replaces any open one, so an account never has more than one reset link that works.
 */
export async function requestPasswordReset(email: string, appUrl: string): Promise<void> {
  const user = await User.findOne({ where: { email } });
  if (!user?.active) return;
  const { token, tokenHash, expiresAt } = newLinkToken(VALID_FOR_MS);
  // The link and its e-mail are written together: one mail per request, delivered by the outbox.
  await PasswordReset.sequelize!.transaction(async (transaction) => {
    await PasswordReset.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    await PasswordReset.create({ userId: user.id, tokenHash, expiresAt, usedAt: null }, { transaction });
    await queueMail(resetMail(user, `${appUrl}/reset-password/${token}`), {
      kind: 'password-reset',
      secret: true,
      expiresAt,
      transaction,
    });
  });
}

const resetMail = (user: User, link: string) => ({
  to: user.email,
  subject: 'Set a new Tickwright password',
  text: [
    `Hello ${user.name},`,
    '',
    'Someone asked to set a new password for your Tickwright account. If it was you, open this link within one hour:',
    '',
    link,
    '',
    'The link works once. If you did not ask for it, you can ignore this e-mail: your password stays as it is.',
    '',
    'Tickwright',
  ].join('\n'),
});

/**
 * Spends every open reset link of the account: once the person has shown they know their password (by signing in or
 * changing it), a link still lying in their mailbox must not set another.
 */
export async function spendOpenResets(userId: number, transaction?: Transaction): Promise<void> {
  await PasswordReset.update({ usedAt: new Date() }, { where: { userId, usedAt: null }, transaction });
}

/** The open reset and its user, or the 410 that a used, expired or unknown link answers. */
export async function findOpenReset(token: string) {
  const reset = await PasswordReset.findOne({ where: { tokenHash: hashLinkToken(token) } });
  const user = reset ? await User.findByPk(reset.userId) : null;
  if (!reset || !user?.active || reset.usedAt || reset.expiresAt.getTime() <= Date.now()) throw resetLinkGone();
  return { reset, user };
}

/** Sets the new password, spends the token and every other open one of the user, and ends all their sessions. */
export async function resetPassword(token: string, password: string): Promise<void> {
  const { reset, user } = await findOpenReset(token);
  const passwordHash = await hashPassword(password);
  await User.sequelize!.transaction(async (transaction) => {
    const usedAt = new Date();
    // Claimed with a conditional update, so two requests racing with one link cannot both succeed.
    const [claimed] = await PasswordReset.update({ usedAt }, { where: { id: reset.id, usedAt: null }, transaction });
    if (claimed === 0) throw resetLinkGone();
    await spendOpenResets(user.id, transaction);
    await user.update({ passwordHash }, { transaction });
  });
  await endSessions(user.id);
}
