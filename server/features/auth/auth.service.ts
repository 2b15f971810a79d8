import type { UserDTO } from '@shared/schemas/user';
import { checkPassword } from './passwords';
import { Session } from './session.model';
import { toUserDTO } from './user.mapper';
import { User } from './user.model';

/** The same null for an unknown e-mail, a wrong password and a deactivated account: the reply must not tell which. */
export async function verifyCredentials(email: string, password: string): Promise<UserDTO | null> {
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  const ok = await checkPassword(password, user?.passwordHash ?? null);
  return ok && user?.active ? toUserDTO(user) : null;
}

export async function findActiveUser(id: number): Promise<UserDTO | null> {
  const user = await User.findByPk(id);
  return user?.active ? toUserDTO(user) : null;
}

/** Ends every session of a user, except optionally the one making the request. */
export async function endSessions(userId: number, exceptSid?: string): Promise<void> {
  const sessions = await Session.findAll({ where: { userId } });
  await Promise.all(sessions.filter((s) => s.sid !== exceptSid).map((s) => s.destroy()));
}
