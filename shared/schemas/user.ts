import { z } from 'zod';

export const ROLES = ['apprentice', 'mentor', 'admin'] as const;
export const Role = z.enum(ROLES);
export type Role = z.infer<typeof Role>;

export const UnitSystem = z.enum(['metric', 'imperial']);
export type UnitSystem = z.infer<typeof UnitSystem>;

export const UserDTO = z.object({
  id: z.number().int(),
  name: z.string(),
  email: z.string(),
  role: Role,
  unitSystem: UnitSystem,
});
export type UserDTO = z.infer<typeof UserDTO>;

export const Email = z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address.'));

export const PASSWORD_MIN = 10;
export const NewPassword = z.string().min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`).max(200);

export const LoginInput = z.object({
  email: Email,
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type LoginInput = z.infer<typeof LoginInput>;

export const MeReply = z.object({ user: UserDTO });
export type MeReply = z.infer<typeof MeReply>;

export const PasswordResetRequest = z.object({ email: Email });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequest>;

export const PasswordResetInput = z.object({ password: NewPassword });
export type PasswordResetInput = z.infer<typeof PasswordResetInput>;

export const DisplayName = z.string().trim().min(1, 'Enter your name.').max(100, 'Keep the name under 100 characters.');

export const AccountUpdateInput = z.object({ name: DisplayName.optional(), unitSystem: UnitSystem.optional() });
export type AccountUpdateInput = z.infer<typeof AccountUpdateInput>;

export const PasswordChangeInput = z.object({
  currentPassword: z.string().min(1, 'Enter your current password.').max(200),
  newPassword: NewPassword,
});
export type PasswordChangeInput = z.infer<typeof PasswordChangeInput>;

export const USERS_PAGE_SIZE = 20;

export const UserListQuery = z.object({
  q: z.string().trim().max(100).optional(),
  // An empty ?role= (a cleared filter) means every role.
  role: z.preprocess((v) => (v === '' ? undefined : v), Role.optional()),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
});
export type UserListQuery = z.infer<typeof UserListQuery>;

export const UserListItem = UserDTO.extend({ active: z.boolean(), createdAt: z.iso.datetime() });
export type UserListItem = z.infer<typeof UserListItem>;

export const UserListReply = z.object({ users: z.array(UserListItem), total: z.number().int() });
export type UserListReply = z.infer<typeof UserListReply>;

export const DevMailReply = z.object({ inboxUrl: z.string().nullable() });
export type DevMailReply = z.infer<typeof DevMailReply>;

export const PasswordResetRequested = z.object({ message: z.string() });
export type PasswordResetRequested = z.infer<typeof PasswordResetRequested>;

/** The guild office's changes to an account: its role, and whether it may sign in at all. */
export const UserUpdateInput = z
  .object({ role: Role.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, 'Give a role or an active flag to change.');
export type UserUpdateInput = z.infer<typeof UserUpdateInput>;
