import { Link } from 'react-router-dom';
import { Card } from '@/components/ui/card';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useClasses } from '../api/get-classes';
import { formatDay } from './format';

const CURRENT = { archived: 'false' } as const;

/** Today, for a mentor: each current class with its course, dates and how full it is. */
export function ClassesGlancePanel() {
  const { data: classes, isPending, error } = useClasses(CURRENT);
  return (
    <Card>
      <h2 className="font-serif text-xl font-semibold">Your classes</h2>
      {isPending && <Loading label="Loading your classes…" />}
      {error && <ErrorNotice error={error} />}
      {classes?.length === 0 && (
        <EmptyState title="No classes yet">
          The guild office assigns mentors to classes; yours will show here.
        </EmptyState>
      )}
      {classes && classes.length > 0 && (
        <ul className="mt-3 divide-y divide-rule">
          {classes.map((c) => (
            <li key={c.id} className="py-2">
              <Link to={paths.class(c.id)} className="font-semibold">
                {c.name}
              </Link>
              <p className="text-sm text-muted">
                {c.course.title} · {formatDay(c.startsOn)} – {formatDay(c.endsOn)}
              </p>
              <p className="text-sm text-muted">
                <span className="num">{c.counts.active}</span> active{' '}
                {c.counts.active === 1 ? 'apprentice' : 'apprentices'}
                {c.counts.invited > 0 && (
                  <>
                    , <span className="num">{c.counts.invited}</span> invited
                  </>
                )}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
