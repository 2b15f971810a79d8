import type { UserDTO, UserListItem, UserUpdateInput } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { endSessions } from '../auth/auth.service';
import { toUserDTO } from '../auth/user.mapper';
import { User } from '../auth/user.model';

/**
 * The admin changes someone's role or switches the account off. Nobody does either to themselves, so the guild
 * office can never lock itself out. A deactivated account's sessions end at once; a new role applies from the next
 * request, since every request reads the user afresh.
 */
export async function updateUser(id: number, input: UserUpdateInput, actor: UserDTO): Promise<UserListItem> {
  const user = await User.sequelize!.transaction(async (transaction) => {
    const user = await User.findByPk(id, { transaction });
    if (!user) throw AppError.notFound('That account');
    const roleChange = input.role !== undefined && input.role !== user.role;
    const activeChange = input.active !== undefined && input.active !== user.active;
    if (user.id === actor.id && (roleChange || activeChange)) {
      throw AppError.conflict(
        'You cannot change your own role or deactivate yourself; ask another guild office admin.',
      );
    }
    const target = { type: 'user', id: user.id, label: user.email } as const;
    if (roleChange) {
      await recordAudit(actor.id, 'user.role-changed', target, { from: user.role, to: input.role }, transaction);
      await user.update({ role: input.role! }, { transaction });
    }
    if (activeChange) {
      await user.update({ active: input.active! }, { transaction });
      await recordAudit(actor.id, input.active ? 'user.reactivated' : 'user.deactivated', target, {}, transaction);
    }
    return user;
  });
  if (!user.active) await endSessions(user.id);
  return { ...toUserDTO(user), active: user.active, createdAt: user.createdAt.toISOString() };
}
