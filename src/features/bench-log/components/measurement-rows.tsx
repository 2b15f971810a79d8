import { Plus, Trash2 } from 'lucide-react';
import { useFieldArray, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import { MAX_MEASUREMENTS } from '@shared/schemas/log-entry';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import type { EntryFormValues } from '../lib/entry-form-schema';

/** What was measured, the value and its unit: one row each, added and removed freely. */
export function MeasurementRows({
  control,
  register,
  errors,
}: {
  control: Control<EntryFormValues>;
  register: UseFormRegister<EntryFormValues>;
  errors: FieldErrors<EntryFormValues>;
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'measurements' });
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-ink">Measurements</legend>
      {fields.length === 0 && (
        <p className="text-sm text-muted">None yet. Add the readings you took, each with its unit.</p>
      )}
      {fields.map((field, i) => {
        const rowErrors = errors.measurements?.[i];
        return (
          <div key={field.id} className="grid grid-cols-[1fr_7rem_5rem_auto] items-start gap-2">
            <TextField
              label={`What (row ${i + 1})`}
              placeholder="end shake"
              error={rowErrors?.name?.message}
              {...register(`measurements.${i}.name`)}
            />
            <TextField
              label="Value"
              inputMode="decimal"
              className="num"
              placeholder="0.15"
              error={rowErrors?.value?.message}
              {...register(`measurements.${i}.value`)}
            />
            <TextField
              label="Unit"
              placeholder="mm"
              error={rowErrors?.unit?.message}
              {...register(`measurements.${i}.unit`)}
            />
            <Button
              variant="quiet"
              className="mt-6"
              onClick={() => remove(i)}
              aria-label={`Remove measurement ${i + 1}`}
            >
              <Trash2 className="size-4" aria-hidden />
            </Button>
          </div>
        );
      })}
      {fields.length < MAX_MEASUREMENTS && (
        <Button variant="secondary" onClick={() => append({ name: '', value: '', unit: 'mm' })}>
          <Plus className="size-4" aria-hidden />
          Add a measurement
        </Button>
      )}
      {errors.measurements?.message && (
        <p role="alert" className="text-sm font-medium text-error">
          {errors.measurements.message}
        </p>
      )}
    </fieldset>
  );
}
