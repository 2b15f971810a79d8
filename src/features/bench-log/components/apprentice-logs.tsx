import { Link } from 'react-router-dom';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useLogApprentices } from '../api/get-log-summary';
import { day } from '../lib/when';

/** For a mentor (or the guild office) who opens the bench log without naming anyone: whose logs there are to read. */
export function ApprenticeLogs() {
  const { data, error } = useLogApprentices();
  if (error) return <ErrorNotice error={error} />;
  if (!data) return <Loading />;
  if (data.apprentices.length === 0)
    return <EmptyState title="No apprentices to read">Apprentices enrolled in your classes appear here.</EmptyState>;
  return (
    <table className="w-full border-collapse text-left">
      <caption className="sr-only">Apprentices and their bench logs</caption>
      <thead>
        <tr className="border-b border-rule text-sm text-muted">
          <th scope="col" className="py-2 pr-3">
            Apprentice
          </th>
          <th scope="col" className="py-2 pr-3 text-right">
            Entries
          </th>
          <th scope="col" className="py-2 pr-3 text-right">
            Not graded
          </th>
          <th scope="col" className="py-2">
            Last entry
          </th>
        </tr>
      </thead>
      <tbody>
        {data.apprentices.map((a) => (
          <tr key={a.id} className="border-b border-rule/60">
            <td className="py-2 pr-3">
              <Link to={paths.apprenticeLog(a.id)} className="inline-flex min-h-11 items-center">
                {a.name}
              </Link>
            </td>
            <td className="num py-2 pr-3 text-right">{a.entries}</td>
            <td className="num py-2 pr-3 text-right">{a.ungraded}</td>
            <td className="py-2">{a.lastDate ? day(a.lastDate) : '—'}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
