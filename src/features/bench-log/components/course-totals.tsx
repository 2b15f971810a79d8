import { formatMinutes, type LogSummary } from '@shared/schemas/log-entry';

export function CourseTotals({ summary }: { summary: LogSummary }) {
  if (summary.courses.length === 0) return <p className="text-muted">Nothing logged yet.</p>;
  return (
    <table className="w-full border-collapse text-left">
      <caption className="sr-only">Time logged per course</caption>
      <thead>
        <tr className="border-b border-rule text-sm text-muted">
          <th scope="col" className="py-2 pr-3 font-semibold">
            Course
          </th>
          <th scope="col" className="py-2 pr-3 text-right font-semibold">
            Entries
          </th>
          <th scope="col" className="py-2 pl-4 text-right font-semibold">
            Time
          </th>
        </tr>
      </thead>
      <tbody>
        {summary.courses.map((c) => (
          <tr key={c.course?.id ?? 'none'} className="border-b border-rule/60">
            <th scope="row" className="py-2 pr-3 font-normal">
              {c.course?.title ?? 'No lesson chosen'}
            </th>
            <td className="num py-2 pr-3 text-right">{c.entries}</td>
            <td className="num py-2 pl-4 text-right whitespace-nowrap">{formatMinutes(c.minutes)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr className="font-semibold">
          <th scope="row" className="py-2 pr-3">
            All
          </th>
          <td className="num py-2 pr-3 text-right">{summary.entryCount}</td>
          <td className="num py-2 pl-4 text-right whitespace-nowrap">{formatMinutes(summary.totalMinutes)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
