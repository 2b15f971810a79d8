import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { PASSWORD_MIN, PasswordChangeInput } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useChangePassword } from '../api/account';
import { showFieldErrors } from './field-errors';

const ChangeForm = PasswordChangeInput.extend({ repeat: z.string() }).refine((v) => v.repeat === v.newPassword, {
  path: ['repeat'],
  message: 'The two new passwords are not the same.',
});
type ChangeForm = z.infer<typeof ChangeForm>;

export function PasswordChangeForm() {
  const change = useChangePassword();
  const { register, handleSubmit, setError, reset, formState } = useForm<ChangeForm>({
    resolver: zodResolver(ChangeForm),
  });
  const { errors } = formState;
  const submit = handleSubmit(({ currentPassword, newPassword }) =>
    change.mutate(
      { currentPassword, newPassword },
      {
        onSuccess: () => {
          reset();
          toast.success('Password changed. Anywhere else you were signed in has been signed out.');
        },
        onError: (err) => showFieldErrors(err, ['currentPassword', 'newPassword'], setError),
      },
    ),
  );
  const placedOnFields = errors.currentPassword || errors.newPassword;
  return (
    <form noValidate onSubmit={submit} className="space-y-4">
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...register('repeat')}
      />
      {change.isError && !placedOnFields && <ErrorNotice error={change.error} title="Password not changed" />}
      <Button type="submit" busy={change.isPending}>
        Change password
      </Button>
    </form>
  );
}
