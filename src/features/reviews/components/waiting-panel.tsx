import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useReviewQueue } from '../api/get-review-queue';
import { waitingFor } from './waiting-time';

const LONGEST_WAITING = { sort: 'waiting', dir: 'asc', page: 1 } as const;

/** Today, for a mentor: how many pieces wait, and the ones that have waited longest. */
export function WaitingPanel() {
  const { data, isPending, error } = useReviewQueue(LONGEST_WAITING);
  return (
    <Card>
      <h2 className="font-serif text-xl font-semibold">
        Pieces waiting {data && <span className="num text-base font-normal text-muted">({data.total})</span>}
      </h2>
      {isPending && <Loading />}
      {error && <ErrorNotice error={error} />}
      {data?.total === 0 && (
        <p className="mt-2 text-muted">Nothing waiting for you. New pieces appear here as soon as they are sent.</p>
      )}
      {data && data.rows.length > 0 && (
        <ul className="mt-3 divide-y divide-rule">
          {data.rows.slice(0, 5).map((r) => (
            <li key={r.submissionId} className="flex items-center gap-3 py-2">
              {r.thumbUrl && (
                <img src={r.thumbUrl} alt="" className="size-12 rounded border border-rule object-cover" />
              )}
              <div className="min-w-0 flex-1">
                <Link to={paths.review(r.submissionId)} className="font-semibold">
                  {r.project.title}
                </Link>
                <p className="text-xs text-muted">
                  {r.apprentice.name} · version <span className="num">{r.version}</span> · waiting{' '}
                  <span className="num">{waitingFor(r.sentAt)}</span>
                </p>
              </div>
            </li>
          ))}
        </ul>
      )}
      <Link to={paths.reviewQueue} className="mt-3 inline-flex min-h-11 items-center text-sm font-semibold">
        Open the review queue
      </Link>
    </Card>
  );
}
