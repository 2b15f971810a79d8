import { useId } from 'react';
import { meshDrawing, type WheelPinionResults } from '@shared/calc/wheel-pinion';
import type { UnitSystem } from '@shared/schemas/user';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';

type MeshSizes = Pick<
  WheelPinionResults,
  | 'wheelPitchDiameterMm'
  | 'pinionPitchDiameterMm'
  | 'centreDistanceMm'
  | 'wheelBlankDiameterMm'
  | 'pinionBlankDiameterMm'
>;

const INK = '#1f2328';
const BRASS = '#a8802f';
const STEEL = '#2b4c7e';
const MUTED = '#5b5f66';

/**
 * The wheel and pinion drawn to one scale at their pitch circles, with the blanks, the line of centres and the
 * centre distance. Strokes do not scale, so a 2 mm pinion beside a 100 mm wheel still shows as a clean line.
 */
export function MeshDrawing({ sizes, unitSystem }: { sizes: MeshSizes; unitSystem: UnitSystem }) {
  const titleId = useId();
  const { wheel, pinion, pitchPoint, bounds } = meshDrawing(sizes);
  const width = bounds.maxX - bounds.minX;
  const span = Math.max(width, bounds.maxY - bounds.minY);
  const font = span * 0.035;
  const margin = span * 0.06;
  const dimY = bounds.maxY + margin + font;
  const viewBox = [
    bounds.minX - margin,
    bounds.minY - margin,
    width + 2 * margin,
    bounds.maxY - bounds.minY + 3 * margin + 2 * font,
  ];
  const length = (mm: number) =>
    withUnit(formatNumber(toDisplay(mm, 'length', unitSystem), 5), unitLabel('length', unitSystem));
  const line = { vectorEffect: 'non-scaling-stroke' as const, fill: 'none' };
  const arrow = span * 0.015;

  return (
    <figure className="space-y-2">
      <svg
        role="img"
        aria-labelledby={titleId}
        viewBox={viewBox.join(' ')}
        className="h-auto max-h-[60vh] w-full rounded-md border border-rule bg-white print:max-h-none"
        data-testid="mesh-drawing"
      >
        <title id={titleId}>
          {`Wheel and pinion at their pitch circles, to scale: centre distance ${length(sizes.centreDistanceMm)}`}
        </title>
        <line
          x1={bounds.minX}
          y1={0}
          x2={bounds.maxX}
          y2={0}
          stroke={MUTED}
          strokeWidth={1}
          strokeDasharray="8 3 2 3"
          {...line}
        />
        {[wheel, pinion].map((c, i) => (
          <g key={i}>
            <circle cx={c.cx} cy={c.cy} r={c.blankRadiusMm} stroke={INK} strokeWidth={1} {...line} />
            <circle
              cx={c.cx}
              cy={c.cy}
              r={c.pitchRadiusMm}
              stroke={i === 0 ? BRASS : STEEL}
              strokeWidth={2}
              strokeDasharray="6 3"
              {...line}
            />
            <circle cx={c.cx} cy={c.cy} r={span * 0.006} fill={INK} />
          </g>
        ))}
        <circle cx={pitchPoint.x} cy={pitchPoint.y} r={span * 0.008} fill={BRASS} />
        {/* vector-effect is not inherited, so each stroke of the dimension carries it. */}
        <g stroke={INK} strokeWidth={1} fill="none">
          <line x1={0} y1={0} x2={0} y2={dimY + font * 0.4} {...line} />
          <line x1={pinion.cx} y1={0} x2={pinion.cx} y2={dimY + font * 0.4} {...line} />
          <line x1={0} y1={dimY} x2={pinion.cx} y2={dimY} {...line} />
          <path d={`M ${arrow} ${dimY - arrow / 2} L 0 ${dimY} L ${arrow} ${dimY + arrow / 2}`} {...line} />
          <path
            d={`M ${pinion.cx - arrow} ${dimY - arrow / 2} L ${pinion.cx} ${dimY} L ${pinion.cx - arrow} ${dimY + arrow / 2}`}
            {...line}
          />
        </g>
        <text
          x={pinion.cx / 2}
          y={dimY + font * 1.3}
          fontSize={font}
          textAnchor="middle"
          fill={INK}
          fontFamily="JetBrains Mono, monospace"
        >
          {`a = ${length(sizes.centreDistanceMm)}`}
        </text>
      </svg>
      <figcaption className="text-sm text-muted">
        To scale. Dashed circles: pitch circles (wheel in brass, pinion in blue); solid circles: blanks; the dot where
        the pitch circles touch is the pitch point on the line of centres.
      </figcaption>
    </figure>
  );
}
