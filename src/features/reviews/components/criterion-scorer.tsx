import { SCORE_WORDS } from '@shared/grading/score';
import type { ProjectCriterion } from '@shared/schemas/content';

/** One criterion scored 0 to 4, each choice showing the scale word and what that score looks like for this criterion. */
export function CriterionScorer({
  criterion,
  value,
  onChange,
  totalWeight,
}: {
  criterion: ProjectCriterion;
  value: number | undefined;
  onChange: (score: number) => void;
  totalWeight: number;
}) {
  return (
    <fieldset className="rounded-lg border border-rule bg-card p-3">
      <legend className="px-1 font-serif text-lg font-semibold">
        {criterion.label}{' '}
        <span className="font-sans text-sm font-normal text-muted">
          weight <span className="num">{criterion.weight}</span> of <span className="num">{totalWeight}</span>
        </span>
      </legend>
      <div className="mt-1 space-y-1">
        {criterion.scores.map((meaning, score) => (
          <label
            key={score}
            className={`flex min-h-11 cursor-pointer items-start gap-3 rounded-md border px-3 py-2 text-sm ${value === score ? 'border-steel bg-steel/10' : 'border-transparent hover:bg-rule/30'}`}
          >
            <input
              type="radio"
              name={`score-${criterion.key}`}
              value={score}
              checked={value === score}
              onChange={() => onChange(score)}
              className="mt-0.5 size-5 shrink-0 accent-steel"
            />
            <span>
              <span className="font-semibold">
                <span className="num">{score}</span> {SCORE_WORDS[score]}
              </span>
              <span className="block text-muted">{meaning}</span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
