import type { AccountUpdateInput, PasswordChangeInput, UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { endSessions } from './auth.service';
import { spendOpenResets } from './password-reset.service';
import { checkPassword, hashPassword } from './passwords';
import { toUserDTO } from './user.mapper';
import { User } from './user.model';

async function activeUser(userId: number): Promise<User> {
  const user = await User.findByPk(userId);
  if (!user?.active) throw new AppError('UNAUTHENTICATED', 'Please sign in.', 401);
  return user;
}

export async function updateAccount(userId: number, input: AccountUpdateInput): Promise<UserDTO> {
  const user = await activeUser(userId);
  await user.update(input);
  return toUserDTO(user);
}

/** Checks the current password first, then signs out every other session of the account and spends its reset links. */
export async function changePassword(userId: number, input: PasswordChangeInput, keepSessionId: string): Promise<void> {
  const user = await activeUser(userId);
  if (!(await checkPassword(input.currentPassword, user.passwordHash))) {
    throw AppError.badRequest('Your current password was not right.', {
      currentPassword: ['That is not your current password.'],
    });
  }
  await user.update({ passwordHash: await hashPassword(input.newPassword) });
  await spendOpenResets(user.id);
  await endSessions(user.id, keepSessionId);
}
