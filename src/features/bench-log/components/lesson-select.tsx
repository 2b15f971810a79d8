import type { Ref, SelectHTMLAttributes } from 'react';
import { SelectField } from '@/components/ui/field';
import { useLessonGroups } from '../api/get-attach-options';

type Props = SelectHTMLAttributes<HTMLSelectElement> & {
  error?: string;
  hint?: string;
  /** What the empty choice means here: no lesson for an entry, every lesson for a filter. */
  emptyLabel?: string;
  ref?: Ref<HTMLSelectElement>;
};

/** A lesson, grouped by course. */
export function LessonSelect({ error, hint, emptyLabel = 'No lesson (general bench work)', ...rest }: Props) {
  const { data, error: loadError } = useLessonGroups();
  return (
    <SelectField
      label="Lesson"
      error={error ?? (loadError ? 'The lessons could not be loaded; reload the page to choose one.' : undefined)}
      hint={hint}
      {...rest}
    >
      <option value="">{emptyLabel}</option>
      {data?.map((g) => (
        <optgroup key={g.course.id} label={g.course.title}>
          {g.lessons.map((l) => (
            <option key={l.id} value={String(l.id)}>
              {l.position}. {l.title}
            </option>
          ))}
        </optgroup>
      ))}
    </SelectField>
  );
}
