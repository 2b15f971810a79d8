import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { HardnessPoint } from '@shared/calc/spring-temper-tables';
import { useCalcForm } from '../../components/calculator-context';
import { formatFixed, formatNumber, toDisplay, unitLabel } from '../../lib/units';

const STEEL_NAME = { O1: 'O1', '1095': '1095', silver: 'Silver steel' } as const;

/** Hardness left after tempering, against the tempering temperature, from the one cited table for the steel. */
export default function HardnessPlot({
  steel,
  points,
  source,
  mark,
}: {
  steel: keyof typeof STEEL_NAME;
  points: readonly HardnessPoint[];
  source: string;
  mark: HardnessPoint | null;
}) {
  const { unitSystem } = useCalcForm();
  const unit = unitLabel('temperature', unitSystem);
  const data = points.map((p) => ({ temp: toDisplay(p.tempC, 'temperature', unitSystem), hrc: p.hrc }));
  const label = `${STEEL_NAME[steel]}: hardness after tempering`;
  return (
    <figure className="mt-6 print:break-inside-avoid">
      <figcaption className="mb-2 text-sm">
        <span className="font-semibold">{label}</span>
        <span className="block text-muted">{source}</span>
      </figcaption>
      <div className="h-64 w-full" role="img" aria-label={`${label}, plotted from ${points.length} table points`}>
        <ResponsiveContainer width="100%" height="100%">
          {/* Inside an image with its own label: no focusable layer of its own. */}
          <LineChart accessibilityLayer={false} data={data} margin={{ top: 8, right: 16, bottom: 24, left: 8 }}>
            <CartesianGrid stroke="#e3dccb" />
            <XAxis
              dataKey="temp"
              type="number"
              domain={['dataMin', 'dataMax']}
              tickFormatter={(v: number) => formatNumber(v, 3)}
              label={{ value: `Tempering temperature (${unit})`, position: 'insideBottom', offset: -12 }}
            />
            <YAxis
              dataKey="hrc"
              domain={['dataMin - 2', 'dataMax + 1']}
              tickFormatter={(v: number) => formatNumber(v, 3)}
              label={{ value: 'HRC', angle: -90, position: 'insideLeft' }}
            />
            <Tooltip
              formatter={(v) => [`${formatFixed(Number(v), 0)} HRC`, 'Hardness']}
              labelFormatter={(v) => `${formatNumber(Number(v), 4)} ${unit}`}
            />
            <Line
              type="linear"
              dataKey="hrc"
              stroke="#2b4c7e"
              strokeWidth={2}
              dot={{ r: 3 }}
              isAnimationActive={false}
            />
            {mark && (
              <ReferenceDot
                x={toDisplay(mark.tempC, 'temperature', unitSystem)}
                y={mark.hrc}
                r={6}
                fill="#a8802f"
                stroke="#1f2328"
              />
            )}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <table className="sr-only">
        <caption>{label}</caption>
        <thead>
          <tr>
            <th scope="col">Temperature ({unit})</th>
            <th scope="col">Hardness (HRC)</th>
          </tr>
        </thead>
        <tbody>
          {data.map((d) => (
            <tr key={d.temp}>
              <td>{formatNumber(d.temp, 4)}</td>
              <td>{d.hrc}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}
