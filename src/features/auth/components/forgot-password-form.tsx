import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import * as z from 'zod/mini';
import { PasswordResetRequest } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useRequestPasswordReset } from '../api/password-reset';

type FormInput = z.input<typeof PasswordResetRequest>;

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const { register, handleSubmit, formState } = useForm<FormInput, unknown, PasswordResetRequest>({
    resolver: zodResolver(PasswordResetRequest),
  });
  if (request.isSuccess) {
    return (
      <div role="status" className="space-y-2">
        <p className="font-semibold text-ink">Check your inbox</p>
        <p className="text-muted">{request.data.message}</p>
      </div>
    );
  }
  return (
    <form noValidate onSubmit={handleSubmit((input) => request.mutate(input))} className="space-y-4">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        hint="The address you sign in with."
        error={formState.errors.email?.message}
        {...register('email')}
      />
      {request.isError && <ErrorNotice error={request.error} title="Could not send the e-mail" />}
      <Button type="submit" busy={request.isPending}>
        Send me a link
      </Button>
    </form>
  );
}
