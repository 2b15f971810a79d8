import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatMinutes, type LogSummary } from '@shared/schemas/log-entry';

const shortDay = (date: string) =>
  new Date(`${date}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short' });

/** Hours at the bench per week (Monday to Sunday), with the same figures in a table for screen readers. */
export function WeeklyHoursChart({ weeks }: { weeks: LogSummary['weeks'] }) {
  const data = weeks.map((w) => ({
    week: shortDay(w.weekStart),
    hours: Math.round((w.minutes / 60) * 10) / 10,
    minutes: w.minutes,
  }));
  return (
    <figure>
      <div className="h-56" aria-hidden>
        <ResponsiveContainer width="100%" height="100%">
          {/* The table below carries the figures; the drawing is kept out of the Tab order and the reading order. */}
          <BarChart accessibilityLayer={false} data={data} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid vertical={false} stroke="#e3dccb" />
            <XAxis dataKey="week" tick={{ fontSize: 12 }} />
            <YAxis unit=" h" allowDecimals={false} width={44} tick={{ fontSize: 12 }} />
            <Tooltip
              formatter={(_value, _name, item) => [formatMinutes(item.payload.minutes), 'At the bench']}
              labelFormatter={(label) => `Week of ${label}`}
            />
            <Bar dataKey="hours" fill="#a8802f" radius={[3, 3, 0, 0]} />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="sr-only">
        <table>
          <caption>Hours at the bench per week</caption>
          <tbody>
            {data.map((d) => (
              <tr key={d.week}>
                <th scope="row">Week of {d.week}</th>
                <td>{formatMinutes(d.minutes)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </figcaption>
    </figure>
  );
}
