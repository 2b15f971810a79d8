import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import * as z from 'zod/mini';
import { NewPassword } from '@shared/schemas/user';
import { Button, ButtonLink } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useResetLinkCheck, useResetPassword } from '../api/password-reset';
import { showFieldErrors } from './field-errors';
import { NewPasswordFields, withRepeat } from './new-password-fields';

const ResetForm = withRepeat(z.object({ password: NewPassword }), 'password');
type ResetForm = z.infer<typeof ResetForm>;

export function ResetPasswordForm({ token }: { token: string }) {
  const resetPassword = useResetPassword(token);
  const linkCheck = useResetLinkCheck(token);
  const { register, handleSubmit, setError, formState } = useForm<ResetForm>({ resolver: zodResolver(ResetForm) });
  const { errors } = formState;
  // Only a spent link matters before sending; any other trouble with the check is left to the send to report.
  const spentOnArrival = linkCheck.error instanceof ApiError && linkCheck.error.status === 410 ? linkCheck.error : null;
  const error = resetPassword.error ?? spentOnArrival;

  if (resetPassword.isSuccess) {
    return (
      <div role="status" className="space-y-4">
        <p className="font-semibold text-ink">Your new password is set.</p>
        <p className="text-muted">
          For safety, every place you were signed in has been signed out. Sign in again with the new password.
        </p>
        <ButtonLink to={paths.signIn()}>Sign in</ButtonLink>
      </div>
    );
  }
  if (error instanceof ApiError && error.status === 410) {
    return (
      <div className="space-y-4">
        <ErrorNotice error={error} title="This link no longer works" />
        <ButtonLink to={paths.forgotPassword}>Ask for a new link</ButtonLink>
      </div>
    );
  }
  return (
    <form
      noValidate
      onSubmit={handleSubmit(({ password }) =>
        resetPassword.mutate({ password }, { onError: (err) => showFieldErrors(err, ['password'], setError) }),
      )}
      className="space-y-4"
    >
      <NewPasswordFields
        password={register('password')}
        repeat={register('repeat')}
        passwordError={errors.password?.message}
        repeatError={errors.repeat?.message}
      />
      {error && !errors.password && <ErrorNotice error={error} title="Password not set" />}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button type="submit" busy={resetPassword.isPending}>
          Set new password
        </Button>
        <Link to={paths.signIn()} className="text-sm">
          Back to sign-in
        </Link>
      </div>
    </form>
  );
}
