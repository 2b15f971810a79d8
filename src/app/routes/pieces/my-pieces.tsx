import { Link } from 'react-router-dom';
import { formatScore } from '@shared/grading/score';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { RequireRole } from '@/app/require-role';
import { useMySubmissions } from '@/features/submissions/api/get-submissions';
import { StatusBadge } from '@/features/submissions/components/status-badge';

const day = (iso: string) =>
  new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });

function MyPieces() {
  const { data, isPending, error } = useMySubmissions();
  return (
    <>
      <PageHeader title="My pieces" lead="Every project you have started or sent, the most recently changed first." />
      {isPending && <Loading />}
      {error && <ErrorNotice error={error} />}
      {data?.items.length === 0 && (
        <EmptyState title="No pieces yet">
          <p>
            Each lesson with a project has a “Send for review” button under its brief. Start there when your piece is
            made and photographed.
          </p>
          <ButtonLink to={paths.courses} variant="secondary" className="mt-4">
            Go to the courses
          </ButtonLink>
        </EmptyState>
      )}
      {data && data.items.length > 0 && (
        <ul className="space-y-3">
          {data.items.map((s) => (
            <li key={s.id} className="flex flex-wrap items-center gap-4 rounded-lg border border-rule bg-card p-4">
              {s.thumbUrl ? (
                <img src={s.thumbUrl} alt="" className="size-20 rounded-md border border-rule object-cover" />
              ) : (
                <span className="block size-20 rounded-md border border-dashed border-rule" />
              )}
              <div className="min-w-0 flex-1 space-y-1">
                <h2 className="font-serif text-lg font-semibold">
                  <Link to={paths.submission(s.id)}>{s.project.title}</Link>
                </h2>
                <p className="text-sm text-muted">
                  {s.lesson.title} · {s.course.title}
                </p>
                <p className="text-sm text-muted">
                  Version <span className="num">{s.currentVersion}</span> ·{' '}
                  {s.sentAt ? `sent ${day(s.sentAt)}` : `changed ${day(s.updatedAt)}`}
                  {s.lastReview && (
                    <>
                      {' '}
                      · last score <span className="num">{formatScore(s.lastReview.weightedScore)}</span> of{' '}
                      <span className="num">4</span>
                    </>
                  )}
                </p>
              </div>
              <div className="flex flex-col items-end gap-2">
                <StatusBadge status={s.status} />
                {(s.status === 'draft' || s.status === 'rework') && (
                  <ButtonLink to={paths.editSubmission(s.id)} variant="secondary">
                    {s.status === 'draft' ? 'Carry on' : 'Send a new version'}
                  </ButtonLink>
                )}
              </div>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['apprentice']}>
      <MyPieces />
    </RequireRole>
  );
}
