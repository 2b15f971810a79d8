import { useSearchParams } from 'react-router-dom';
import { QUEUE_PAGE_SIZE, ReviewQueueQuery } from '@shared/schemas/review';
import { Button } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/card';
import { SelectField } from '@/components/ui/field';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { RequireRole } from '@/app/require-role';
import { useQueueFilters, useReviewQueue } from '@/features/reviews/api/get-review-queue';
import { QueueTable } from '@/features/reviews/components/queue-table';

const FILTERS = [
  { key: 'classId', label: 'Class', all: 'All classes' },
  { key: 'courseId', label: 'Course', all: 'All courses' },
  { key: 'projectId', label: 'Project', all: 'All projects' },
] as const;

/** The queue lives in the address, so a sorted, filtered page can be bookmarked and the back button works. */
function ReviewQueuePage() {
  const [params, setParams] = useSearchParams();
  const parsed = ReviewQueueQuery.safeParse(Object.fromEntries(params));
  const query = parsed.success ? parsed.data : ReviewQueueQuery.parse({});
  const { data, isPending, error, isFetching } = useReviewQueue(query);
  const filters = useQueueFilters();

  const update = (change: Record<string, string | number | undefined>, resetPage = true) => {
    const next = new URLSearchParams(params);
    for (const [k, v] of Object.entries(change)) {
      if (v === undefined || v === '') next.delete(k);
      else next.set(k, String(v));
    }
    if (resetPage) next.delete('page');
    setParams(next);
  };

  const options = {
    classId: filters.data?.classes ?? [],
    courseId: filters.data?.courses ?? [],
    projectId: (filters.data?.projects ?? []).filter((p) => !query.courseId || p.courseId === query.courseId),
  };
  const pages = data ? Math.max(1, Math.ceil(data.total / QUEUE_PAGE_SIZE)) : 1;
  const filtered = Boolean(query.classId || query.courseId || query.projectId);

  return (
    <>
      <PageHeader
        title="To review"
        lead="Pieces your apprentices have sent, waiting for your review. The longest waiting come first."
      />
      <div className="mb-4 grid gap-3 sm:grid-cols-3">
        {FILTERS.map((f) => (
          <SelectField
            key={f.key}
            label={f.label}
            value={query[f.key] ?? ''}
            onChange={(e) =>
              update({ [f.key]: e.target.value, ...(f.key === 'courseId' ? { projectId: undefined } : {}) })
            }
          >
            <option value="">{f.all}</option>
            {options[f.key].map((o) => (
              <option key={o.id} value={o.id}>
                {o.label}
              </option>
            ))}
          </SelectField>
        ))}
      </div>
      {isPending && <Loading />}
      {error && <ErrorNotice error={error} />}
      {data && data.total === 0 && (
        <EmptyState title={filtered ? 'Nothing waiting with these filters' : 'Nothing waiting for review'}>
          {filtered ? (
            <Button
              variant="secondary"
              className="mt-3"
              onClick={() => update({ classId: undefined, courseId: undefined, projectId: undefined })}
            >
              Clear the filters
            </Button>
          ) : (
            'When an apprentice of your classes sends a piece, it appears here and you get an e-mail.'
          )}
        </EmptyState>
      )}
      {data && data.total > 0 && (
        <div className="space-y-3" aria-busy={isFetching}>
          <p className="text-sm text-muted" aria-live="polite">
            <span className="num">{data.total}</span> waiting · page <span className="num">{data.page}</span> of{' '}
            <span className="num">{pages}</span>
          </p>
          <QueueTable
            rows={data.rows}
            sort={query.sort}
            dir={query.dir}
            onSort={(sort, dir) => update({ sort, dir })}
          />
          {pages > 1 && (
            <nav aria-label="Pages of the queue" className="flex items-center gap-3">
              <Button
                variant="secondary"
                disabled={query.page <= 1}
                onClick={() => update({ page: query.page - 1 }, false)}
              >
                Previous page
              </Button>
              <Button
                variant="secondary"
                disabled={query.page >= pages}
                onClick={() => update({ page: query.page + 1 }, false)}
              >
                Next page
              </Button>
            </nav>
          )}
        </div>
      )}
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={['mentor', 'admin']}>
      <ReviewQueuePage />
    </RequireRole>
  );
}
