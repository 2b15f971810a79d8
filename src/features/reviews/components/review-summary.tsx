import { formatScore, SCORE_WORDS } from '@shared/grading/score';
import type { ProjectSummary, ReviewDTO, SubmissionPhotoDTO } from '@shared/schemas/submission';
import { UserMarkdown } from '@/components/ui/user-markdown';
import { OutcomeBadge } from './outcome-badge';

const date = (iso: string) =>
  new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'long', year: 'numeric' });

/** A finished review: outcome, weighted score against the pass mark, each criterion's score and meaning, comment, pins. */
export function ReviewSummary({
  review,
  project,
  photos,
}: {
  review: ReviewDTO;
  project: ProjectSummary;
  photos: SubmissionPhotoDTO[];
}) {
  const photoIndex = new Map(photos.map((p, i) => [p.uploadId, i + 1]));
  return (
    <section
      aria-label={`Review by ${review.mentor.name}`}
      className="space-y-4 rounded-lg border border-rule bg-card p-4"
    >
      <header className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex items-center gap-3">
          <OutcomeBadge outcome={review.outcome} />
          <p className="text-sm text-muted">
            {review.mentor.name}, {date(review.createdAt)}
          </p>
        </div>
        <p className="text-sm">
          Weighted score <span className="num text-lg font-semibold">{formatScore(review.weightedScore)}</span> of{' '}
          <span className="num">4</span>{' '}
          <span className="text-muted">
            (pass mark <span className="num">{formatScore(project.passMark)}</span>)
          </span>
        </p>
      </header>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Scores per criterion</caption>
        <thead>
          <tr className="border-b border-rule text-muted">
            <th scope="col" className="py-1 pr-2 font-semibold">
              Criterion
            </th>
            <th scope="col" className="py-1 pr-2 font-semibold">
              Score
            </th>
            <th scope="col" className="py-1 font-semibold">
              What it means here
            </th>
          </tr>
        </thead>
        <tbody>
          {project.criteria.map((c) => {
            const score = review.scores[c.key];
            return (
              <tr key={c.key} className="border-b border-rule/60 align-top">
                <th scope="row" className="py-2 pr-2 font-semibold">
                  {c.label} <span className="num font-normal text-muted">×{c.weight}</span>
                </th>
                <td className="py-2 pr-2 whitespace-nowrap">
                  <span className="num font-semibold">{score}</span> {SCORE_WORDS[score]}
                </td>
                <td className="py-2 text-ink">{c.scores[score]}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <div>
        <h4 className="text-sm font-semibold text-muted">Comment</h4>
        <UserMarkdown text={review.comment} empty="No comment." />
      </div>
      {review.pins.length > 0 && (
        <div>
          <h4 className="text-sm font-semibold text-muted">Pins</h4>
          <ol className="mt-1 space-y-1 text-sm">
            {review.pins.map((p) => (
              <li key={p.id} className="flex gap-2">
                <span className="num flex size-6 shrink-0 items-center justify-center rounded-full bg-error text-xs font-semibold text-white">
                  {p.number}
                </span>
                <span>
                  {p.note} <span className="text-muted">(photo {photoIndex.get(p.uploadId) ?? '?'})</span>
                </span>
              </li>
            ))}
          </ol>
        </div>
      )}
    </section>
  );
}
