import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { AcceptInvitationInput, type InvitationPreview } from '@shared/schemas/invitation';
import { PASSWORD_MIN } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { showFieldErrors } from '@/features/auth/components/field-errors';
import { useAcceptInvitation } from '../api/accept-invitation';

const AcceptForm = AcceptInvitationInput.extend({ repeat: z.string() }).refine((v) => v.repeat === v.password, {
  path: ['repeat'],
  message: 'The two passwords are not the same.',
});
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
      <TextField
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="Password again"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...register('repeat')}
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
