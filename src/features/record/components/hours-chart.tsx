import { Bar, BarChart, CartesianGrid, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatMinutes } from '@shared/schemas/log-entry';
import type { HoursAgainstClass } from '@shared/schemas/record';

const shortDay = (date: string) =>
  new Date(`${date}T12:00:00`).toLocaleDateString(undefined, { day: 'numeric', month: 'short' });
const hours = (minutes: number) => Math.round((minutes / 60) * 10) / 10;

/**
 * Bench hours per week against what the class asks, drawn; the panel beside it carries the figures in words and a
 * table, so the drawing is hidden from screen readers. Loaded on its own so that the chart library is fetched only
 * where a chart is shown.
 */
export default function HoursChart({ hours: data }: { hours: HoursAgainstClass }) {
  const rows = data.weeks.map((w) => ({ week: shortDay(w.weekStart), hours: hours(w.minutes), minutes: w.minutes }));
  return (
    <div className="h-56" aria-hidden>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart accessibilityLayer={false} data={rows} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid vertical={false} stroke="#e3dccb" />
          <XAxis dataKey="week" tick={{ fontSize: 12 }} />
          <YAxis unit=" h" allowDecimals={false} width={44} tick={{ fontSize: 12 }} />
          <Tooltip
            formatter={(_value, _name, item) => [formatMinutes(item.payload.minutes), 'At the bench']}
            labelFormatter={(label) => `Week of ${label}`}
          />
          <Bar dataKey="hours" fill="#a8802f" radius={[3, 3, 0, 0]} />
          {data.requiredMinutesPerWeek !== null && (
            <ReferenceLine
              y={hours(data.requiredMinutesPerWeek)}
              stroke="#2b4c7e"
              strokeDasharray="6 4"
              label={{ value: 'asked', position: 'insideTopRight', fontSize: 12, fill: '#2b4c7e' }}
            />
          )}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
