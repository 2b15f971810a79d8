import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { LoginInput } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useSignIn } from '../api/sign-in';

export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const { register, handleSubmit, formState } = useForm<LoginInput>({ resolver: zodResolver(LoginInput) });
  const error = signIn.error;
  return (
    <form noValidate onSubmit={handleSubmit((input) => signIn.mutate(input, { onSuccess: onSignedIn }))} className="space-y-4">
      <TextField label="E-mail" type="email" autoComplete="username" error={formState.errors.email?.message} {...register('email')} />
      <TextField label="Password" type="password" autoComplete="current-password" error={formState.errors.password?.message} {...register('password')} />
      {error && <ErrorNotice error={error} title={signInErrorTitle(error)} />}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button type="submit" busy={signIn.isPending}>
          Sign in
        </Button>
        <Link to={paths.forgotPassword} className="text-sm">
          Forgotten your password?
        </Link>
      </div>
    </form>
  );
}

function signInErrorTitle(error: Error): string {
  if (error instanceof ApiError && error.status === 429) {
    const minutes = Math.ceil((error.retryAfterSeconds ?? 900) / 60);
    return `Too many attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
  }
  return 'Could not sign in';
}
