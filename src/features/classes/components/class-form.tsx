import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import * as z from 'zod/mini';
import type { ClassCreateInput, ClassDTO } from '@shared/schemas/class';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { showFieldErrors } from '@/features/auth/components/field-errors';
import { useClassFormOptions } from '../api/get-classes';

const Day = z.iso.date('Enter a date.');
const ClassForm = z
  .object({
    name: z
      .string()
      .check(z.trim(), z.minLength(2, 'Give the class a name of at least 2 characters.'), z.maxLength(120)),
    courseId: z.coerce.number<string>().check(z.int(), z.positive('Choose a course.')),
    startsOn: Day,
    endsOn: Day,
    capacity: z.coerce
      .number<string>()
      .check(z.int('Whole apprentices only.'), z.gte(1, 'Room for at least 1 apprentice.'), z.lte(500)),
    mentorIds: z.array(z.number()),
    // Asked in hours, as a workshop says it; stored in minutes.
    requiredHoursPerWeek: z.string().check(
      z.trim(),
      z.refine(
        (v) => v === '' || (/^\d+(\.\d+)?$/.test(v) && Number(v) > 0 && Number(v) <= 168),
        'Give the hours a week (for example 12), or leave it empty.',
      ),
    ),
  })
  .check(
    z.refine((v) => v.endsOn >= v.startsOn, { path: ['endsOn'], message: 'The class cannot end before it starts.' }),
  );
type FormIn = z.input<typeof ClassForm>;

const FIELDS = ['name', 'courseId', 'startsOn', 'endsOn', 'capacity', 'mentorIds'] as const;

interface Props {
  initial?: ClassDTO;
  submitLabel: string;
  busy: boolean;
  error: unknown;
  onSubmit: (input: ClassCreateInput, setServerErrors: (err: unknown) => boolean) => void;
  onCancel?: () => void;
}

/** Create or edit a class: name, course, dates, capacity and mentors in one form. */
export function ClassFormFields({ initial, submitLabel, busy, error, onSubmit, onCancel }: Props) {
  const options = useClassFormOptions();
  const { register, handleSubmit, control, setError, formState } = useForm<FormIn, unknown, z.output<typeof ClassForm>>(
    {
      resolver: zodResolver(ClassForm),
      defaultValues: {
        name: initial?.name ?? '',
        courseId: initial ? String(initial.course.id) : '',
        startsOn: initial?.startsOn ?? '',
        endsOn: initial?.endsOn ?? '',
        capacity: initial ? String(initial.capacity) : '12',
        mentorIds: initial?.mentors.map((m) => m.id) ?? [],
        requiredHoursPerWeek:
          initial?.requiredMinutesPerWeek != null
            ? String(Math.round((initial.requiredMinutesPerWeek / 60) * 100) / 100)
            : '',
      },
    },
  );
  const { errors } = formState;
  if (options.isPending) return <Loading label="Loading courses and mentors…" />;
  if (options.error) return <ErrorNotice error={options.error} />;
  const { courses, mentors } = options.data;

  return (
    <form
      noValidate
      className="space-y-4"
      onSubmit={handleSubmit(({ requiredHoursPerWeek, ...values }) =>
        onSubmit(
          {
            ...values,
            requiredMinutesPerWeek: requiredHoursPerWeek === '' ? null : Math.round(Number(requiredHoursPerWeek) * 60),
          },
          (err) => showFieldErrors(err, [...FIELDS], setError),
        ),
      )}
    >
      <div className="grid gap-4 md:grid-cols-2">
        <TextField
          label="Class name"
          placeholder="Autumn Bench 2026"
          error={errors.name?.message}
          {...register('name')}
        />
        <SelectField label="Course" error={errors.courseId?.message} {...register('courseId')}>
          <option value="">Choose a course…</option>
          {courses.map((c) => (
            <option key={c.id} value={c.id}>
              {c.title}
            </option>
          ))}
        </SelectField>
        <TextField label="Starts on" type="date" error={errors.startsOn?.message} {...register('startsOn')} />
        <TextField label="Ends on" type="date" error={errors.endsOn?.message} {...register('endsOn')} />
        <TextField
          label="Capacity (apprentices)"
          type="number"
          inputMode="numeric"
          min={1}
          className="num"
          hint="Open invitations hold a seat until they are accepted or run out."
          error={errors.capacity?.message}
          {...register('capacity')}
        />
        <TextField
          label="Bench time asked per week (hours)"
          inputMode="decimal"
          className="num"
          hint="Leave empty if the class asks for none. The record shows each apprentice's hours against it."
          error={errors.requiredHoursPerWeek?.message}
          {...register('requiredHoursPerWeek')}
        />
      </div>
      <Controller
        control={control}
        name="mentorIds"
        render={({ field }) => (
          <fieldset className="space-y-1">
            <legend className="text-sm font-semibold text-ink">Mentors</legend>
            {mentors.length === 0 && (
              <p className="text-sm text-muted">
                No mentor accounts yet: give someone the mentor role on the People page.
              </p>
            )}
            <div className="flex flex-wrap gap-x-6">
              {mentors.map((m) => (
                <label key={m.id} className="flex min-h-11 items-center gap-2">
                  <input
                    type="checkbox"
                    className="size-5 accent-steel"
                    checked={field.value.includes(m.id)}
                    onChange={(e) =>
                      field.onChange(
                        e.target.checked ? [...field.value, m.id] : field.value.filter((id) => id !== m.id),
                      )
                    }
                  />
                  {m.name}
                </label>
              ))}
            </div>
            {errors.mentorIds && (
              <p className="text-sm text-error" role="alert">
                {errors.mentorIds.message}
              </p>
            )}
          </fieldset>
        )}
      />
      {error != null && !Object.keys(errors).length && <ErrorNotice error={error} title="The class was not saved" />}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={busy}>
          {submitLabel}
        </Button>
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
