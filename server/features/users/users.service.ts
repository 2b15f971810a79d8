import { col, fn, Op, where, type WhereOptions } from 'sequelize';
import { USERS_PAGE_SIZE, type UserListItem, type UserListQuery, type UserListReply } from '@shared/schemas/user';
import { toUserDTO } from '../auth/user.mapper';
import { User } from '../auth/user.model';

const toUserListItem = (u: User): UserListItem => ({
  ...toUserDTO(u),
  active: u.active,
  createdAt: u.createdAt.toISOString(),
});

/** Every account, for the guild office: filtered by role, searched in name and e-mail, a page of 20 at a time. */
export async function listUsers({ q, role, page }: UserListQuery): Promise<UserListReply> {
  const conditions: WhereOptions<User>[] = [];
  if (role) conditions.push({ role });
  if (q) {
    // instr() rather than LIKE, so that % and _ typed in the search box are matched literally.
    const needle = q.toLowerCase();
    conditions.push({
      [Op.or]: [
        where(fn('instr', fn('lower', col('name')), needle), Op.gt, 0),
        where(fn('instr', col('email'), needle), Op.gt, 0),
      ],
    });
  }
  const { rows, count } = await User.findAndCountAll({
    where: { [Op.and]: conditions },
    order: [
      ['name', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: USERS_PAGE_SIZE,
    offset: (page - 1) * USERS_PAGE_SIZE,
  });
  return { users: rows.map(toUserListItem), total: count };
}
