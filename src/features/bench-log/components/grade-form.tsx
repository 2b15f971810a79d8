import { useId, useState } from 'react';
import { SCORE_WORDS } from '@shared/grading/score';
import { GRADE_ASPECTS, GRADE_ASPECT_LABELS, type GradeAspect } from '@shared/schemas/log-entry';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/states';
import { useAddFeedback } from '../api/add-feedback';

const HINTS: Record<GradeAspect, string> = {
  completeness: 'Does the entry say what was done, how long it took and why?',
  measurements: 'Are the readings there, with units, where the work called for them?',
  photos: 'Do the photos show the work well enough to judge it?',
};

/** A mentor grades the quality of the record, 0 to 4 on each aspect, with an optional comment. */
export function GradeForm({ entryId }: { entryId: number }) {
  const { grade } = useAddFeedback(entryId);
  const [scores, setScores] = useState<Partial<Record<GradeAspect, number>>>({});
  const [comment, setComment] = useState('');
  const complete = GRADE_ASPECTS.every((a) => scores[a] !== undefined);
  const headingId = useId();

  return (
    <form
      className="space-y-4"
      aria-labelledby={headingId}
      onSubmit={(e) => {
        e.preventDefault();
        if (!complete) return;
        grade.mutate(
          { completeness: scores.completeness!, measurements: scores.measurements!, photos: scores.photos!, comment },
          {
            onSuccess: () => {
              setScores({});
              setComment('');
            },
          },
        );
      }}
    >
      <div>
        <h3 id={headingId} className="font-serif text-lg font-semibold">
          Grade this entry
        </h3>
        <p className="text-sm text-muted">
          Score each of the three, from <span className="num">0</span> not shown to <span className="num">4</span>{' '}
          exemplary; the grade is saved once all three have a score.
        </p>
      </div>
      {GRADE_ASPECTS.map((aspect) => (
        <fieldset key={aspect}>
          <legend className="font-semibold">{GRADE_ASPECT_LABELS[aspect]}</legend>
          <p className="text-sm text-muted">{HINTS[aspect]}</p>
          <div className="mt-1 flex flex-wrap gap-2">
            {SCORE_WORDS.map((word, score) => (
              <label
                key={word}
                className="inline-flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-white px-3 has-checked:border-steel has-checked:bg-steel/10"
              >
                <input
                  type="radio"
                  name={`grade-${aspect}`}
                  className="accent-steel"
                  checked={scores[aspect] === score}
                  onChange={() => setScores((s) => ({ ...s, [aspect]: score }))}
                />
                <span className="num">{score}</span> {word}
              </label>
            ))}
          </div>
        </fieldset>
      ))}
      <TextArea label="Comment with the grade" rows={3} value={comment} onChange={(e) => setComment(e.target.value)} />
      {grade.error && <ErrorNotice error={grade.error} title="The grade was not saved" />}
      <Button type="submit" busy={grade.isPending} disabled={!complete}>
        Save grade
      </Button>
    </form>
  );
}
