import { Link } from 'react-router-dom';
import { formatScore } from '@shared/grading/score';
import { Card } from '@/components/ui/card';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useRecentReviews } from '../api/get-review-queue';
import { OutcomeBadge } from './outcome-badge';

/** Today, for an apprentice: the latest reviews of their pieces, with the way to each. */
export function BackFromReviewPanel() {
  const { data, isPending, error } = useRecentReviews(5);
  return (
    <Card>
      <h2 className="font-serif text-xl font-semibold">Pieces back from review</h2>
      {isPending && <Loading />}
      {error && <ErrorNotice error={error} />}
      {data?.length === 0 && (
        <p className="mt-2 text-muted">Nothing back yet. When a mentor reviews a piece you sent, it shows here.</p>
      )}
      {data && data.length > 0 && (
        <ul className="mt-3 divide-y divide-rule">
          {data.map((r) => (
            <li key={r.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
              <div>
                <Link to={paths.submission(r.submissionId)} className="font-semibold">
                  {r.projectTitle}
                </Link>
                <p className="text-xs text-muted">
                  Version <span className="num">{r.version}</span> · {r.mentor.name} · score{' '}
                  <span className="num">{formatScore(r.weightedScore)}</span> of <span className="num">4</span>
                  {r.pinCount > 0 && (
                    <>
                      {' '}
                      · <span className="num">{r.pinCount}</span> pin{r.pinCount === 1 ? '' : 's'}
                    </>
                  )}
                </p>
              </div>
              <OutcomeBadge outcome={r.outcome} />
            </li>
          ))}
        </ul>
      )}
      <Link to={paths.myPieces} className="mt-3 inline-flex min-h-11 items-center text-sm font-semibold">
        All my pieces
      </Link>
    </Card>
  );
}
