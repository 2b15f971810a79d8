import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import * as z from 'zod/mini';
import { PasswordChangeInput } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useChangePassword } from '../api/account';
import { showFieldErrors } from './field-errors';
import { NewPasswordFields, withRepeat } from './new-password-fields';

const ChangeForm = withRepeat(PasswordChangeInput, 'newPassword');
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
      <NewPasswordFields
        password={register('newPassword')}
        repeat={register('repeat')}
        passwordError={errors.newPassword?.message}
        repeatError={errors.repeat?.message}
      />
      {change.isError && !placedOnFields && <ErrorNotice error={change.error} title="Password not changed" />}
      <Button type="submit" busy={change.isPending}>
        Change password
      </Button>
    </form>
  );
}
