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

export const Email = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address.'));

export const PASSWORD_MIN = 10;
export const NewPassword = z.string().min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`).max(200);

export const LoginInput = z.object({
  email: Email,
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type LoginInput = z.infer<typeof LoginInput>;

export const MeReply = z.object({ user: UserDTO });
export type MeReply = z.infer<typeof MeReply>;
