import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { Controller, useForm, type Path } from 'react-hook-form';
import { toast } from 'sonner';
import { localToday, type LogEntryDTO } from '@shared/schemas/log-entry';
import { Button } from '@/components/ui/button';
import { TextArea, TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import {
  EntryFormSchema,
  emptyEntry,
  entryToForm,
  formToInput,
  splitMinutes,
  type EntryFormValues,
} from '../lib/entry-form-schema';
import { BenchTimer } from './bench-timer';
import { LessonSelect } from './lesson-select';
import { MeasurementRows } from './measurement-rows';
import { PhotoAttach, slotsFromUploads, type PhotoSlot } from './photo-attach';
import { ResultAttach } from './result-attach';

interface Props {
  userId: number;
  /** The entry being edited; without it the form makes a new entry and clears itself after saving. */
  entry?: LogEntryDTO;
  onSave: (input: ReturnType<typeof formToInput>) => Promise<LogEntryDTO>;
  onSaved?: (entry: LogEntryDTO) => void;
  onCancel?: () => void;
}

const FORM_FIELDS = new Set(['date', 'minutes', 'title', 'notes', 'lessonId', 'calculationIds']);

/** Date, time spent (typed or timed), title, Markdown notes, lesson, measurements, photos and saved results. */
export function EntryForm({ userId, entry, onSave, onSaved, onCancel }: Props) {
  const form = useForm<EntryFormValues>({
    resolver: zodResolver(EntryFormSchema),
    defaultValues: entry ? entryToForm(entry) : emptyEntry(),
  });
  const { register, control, handleSubmit, setValue, setError, reset, formState } = form;
  const { errors, isSubmitting } = formState;
  const [photos, setPhotos] = useState<PhotoSlot[]>(() => slotsFromUploads(entry?.photos ?? []));
  const [photoError, setPhotoError] = useState<string>();
  const [failure, setFailure] = useState<unknown>(null);
  const uploading = photos.some((p) => !p.upload && !p.error);
  const timeErrorId = useId();
  const timeErrors = [errors.hours?.message, errors.minutes?.message].filter((m): m is string => Boolean(m));

  const submit = handleSubmit(async (values) => {
    setFailure(null);
    setPhotoError(undefined);
    const uploadIds = photos.flatMap((p) => (p.upload ? [p.upload.id] : []));
    try {
      const saved = await onSave(formToInput(values, uploadIds));
      if (!entry) {
        reset({ ...emptyEntry(), date: values.date });
        setPhotos([]);
      }
      toast.success(entry ? 'Entry updated.' : 'Entry added to your bench log.');
      onSaved?.(saved);
    } catch (err) {
      if (!(err instanceof ApiError) || !err.fields) return setFailure(err);
      for (const [field, messages] of Object.entries(err.fields)) {
        if (field === 'uploadIds') setPhotoError(messages[0]);
        else if (FORM_FIELDS.has(field) || /^measurements\.\d+\.(name|value|unit)$/.test(field))
          setError(field as Path<EntryFormValues>, { message: messages[0] });
        else if (field === 'measurements') setError('measurements', { message: messages[0] });
      }
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-5" aria-label={entry ? 'Edit the entry' : 'New log entry'}>
      <div className="grid gap-4 sm:grid-cols-[10rem_1fr]">
        <TextField label="Date" type="date" max={localToday()} error={errors.date?.message} {...register('date')} />
        <TextField
          label="Title"
          placeholder="What you worked on"
          error={errors.title?.message}
          {...register('title')}
        />
      </div>
      <fieldset className="space-y-2">
        <legend className="text-sm font-semibold text-ink">Time spent</legend>
        <div className="flex flex-wrap items-end gap-3">
          {/* The two boxes share one error line below them, so that a message never squeezes into a narrow column. */}
          <div className="w-24">
            <TextField
              label="Hours"
              inputMode="numeric"
              className="num"
              aria-invalid={Boolean(errors.hours || errors.minutes)}
              aria-describedby={timeErrors.length ? timeErrorId : undefined}
              {...register('hours')}
            />
          </div>
          <div className="w-24">
            <TextField
              label="Minutes"
              inputMode="numeric"
              className="num"
              aria-invalid={Boolean(errors.minutes)}
              aria-describedby={timeErrors.length ? timeErrorId : undefined}
              {...register('minutes')}
            />
          </div>
          {!entry && (
            <BenchTimer
              userId={userId}
              onStop={(minutes) => {
                const parts = splitMinutes(minutes);
                setValue('hours', parts.hours, { shouldValidate: true });
                setValue('minutes', parts.minutes, { shouldValidate: true });
              }}
            />
          )}
        </div>
        {timeErrors.length > 0 && (
          <div id={timeErrorId} role="alert" className="space-y-1 text-sm font-medium text-error">
            {timeErrors.map((message) => (
              <p key={message}>{message}</p>
            ))}
          </div>
        )}
      </fieldset>
      <TextArea
        label="Notes"
        rows={5}
        hint="Markdown works: **bold**, lists with -, tables."
        error={errors.notes?.message}
        {...register('notes')}
      />
      <Controller
        control={control}
        name="lessonId"
        render={({ field }) => (
          <LessonSelect
            {...field}
            hint="Optional: the totals per course count time by lesson."
            error={errors.lessonId?.message}
          />
        )}
      />
      <MeasurementRows control={control} register={register} errors={errors} />
      <PhotoAttach slots={photos} onChange={setPhotos} error={photoError} />
      <Controller
        control={control}
        name="calculationIds"
        render={({ field }) => (
          <ResultAttach value={field.value} onChange={field.onChange} error={errors.calculationIds?.message} />
        )}
      />
      {failure !== null && <ErrorNotice error={failure} title="The entry was not saved" />}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={isSubmitting} disabled={uploading}>
          {entry ? 'Save changes' : 'Add to the log'}
        </Button>
        {uploading && <p className="self-center text-sm text-muted">Waiting for the photos to finish uploading…</p>}
        {onCancel && (
          <Button variant="quiet" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
