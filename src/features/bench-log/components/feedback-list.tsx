import { SCORE_WORDS } from '@shared/grading/score';
import { GRADE_ASPECTS, GRADE_ASPECT_LABELS, type LogEntryDTO } from '@shared/schemas/log-entry';
import { when } from '../lib/when';

/** Grades (each with the version it was given to) and comments, oldest first. */
export function FeedbackList({ entry }: { entry: LogEntryDTO }) {
  if (entry.grades.length === 0 && entry.comments.length === 0)
    return <p className="text-muted">No comments or grades yet.</p>;
  return (
    <div className="space-y-4">
      {entry.grades.map((g) => (
        <article
          key={g.id}
          className="rounded-md border border-rule bg-white p-3"
          aria-label={`Grade from ${g.mentor.name}`}
        >
          <header className="flex flex-wrap justify-between gap-2 text-sm text-muted">
            <span>
              <strong className="text-ink">{g.mentor.name}</strong> graded on version {g.entryVersion}
              {g.entryVersion !== entry.version && ` (the entry is now at version ${entry.version})`}
            </span>
            <time dateTime={g.createdAt}>{when(g.createdAt)}</time>
          </header>
          <dl className="mt-2 grid gap-1 sm:grid-cols-3">
            {GRADE_ASPECTS.map((a) => (
              <div key={a}>
                <dt className="text-sm text-muted">{GRADE_ASPECT_LABELS[a]}</dt>
                <dd>
                  <span className="num font-semibold">{g[a]}</span> {SCORE_WORDS[g[a]]}
                </dd>
              </div>
            ))}
          </dl>
          {g.comment && <p className="mt-2 whitespace-pre-line">{g.comment}</p>}
        </article>
      ))}
      {entry.comments.map((c) => (
        <article key={c.id} className="border-l-4 border-brass/60 pl-3" aria-label={`Comment from ${c.author.name}`}>
          <header className="text-sm text-muted">
            <strong className="text-ink">{c.author.name}</strong> ·{' '}
            <time dateTime={c.createdAt}>{when(c.createdAt)}</time>
          </header>
          <p className="whitespace-pre-line">{c.body}</p>
        </article>
      ))}
    </div>
  );
}
