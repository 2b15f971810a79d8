import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import * as z from 'zod/mini';
import { AcceptInvitationInput, type InvitationPreview } from '@shared/schemas/invitation';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { showFieldErrors } from '@/features/auth/components/field-errors';
import { NewPasswordFields, withRepeat } from '@/features/auth/components/new-password-fields';
import { useAcceptInvitation } from '../api/accept-invitation';

const AcceptForm = withRepeat(AcceptInvitationInput, 'password');
type AcceptForm = z.infer<typeof AcceptForm>;

/** Name and a password: all a new apprentice needs; the e-mail address is the one the invitation went to. */
export function AcceptInvitationForm({
  token,
  invitation,
  onAccepted,
}: {
  token: string;
  invitation: InvitationPreview;
  onAccepted: () => void;
}) {
  const accept = useAcceptInvitation(token);
  const { register, handleSubmit, setError, formState } = useForm<AcceptForm>({
    resolver: zodResolver(AcceptForm),
    defaultValues: { name: invitation.name ?? '' },
  });
  const { errors } = formState;
  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit(({ name, password }) =>
        accept.mutate(
          { name, password },
          { onSuccess: onAccepted, onError: (err) => showFieldErrors(err, ['name', 'password'], setError) },
        ),
      )}
    >
      <TextField label="E-mail" value={invitation.email} readOnly autoComplete="username" />
      <TextField
        label="Your name"
        autoComplete="name"
        hint="As your mentors will see it."
        error={errors.name?.message}
        {...register('name')}
      />
      <NewPasswordFields
        label="Choose a password"
        repeatLabel="Password again"
        password={register('password')}
        repeat={register('repeat')}
        passwordError={errors.password?.message}
        repeatError={errors.repeat?.message}
      />
      {accept.error && !errors.password && !errors.name && (
        <ErrorNotice error={accept.error} title="Could not accept the invitation" />
      )}
      <Button type="submit" busy={accept.isPending}>
        Accept and start
      </Button>
    </form>
  );
}
