import { Link } from 'react-router-dom';
import type { ClassDTO } from '@shared/schemas/class';
import { EmptyState } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { formatDay, plural } from './format';

/** Every class at a glance: course, dates, seats taken and who mentors it. */
export function ClassTable({ classes, empty }: { classes: ClassDTO[]; empty: string }) {
  if (classes.length === 0) return <EmptyState title={empty} />;
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-card">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Classes</caption>
        <thead className="border-b border-rule text-muted">
          <tr>
            <th scope="col" className="p-3">
              Class
            </th>
            <th scope="col" className="p-3">
              Course
            </th>
            <th scope="col" className="p-3">
              Dates
            </th>
            <th scope="col" className="p-3">
              Apprentices
            </th>
            <th scope="col" className="p-3">
              Mentors
            </th>
          </tr>
        </thead>
        <tbody>
          {classes.map((c) => (
            <tr key={c.id} className="border-b border-rule/60 last:border-0">
              <td className="p-3">
                <Link to={paths.class(c.id)} className="font-semibold">
                  {c.name}
                </Link>
                {c.archived && <span className="ml-2 rounded bg-rule px-2 py-0.5 text-xs text-muted">archived</span>}
              </td>
              <td className="p-3">{c.course.title}</td>
              <td className="p-3 whitespace-nowrap">
                {formatDay(c.startsOn)} – {formatDay(c.endsOn)}
              </td>
              <td className="p-3">
                <span className="num">{c.counts.active}</span> of <span className="num">{c.capacity}</span> seats
                {c.counts.invited > 0 && (
                  <span className="text-muted"> · {plural(c.counts.invited, 'invitation')} open</span>
                )}
              </td>
              <td className="p-3">
                {c.mentors.map((m) => m.name).join(', ') || <span className="text-muted">none yet</span>}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
