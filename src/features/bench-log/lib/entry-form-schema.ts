import * as z from 'zod/mini';
import { LogDate, MAX_DAY_MINUTES, localToday, type LogEntryDTO } from '@shared/schemas/log-entry';

/** What the form holds: text as typed (so an empty box is allowed while typing); turned into the API's input on save. */
const wholeNumber = (max: number, what: string) =>
  z.string().check(
    z.trim(),
    z.refine((s) => s === '' || (/^\d+$/.test(s) && Number(s) <= max), `${what}: a whole number up to ${max}.`),
  );

export const EntryFormSchema = z
  .object({
    date: LogDate.check(z.refine((d) => d <= localToday(), 'The date cannot be in the future.')),
    hours: wholeNumber(24, 'Hours'),
    minutes: wholeNumber(59, 'Minutes'),
    title: z
      .string()
      .check(
        z.trim(),
        z.minLength(1, 'Give the entry a title.'),
        z.maxLength(120, 'Keep the title under 120 characters.'),
      ),
    notes: z.string().check(z.maxLength(20_000, 'Keep the notes under 20 000 characters.')),
    lessonId: z.string(),
    measurements: z.array(
      z.object({
        name: z.string().check(z.trim(), z.minLength(1, 'Say what was measured.'), z.maxLength(80)),
        // A comma is accepted as the decimal mark, as many benches write it.
        value: z.string().check(
          z.trim(),
          z.refine((s) => s !== '' && Number.isFinite(Number(s.replace(',', '.'))), 'Enter the value as a number.'),
        ),
        unit: z.string().check(z.trim(), z.minLength(1, 'Give a unit (mm, µm, N …).'), z.maxLength(20)),
      }),
    ),
    calculationIds: z.array(z.number()),
  })
  .check(
    z.superRefine((v, ctx) => {
      const total = Number(v.hours || 0) * 60 + Number(v.minutes || 0);
      if (total < 1) ctx.addIssue({ code: 'custom', path: ['minutes'], message: 'Log at least 1 minute.' });
      if (total > MAX_DAY_MINUTES)
        ctx.addIssue({ code: 'custom', path: ['minutes'], message: 'One date holds at most 24 h.' });
    }),
  );
export type EntryFormValues = z.infer<typeof EntryFormSchema>;

export const totalMinutes = (v: Pick<EntryFormValues, 'hours' | 'minutes'>) =>
  Number(v.hours || 0) * 60 + Number(v.minutes || 0);

export const splitMinutes = (total: number) => ({ hours: String(Math.floor(total / 60)), minutes: String(total % 60) });

export function emptyEntry(): EntryFormValues {
  return {
    date: localToday(),
    hours: '',
    minutes: '',
    title: '',
    notes: '',
    lessonId: '',
    measurements: [],
    calculationIds: [],
  };
}

export function entryToForm(e: LogEntryDTO): EntryFormValues {
  return {
    date: e.date,
    ...splitMinutes(e.minutes),
    title: e.title,
    notes: e.notes,
    lessonId: e.lesson ? String(e.lesson.id) : '',
    measurements: e.measurements.map((m) => ({ name: m.name, value: String(m.value), unit: m.unit })),
    calculationIds: e.calculations.map((c) => c.id),
  };
}

/** The API's body: every field, so that an edit replaces the lists as the form shows them. */
export function formToInput(v: EntryFormValues, uploadIds: number[]) {
  return {
    date: v.date,
    minutes: totalMinutes(v),
    title: v.title.trim(),
    notes: v.notes,
    lessonId: v.lessonId ? Number(v.lessonId) : null,
    measurements: v.measurements.map((m) => ({
      name: m.name.trim(),
      value: Number(m.value.trim().replace(',', '.')),
      unit: m.unit.trim(),
    })),
    uploadIds,
    calculationIds: v.calculationIds,
  };
}
