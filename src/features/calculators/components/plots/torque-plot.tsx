import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../../lib/units';

interface Props {
  /** Spring torque per turn, from the adjusting-rod readings, in N·mm. */
  springTorqueNmm: number[];
  /** Torque at the fusee arbor per turn after the fusee radii, in N·mm; empty until the chain radius is known. */
  fuseeTorqueNmm: number[];
}

const BRASS = '#a8802f';
const STEEL = '#2b4c7e';

/** The spring's rising torque beside the level torque the fusee gives, one point per turn of winding. */
export function TorquePlot({ springTorqueNmm, fuseeTorqueNmm }: Props) {
  const withFusee = fuseeTorqueNmm.length > 0;
  const data = springTorqueNmm.map((spring, i) => ({ turn: i + 1, spring, fusee: fuseeTorqueNmm[i] }));
  const label = (v: unknown) => `${formatNumber(Number(v), 4)} N·mm`;
  return (
    <figure className="space-y-2" data-testid="torque-plot">
      <div className="h-72 w-full print:h-64">
        <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 600, height: 288 }}>
          <LineChart data={data} margin={{ top: 12, right: 16, bottom: 20, left: 16 }}>
            <CartesianGrid stroke="#e3dccb" />
            <XAxis
              dataKey="turn"
              type="number"
              domain={[1, Math.max(2, data.length)]}
              allowDecimals={false}
              label={{ value: 'Turn of winding', position: 'insideBottom', offset: -12 }}
            />
            <YAxis
              domain={[0, 'auto']}
              tickFormatter={(v: number) => formatNumber(v, 3)}
              label={{ value: 'Torque (N·mm)', angle: -90, position: 'insideLeft', offset: -4 }}
            />
            <Tooltip formatter={label} labelFormatter={(t) => `Turn ${t}`} />
            <Legend verticalAlign="top" wrapperStyle={{ paddingBottom: 12 }} />
            <Line
              name="Spring torque (at the barrel)"
              dataKey="spring"
              stroke={BRASS}
              strokeWidth={2}
              isAnimationActive={false}
            />
            {withFusee && (
              <Line
                name="Torque at the fusee arbor"
                dataKey="fusee"
                stroke={STEEL}
                strokeWidth={2}
                strokeDasharray="6 3"
                isAnimationActive={false}
              />
            )}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-muted">
        {withFusee
          ? 'The brass line is the spring as measured; the blue dashed line is what reaches the fusee arbor once the chain runs on the radii below. A level blue line means the fusee evens the pull.'
          : 'The brass line is the spring as measured. Give the largest fusee radius and the chain radius on the barrel to add what reaches the fusee arbor.'}
      </figcaption>
    </figure>
  );
}
