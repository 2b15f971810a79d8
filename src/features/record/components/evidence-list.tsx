import { Link } from 'react-router-dom';
import { formatScore } from '@shared/grading/score';
import type { EvidenceItem } from '@shared/schemas/record';
import { paths } from '@/config/paths';
import { OutcomeBadge } from '@/features/reviews/components/outcome-badge';

export const KIND_LABEL: Record<EvidenceItem['kind'], string> = {
  submission: 'Piece',
  'log-entry': 'Log entry',
  calculation: 'Saved result',
};

export const shortDay = (date: string) =>
  new Date(`${date.slice(0, 10)}T12:00:00`).toLocaleDateString(undefined, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  });

/** Where an item of evidence is read in full: a piece for its owner or a reviewer, a log entry, saved results. */
function linkOf(item: EvidenceItem, asMentor: boolean) {
  if (item.kind === 'submission') return asMentor ? paths.review(item.id) : paths.submission(item.id);
  if (item.kind === 'log-entry') return paths.logEntry(item.id);
  return null;
}

/** One line per item: its kind, title, day, outcome and score, with the first photos as thumbnails. */
export function EvidenceList({ items, asMentor }: { items: EvidenceItem[]; asMentor: boolean }) {
  if (items.length === 0)
    return (
      <p className="text-sm text-muted">No evidence yet: pieces, graded log entries and saved results appear here.</p>
    );
  return (
    <ul className="space-y-2">
      {items.map((item) => {
        const to = linkOf(item, asMentor);
        return (
          <li key={`${item.kind}-${item.id}`} className="flex flex-wrap items-center gap-3">
            <span className="flex gap-1">
              {item.photoIds.slice(0, 3).map((id) => (
                <img
                  key={id}
                  src={`/api/uploads/${id}?size=thumb`}
                  alt=""
                  loading="lazy"
                  className="size-12 rounded border border-rule object-cover"
                />
              ))}
            </span>
            <span className="min-w-0 flex-1 text-sm">
              <span className="text-muted">{KIND_LABEL[item.kind]}: </span>
              {to ? <Link to={to}>{item.title}</Link> : item.title}
              <span className="text-muted"> · {shortDay(item.date)}</span>
              {item.score !== undefined && (
                <span className="text-muted">
                  {' '}
                  · score <span className="num">{formatScore(item.score)}</span> of <span className="num">4</span>
                </span>
              )}
            </span>
            {item.outcome && <OutcomeBadge outcome={item.outcome} />}
          </li>
        );
      })}
    </ul>
  );
}
