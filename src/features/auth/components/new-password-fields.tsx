import type { UseFormRegisterReturn } from 'react-hook-form';
import * as z from 'zod/mini';
import { PASSWORD_MIN } from '@shared/schemas/user';
import { TextField } from '@/components/ui/field';

/**
 * A form schema with a "type it again" field that must match `field`: every form that sets a password asks for it
 * twice, so a typing slip cannot lock anyone out.
 */
export function withRepeat<T extends z.core.$ZodLooseShape>(schema: z.ZodMiniObject<T>, field: keyof T & string) {
  return z.extend(schema, { repeat: z.string() }).check(
    z.refine((v) => (v as Record<string, unknown>).repeat === (v as Record<string, unknown>)[field], {
      path: ['repeat'],
      message: 'The two passwords are not the same.',
    }),
  );
}

interface NewPasswordFieldsProps {
  password: UseFormRegisterReturn;
  repeat: UseFormRegisterReturn;
  passwordError?: string;
  repeatError?: string;
  label?: string;
  repeatLabel?: string;
}

/** The new password with its length rule, and the same again. */
export function NewPasswordFields({
  password,
  repeat,
  passwordError,
  repeatError,
  label = 'New password',
  repeatLabel = 'New password again',
}: NewPasswordFieldsProps) {
  return (
    <>
      <TextField
        label={label}
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={passwordError}
        {...password}
      />
      <TextField label={repeatLabel} type="password" autoComplete="new-password" error={repeatError} {...repeat} />
    </>
  );
}
