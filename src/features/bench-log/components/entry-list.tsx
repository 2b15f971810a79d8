import { Camera, MessageSquare, Ruler } from 'lucide-react';
import { Link } from 'react-router-dom';
import { formatMinutes, type LogEntryDTO, type LogEntryFilters } from '@shared/schemas/log-entry';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useLogEntries } from '../api/get-log-entries';
import { day } from '../lib/when';

function GradeStatus({ entry }: { entry: LogEntryDTO }) {
  const latest = entry.grades.at(-1);
  if (!latest) return <span className="text-sm text-muted">Not graded yet</span>;
  if (entry.changedAfterGradingAt)
    return <span className="text-sm font-semibold text-rework">Changed after grading</span>;
  return <span className="text-sm text-steel">Graded by {latest.mentor.name}</span>;
}

function EntryItem({ entry }: { entry: LogEntryDTO }) {
  return (
    <li className="rounded-lg border border-rule bg-card p-4 hover:border-brass">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-serif text-lg font-semibold">
          <Link to={paths.logEntry(entry.id)} className="no-underline hover:underline">
            {entry.title}
          </Link>
        </h3>
        <span className="num">{formatMinutes(entry.minutes)}</span>
      </div>
      <p className="text-sm text-muted">
        <time dateTime={entry.date}>{day(entry.date)}</time>
        {entry.lesson && ` · ${entry.lesson.title}`}
      </p>
      <div className="mt-2 flex flex-wrap items-center gap-4 text-sm text-muted">
        <span className="inline-flex items-center gap-1">
          <Ruler className="size-4" aria-hidden />
          {entry.measurements.length} measurement{entry.measurements.length === 1 ? '' : 's'}
        </span>
        <span className="inline-flex items-center gap-1">
          <Camera className="size-4" aria-hidden />
          {entry.photos.length} photo{entry.photos.length === 1 ? '' : 's'}
        </span>
        <span className="inline-flex items-center gap-1">
          <MessageSquare className="size-4" aria-hidden />
          {entry.comments.length} comment{entry.comments.length === 1 ? '' : 's'}
        </span>
        <GradeStatus entry={entry} />
      </div>
    </li>
  );
}

/** One page of entries, newest first, with the pager under it. */
export function EntryList({
  filters,
  page,
  onPage,
}: {
  filters: LogEntryFilters;
  page: number;
  onPage: (page: number) => void;
}) {
  const { data, error, isLoading } = useLogEntries({ ...filters, page });
  if (error) return <ErrorNotice error={error} title="The log could not be loaded" />;
  if (isLoading || !data) return <Loading label="Opening the log…" />;
  if (data.total === 0)
    return <EmptyState title="No entries here yet">Entries appear here as soon as they are added.</EmptyState>;
  const pages = Math.max(1, Math.ceil(data.total / data.pageSize));
  return (
    <div className="space-y-4">
      <ul className="space-y-3" aria-label="Log entries">
        {data.entries.map((e) => (
          <EntryItem key={e.id} entry={e} />
        ))}
      </ul>
      {pages > 1 && (
        <nav className="flex items-center justify-between gap-2" aria-label="Pages of the log">
          <Button variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
            Newer entries
          </Button>
          <span className="text-sm text-muted">
            Page <span className="num">{page}</span> of <span className="num">{pages}</span> ·{' '}
            <span className="num">{data.total}</span> entries
          </span>
          <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
            Older entries
          </Button>
        </nav>
      )}
    </div>
  );
}
