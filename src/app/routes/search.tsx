import { Link, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useLessonSearch } from '@/features/courses/api/search-lessons';
import { Highlighted } from '@/features/courses/components/highlight';
import { SearchBox } from '@/features/courses/components/search-box';

export function Component() {
  const [params] = useSearchParams();
  const q = (params.get('q') ?? '').trim();
  const { data, isFetching, error } = useLessonSearch(q);
  return (
    <>
      <PageHeader title="Search the lessons" lead="Every lesson of every course, best matches first." />
      <div className="mb-6">
        <SearchBox key={q} initial={q} autoFocus={!q} />
      </div>
      {q.length < 2 ? (
        <p className="text-muted">Type at least two letters, for example “broach” or “temper”.</p>
      ) : error ? (
        <ErrorNotice error={error} title="The search did not work" />
      ) : !data || (isFetching && data.query !== q) ? (
        <Loading label="Searching…" />
      ) : data.results.length === 0 ? (
        <EmptyState title={`Nothing found for “${q}”`}>Try a shorter word, or the name of a tool or part.</EmptyState>
      ) : (
        <>
          <p className="mb-3 text-sm text-muted" aria-live="polite">
            <span className="num">{data.results.length}</span> {data.results.length === 1 ? 'lesson' : 'lessons'} for “
            {q}”
          </p>
          <ol className="space-y-4">
            {data.results.map((r) => (
              <li key={r.lessonId} className="rounded-lg border border-rule bg-card p-4">
                <p className="text-sm text-muted">{r.courseTitle}</p>
                <h2 className="font-serif text-xl font-semibold">
                  <Link to={paths.lesson(r.courseSlug, r.lessonSlug)}>
                    <Highlighted text={r.title} terms={r.terms} />
                  </Link>
                </h2>
                <p className="mt-1 max-w-[70ch] leading-relaxed text-ink">
                  <Highlighted text={r.snippet} terms={r.terms} />
                </p>
              </li>
            ))}
          </ol>
        </>
      )}
    </>
  );
}
