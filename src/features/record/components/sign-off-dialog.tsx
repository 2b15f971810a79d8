import { useEffect, useId, useRef, useState } from 'react';
import type { RecordSkill } from '@shared/schemas/record';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useSignOff } from '../api/record-actions';
import { KIND_LABEL, shortDay } from './evidence-list';

interface Props {
  apprentice: { id: number; name: string };
  courseId: number;
  skill: RecordSkill;
  onClose: () => void;
}

const keyOf = (e: { kind: string; id: number }) => `${e.kind}:${e.id}`;

/**
 * The mentor picks the evidence they judged (the passed pieces are ticked to start with) and says in a line what
 * they saw. A modal: focus starts on the first choice, Escape or "Cancel" closes it and focus goes back to the
 * button that opened it.
 */
export function SignOffDialog({ apprentice, courseId, skill, onClose }: Props) {
  const titleId = useId();
  const box = useRef<HTMLDivElement>(null);
  const [chosen, setChosen] = useState(
    () => new Set(skill.evidence.filter((e) => e.kind === 'submission' && e.outcome === 'passed').map(keyOf)),
  );
  const [note, setNote] = useState('');
  const signOff = useSignOff(apprentice.id);
  const fields = signOff.error instanceof ApiError ? signOff.error.fields : undefined;

  useEffect(() => {
    const opener = document.activeElement as HTMLElement | null;
    box.current?.querySelector<HTMLElement>('input, textarea, button')?.focus();
    return () => opener?.focus();
  }, []);

  const toggle = (key: string) =>
    setChosen((now) => {
      const next = new Set(now);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });

  const submit = () =>
    signOff.mutate(
      {
        courseId,
        skillKey: skill.key,
        note: note.trim(),
        evidence: skill.evidence.filter((e) => chosen.has(keyOf(e))).map((e) => ({ kind: e.kind, id: e.id })),
      },
      { onSuccess: onClose },
    );

  return (
    <div className="fixed inset-0 z-40 flex items-center justify-center bg-ink/40 p-4">
      <div
        ref={box}
        role="dialog"
        aria-modal="true"
        aria-labelledby={titleId}
        className="max-h-[90vh] w-full max-w-xl overflow-y-auto rounded-lg border border-rule bg-card p-6 shadow-lg"
        onKeyDown={(e) => {
          if (e.key === 'Escape') onClose();
        }}
      >
        <h2 id={titleId} className="font-serif text-2xl font-semibold">
          Sign off “{skill.label}” for {apprentice.name}
        </h2>
        <p className="mt-2 text-sm text-muted">Standard: {skill.standard}</p>
        <form
          className="mt-4 space-y-4"
          noValidate
          onSubmit={(e) => {
            e.preventDefault();
            submit();
          }}
        >
          <fieldset className="space-y-1">
            <legend className="text-sm font-semibold">Evidence you judged (at least one passed piece)</legend>
            {skill.evidence.map((e) => (
              <label key={keyOf(e)} className="flex min-h-11 items-center gap-3">
                <input
                  type="checkbox"
                  className="size-5 accent-steel"
                  checked={chosen.has(keyOf(e))}
                  onChange={() => toggle(keyOf(e))}
                />
                <span>
                  {KIND_LABEL[e.kind]}: {e.title}{' '}
                  <span className="text-muted">
                    · {shortDay(e.date)}
                    {e.outcome && ` · ${e.outcome}`}
                  </span>
                </span>
              </label>
            ))}
            {fields?.evidence && <p className="text-sm text-error">{fields.evidence[0]}</p>}
          </fieldset>
          <TextArea
            label="Note for the record"
            hint="What you saw that meets the standard, in a line or two. The apprentice reads it."
            rows={3}
            value={note}
            error={fields?.note?.[0]}
            onChange={(e) => setNote(e.target.value)}
          />
          {signOff.error && !fields && <ErrorNotice error={signOff.error} title="Not signed off" />}
          <div className="flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={onClose}>
              Cancel
            </Button>
            <Button type="submit" busy={signOff.isPending} disabled={chosen.size === 0 || note.trim() === ''}>
              Sign off
            </Button>
          </div>
        </form>
      </div>
    </div>
  );
}
