import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import * as z from 'zod/mini';
import { DisplayName, UnitSystem, type UserDTO } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useUpdateAccount } from '../api/account';
import { showFieldErrors } from './field-errors';

const ProfileForm = z.object({ name: DisplayName, unitSystem: UnitSystem });
type ProfileForm = z.infer<typeof ProfileForm>;

const UNIT_CHOICES = [
  { value: 'metric', label: 'Metric', hint: 'millimetres, grams, °C' },
  { value: 'imperial', label: 'Imperial', hint: 'inches, ounces, °F' },
] as const;

export function AccountProfileForm({ user }: { user: UserDTO }) {
  const update = useUpdateAccount();
  const { register, handleSubmit, setError, formState } = useForm<ProfileForm>({
    resolver: zodResolver(ProfileForm),
    defaultValues: { name: user.name, unitSystem: user.unitSystem },
  });
  const submit = handleSubmit((input) =>
    update.mutate(input, {
      onSuccess: () => toast.success('Your account is saved.'),
      onError: (err) => showFieldErrors(err, ['name', 'unitSystem'], setError),
    }),
  );
  return (
    <form noValidate onSubmit={submit} className="space-y-5">
      <TextField label="Name" autoComplete="name" error={formState.errors.name?.message} {...register('name')} />
      <fieldset>
        <legend className="text-sm font-semibold text-ink">Units at the bench</legend>
        <p className="text-sm text-muted">Calculators open in these units.</p>
        <div className="mt-2 flex flex-wrap gap-3">
          {UNIT_CHOICES.map((c) => (
            <label
              key={c.value}
              className="flex min-h-11 cursor-pointer items-center gap-3 rounded-md border border-rule bg-white px-4 py-2 has-checked:border-steel"
            >
              <input type="radio" value={c.value} className="size-4 accent-steel" {...register('unitSystem')} />
              <span>
                <span className="font-semibold">{c.label}</span> <span className="text-sm text-muted">({c.hint})</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      {update.isError && !formState.errors.name && <ErrorNotice error={update.error} title="Not saved" />}
      <Button type="submit" busy={update.isPending}>
        Save
      </Button>
    </form>
  );
}
