import { Send } from 'lucide-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { toast } from 'sonner';
import { formatScore, grade, SCORE_WORDS } from '@shared/grading/score';
import type { Outcome, SubmissionDTO, VersionDTO } from '@shared/schemas/submission';
import { Button } from '@/components/ui/button';
import { MarkdownField } from '@/components/ui/markdown-field';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useCreateReview } from '../api/create-review';
import { CriterionScorer } from './criterion-scorer';
import type { DraftPin } from './pin-board';
import { PinPanel } from './pin-panel';

/** The mentor's grading of the version waiting: pins on the photos, a score per criterion, a comment and an outcome. */
export function ReviewForm({ submission, version }: { submission: SubmissionDTO; version: VersionDTO }) {
  const navigate = useNavigate();
  const { project } = submission;
  const [pins, setPins] = useState<DraftPin[]>([]);
  const [scores, setScores] = useState<Record<string, number>>({});
  const [comment, setComment] = useState('');
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const create = useCreateReview(submission.id);
  const totalWeight = project.criteria.reduce((s, c) => s + c.weight, 0);
  const result = grade(project.criteria, scores, project.passMark);
  const unnamedPin = pins.findIndex((p) => !p.note.trim());
  const chosen = outcome === 'passed' && !result.canPass ? null : outcome;

  const problem =
    result.missing.length > 0
      ? `Score every criterion (${result.missing.length} left).`
      : unnamedPin >= 0
        ? `Write a note for pin ${unnamedPin + 1}.`
        : !chosen
          ? 'Choose the outcome.'
          : null;

  const submit = () => {
    if (problem || !chosen) return;
    create.mutate(
      {
        scores,
        comment,
        outcome: chosen,
        pins: pins.map(({ uploadId, x, y, note }) => ({ uploadId, x, y, note: note.trim() })),
      },
      {
        onSuccess: () => {
          toast.success(
            chosen === 'passed'
              ? `${submission.apprentice.name}'s piece passed. They have been told.`
              : `Rework asked of ${submission.apprentice.name}. They have been told.`,
          );
          navigate(paths.reviewQueue);
        },
      },
    );
  };

  return (
    <form
      className="grid gap-8 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      {/* The photos stay in view while the mentor scrolls through the criteria. */}
      <div className="lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
        <PinPanel photos={version.photos} pins={pins} onChange={setPins} />
      </div>
      <div className="space-y-5">
        <section aria-labelledby="scores-title" className="space-y-3">
          <h3 id="scores-title" className="font-serif text-xl font-semibold">
            Scores
          </h3>
          <p className="text-sm text-muted">{SCORE_WORDS.map((w, i) => `${i} ${w}`).join(' · ')}</p>
          {project.criteria.map((c) => (
            <CriterionScorer
              key={c.key}
              criterion={c}
              totalWeight={totalWeight}
              value={scores[c.key]}
              onChange={(s) => setScores((all) => ({ ...all, [c.key]: s }))}
            />
          ))}
        </section>
        <MarkdownField
          label="Comment"
          value={comment}
          onChange={setComment}
          rows={6}
          maxLength={20_000}
          hint="Markdown. Say what to keep doing as well as what to change; the pins carry the details."
        />
        <section aria-labelledby="grade-title" className="space-y-3 rounded-lg border border-rule bg-card p-4">
          <h3 id="grade-title" className="font-serif text-xl font-semibold">
            Outcome
          </h3>
          <p aria-live="polite" className="text-sm">
            Weighted score{' '}
            <span className="num text-2xl font-semibold">
              {result.weighted === null ? '–' : formatScore(result.weighted)}
            </span>{' '}
            of <span className="num">4</span>, pass mark{' '}
            <span className="num font-semibold">{formatScore(project.passMark)}</span>
            {result.weighted !== null && (
              <span className={`ml-2 font-semibold ${result.canPass ? 'text-passed' : 'text-rework'}`}>
                {result.canPass
                  ? 'reaches the pass mark'
                  : result.notShown.length
                    ? 'a criterion is not shown'
                    : 'below the pass mark'}
              </span>
            )}
          </p>
          <fieldset className="space-y-2">
            <legend className="sr-only">Outcome</legend>
            <label
              className={`flex min-h-11 items-center gap-3 rounded-md border px-3 ${result.canPass ? 'cursor-pointer border-rule' : 'cursor-not-allowed border-rule opacity-60'}`}
            >
              <input
                type="radio"
                name="outcome"
                value="passed"
                className="size-5 accent-passed"
                disabled={!result.canPass}
                checked={chosen === 'passed'}
                onChange={() => setOutcome('passed')}
              />
              <span>
                <span className="font-semibold">Passed</span>
                {!result.canPass && (
                  <span className="block text-xs text-muted">
                    Needs every criterion scored, none at 0, and the pass mark reached.
                  </span>
                )}
              </span>
            </label>
            <label className="flex min-h-11 cursor-pointer items-center gap-3 rounded-md border border-rule px-3">
              <input
                type="radio"
                name="outcome"
                value="rework"
                className="size-5 accent-rework"
                checked={chosen === 'rework'}
                onChange={() => setOutcome('rework')}
              />
              <span className="font-semibold">Rework</span>
            </label>
          </fieldset>
          {create.error && <ErrorNotice error={create.error} title="The review was not saved" />}
          <div className="flex flex-wrap items-center gap-3">
            <Button type="submit" busy={create.isPending} disabled={Boolean(problem)}>
              <Send className="size-4" aria-hidden />
              Send review
            </Button>
            {problem && <p className="text-sm text-muted">{problem}</p>}
          </div>
        </section>
      </div>
    </form>
  );
}
