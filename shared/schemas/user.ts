import * as z from 'zod/mini';
import { emptyAsAbsent, QueryPage } from './query';

// Every schema in shared/schemas uses zod's light form: the client parses each API reply with them on its first
// screen, where the full form would cost tens of kilobytes of JavaScript (see DEVELOPERS.md, "Measure").

export const ROLES = ['apprentice', 'mentor', 'admin'] as const;
export const Role = z.enum(ROLES);
export type Role = z.infer<typeof Role>;

export const UnitSystem = z.enum(['metric', 'imperial']);
export type UnitSystem = z.infer<typeof UnitSystem>;

export const UserDTO = z.object({
  id: z.int(),
  name: z.string(),
  email: z.string(),
  role: Role,
  unitSystem: UnitSystem,
});
export type UserDTO = z.infer<typeof UserDTO>;

export const Email = z.pipe(z.string().check(z.trim(), z.toLowerCase()), z.email('Enter a valid e-mail address.'));

export const PASSWORD_MIN = 10;
export const NewPassword = z
  .string()
  .check(z.minLength(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`), z.maxLength(200));

export const LoginInput = z.object({
  email: Email,
  password: z.string().check(z.minLength(1, 'Enter your password.'), z.maxLength(200)),
});
export type LoginInput = z.infer<typeof LoginInput>;

export const MeReply = z.object({ user: UserDTO });
export type MeReply = z.infer<typeof MeReply>;

export const PasswordResetRequest = z.object({ email: Email });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequest>;

export const PasswordResetInput = z.object({ password: NewPassword });
export type PasswordResetInput = z.infer<typeof PasswordResetInput>;

export const DisplayName = z
  .string()
  .check(z.trim(), z.minLength(1, 'Enter your name.'), z.maxLength(100, 'Keep the name under 100 characters.'));

export const AccountUpdateInput = z.object({ name: z.optional(DisplayName), unitSystem: z.optional(UnitSystem) });
export type AccountUpdateInput = z.infer<typeof AccountUpdateInput>;

export const PasswordChangeInput = z.object({
  currentPassword: z.string().check(z.minLength(1, 'Enter your current password.'), z.maxLength(200)),
  newPassword: NewPassword,
});
export type PasswordChangeInput = z.infer<typeof PasswordChangeInput>;

export const USERS_PAGE_SIZE = 20;

export const UserListQuery = z.object({
  q: z.optional(z.string().check(z.trim(), z.maxLength(100))),
  role: emptyAsAbsent(Role),
  page: QueryPage(10_000),
});
export type UserListQuery = z.infer<typeof UserListQuery>;

export const UserListItem = z.extend(UserDTO, { active: z.boolean(), createdAt: z.iso.datetime() });
export type UserListItem = z.infer<typeof UserListItem>;

export const UserListReply = z.object({ users: z.array(UserListItem), total: z.int() });
export type UserListReply = z.infer<typeof UserListReply>;

export const DevMailReply = z.object({ inboxUrl: z.nullable(z.string()) });
export type DevMailReply = z.infer<typeof DevMailReply>;

export const PasswordResetRequested = z.object({ message: z.string() });
export type PasswordResetRequested = z.infer<typeof PasswordResetRequested>;

/** The guild office's changes to an account: its role, and whether it may sign in at all. */
export const UserUpdateInput = z
  .object({ role: z.optional(Role), active: z.optional(z.boolean()) })
  .check(z.refine((v) => v.role !== undefined || v.active !== undefined, 'Give a role or an active flag to change.'));
export type UserUpdateInput = z.infer<typeof UserUpdateInput>;
