import type { UserDTO } from '@shared/schemas/user';
import type { User } from './user.model';

export const toUserDTO = (u: User): UserDTO => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role,
  unitSystem: u.unitSystem,
});
