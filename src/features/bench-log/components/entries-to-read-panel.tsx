import { Link } from 'react-router-dom';
import { formatMinutes } from '@shared/schemas/log-entry';
import { Card } from '@/components/ui/card';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useEntriesToRead } from '../api/get-log-summary';
import { day } from '../lib/when';

/** Today, for a mentor: their apprentices' newest log entries that nobody has graded yet. */
export function EntriesToReadPanel() {
  const { data, error } = useEntriesToRead();
  return (
    <Card>
      <h2 className="font-serif text-xl font-semibold">Log entries to read</h2>
      {!data && !error && (
        <p role="status" className="mt-2 text-muted">
          Looking…
        </p>
      )}
      {error && (
        <div className="mt-2">
          <ErrorNotice error={error} title="The entries to read could not be loaded" />
        </div>
      )}
      {data && data.total === 0 && <p className="mt-2 text-muted">Every entry of your apprentices has a grade.</p>}
      {data && data.total > 0 && (
        <>
          <p className="mt-1 text-sm text-muted">
            <span className="num">{data.total}</span> without a grade, newest first.
          </p>
          <ul className="mt-2 divide-y divide-rule">
            {data.entries.map((e) => (
              <li key={e.id} className="py-2">
                <Link to={paths.logEntry(e.id)} className="inline-flex min-h-11 items-center font-semibold">
                  {e.title}
                </Link>
                <p className="text-sm text-muted">
                  {e.apprentice.name} · {day(e.date)} · <span className="num">{formatMinutes(e.minutes)}</span>
                </p>
              </li>
            ))}
          </ul>
        </>
      )}
      <Link to={paths.benchLog} className="mt-3 inline-flex min-h-11 items-center">
        All your apprentices’ logs
      </Link>
    </Card>
  );
}
