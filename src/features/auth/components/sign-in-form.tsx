import { useState, type FormEvent } from 'react';
import * as z from 'zod/mini';
import { Link } from 'react-router-dom';
import { LoginInput } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useSignIn } from '../api/sign-in';

/** A plain form on purpose: it is on the first screen, so it stays free of form libraries (see the bundle budget). */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const signIn = useSignIn();
  const [errors, setErrors] = useState<{ email?: string[]; password?: string[] }>({});

  function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const parsed = LoginInput.safeParse({ email: form.get('email'), password: form.get('password') });
    if (!parsed.success) {
      const fieldErrors = z.flattenError(parsed.error).fieldErrors;
      setErrors(fieldErrors);
      // Focus goes to the first field to correct, as in the other forms.
      const first = (['email', 'password'] as const).find((name) => fieldErrors[name]);
      if (first) (e.currentTarget.elements.namedItem(first) as HTMLInputElement | null)?.focus();
      return;
    }
    setErrors({});
    signIn.mutate(parsed.data, { onSuccess: onSignedIn });
  }

  return (
    <form noValidate onSubmit={submit} className="space-y-4">
      <TextField label="E-mail" name="email" type="email" autoComplete="username" error={errors.email?.[0]} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.[0]}
      />
      {signIn.error && <ErrorNotice error={signIn.error} title={signInErrorTitle(signIn.error)} />}
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
