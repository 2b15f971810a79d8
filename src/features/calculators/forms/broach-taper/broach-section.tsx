import type { z } from 'zod';
import type { BroachTaperInput } from '@shared/calc/broach-taper';
import { useCalcForm } from '../../components/calculator-context';
import { formatFixed, formatNumber, fromDisplay, unitLabel, withUnit } from '../../lib/units';

// Scale bars read best at a round length of about a quarter of the drawing.
const NICE = {
  metric: [0.05, 0.1, 0.2, 0.25, 0.5, 1, 2, 5, 10],
  imperial: [0.002, 0.005, 0.01, 0.02, 0.05, 0.1, 0.2, 0.5],
};

/**
 * A section through the plate at the hole, in millimetres, so it is to scale on screen and on paper: the hole as the
 * broach leaves it (tapered from the entry face, or from both faces to the middle) and the pivot at the tilt the hole
 * allows. The entry face is at the top.
 */
export function BroachSection({
  input,
  entryDiameterMm,
  tiltDeg,
}: {
  input: z.output<typeof BroachTaperInput>;
  entryDiameterMm: number;
  tiltDeg: number;
}) {
  const { unitSystem } = useCalcForm();
  const { targetDiameterMm: D, pivotDiameterMm: d, plateThicknessMm: t, openedFrom } = input;
  const margin = Math.max(entryDiameterMm, t) * 0.9;
  const W = entryDiameterMm + 2 * margin;
  const over = 0.5 * t + 0.3 * entryDiameterMm;
  const fs = W / 24;
  const top = entryDiameterMm / 2;
  const both = openedFrom === 'both';
  // Both faces: the entry diameter at each face, the target at mid-plate. One face: a straight taper to the target.
  const mid = both ? D / 2 : (entryDiameterMm + D) / 4;
  const bottom = both ? entryDiameterMm / 2 : D / 2;
  const side = (s: 1 | -1) =>
    [
      [s * (W / 2), 0],
      [s * top, 0],
      [s * Math.max(mid, 0), t / 2],
      [s * Math.max(bottom, 0), t],
      [s * (W / 2), t],
    ]
      .map((p) => p.join(','))
      .join(' ');
  const unit = unitLabel('length', unitSystem);
  const barShown =
    NICE[unitSystem].filter((v) => fromDisplay(v, 'length', unitSystem) <= W / 3).at(-1) ?? NICE[unitSystem][0]!;
  const bar = fromDisplay(barShown, 'length', unitSystem);
  const barY = t + over + fs * 1.5;
  const pivotLength = t + 2 * over * 0.8;
  return (
    <figure className="mt-4 print:break-inside-avoid">
      <svg
        viewBox={`${-W / 2} ${-over} ${W} ${t + 2 * over + fs * 3}`}
        role="img"
        aria-label={`Section through the plate, to scale: a hole of ${formatNumber(entryDiameterMm)} mm at the entry face and ${formatNumber(D)} mm at its narrowest, opened from ${both ? 'both faces' : 'one face'}, in a ${formatNumber(t)} mm plate, with a ${formatNumber(d)} mm pivot tilted ${formatFixed(tiltDeg, 2)}°`}
        className="mx-auto h-auto max-h-72 w-full max-w-md"
      >
        <polygon points={side(-1)} fill="#e2cf9f" stroke="#7d5f22" strokeWidth={1} vectorEffect="non-scaling-stroke" />
        <polygon points={side(1)} fill="#e2cf9f" stroke="#7d5f22" strokeWidth={1} vectorEffect="non-scaling-stroke" />
        <rect
          x={-d / 2}
          y={t / 2 - pivotLength / 2}
          width={d}
          height={pivotLength}
          fill="#9aa7b8"
          fillOpacity={0.85}
          stroke="#2b4c7e"
          strokeWidth={1}
          vectorEffect="non-scaling-stroke"
          transform={`rotate(${tiltDeg} 0 ${t / 2})`}
        />
        <line
          x1={-W / 2}
          x2={-W / 2 + bar}
          y1={barY}
          y2={barY}
          stroke="#1f2328"
          strokeWidth={2}
          vectorEffect="non-scaling-stroke"
        />
        <text x={-W / 2 + bar + fs * 0.5} y={barY + fs * 0.35} fontSize={fs} fill="#1f2328">
          {withUnit(formatNumber(barShown), unit)}
        </text>
      </svg>
      <figcaption className="mt-2 text-sm text-muted">
        Section through the plate, to scale (brass plate, steel pivot), the entry face at the top, opened from{' '}
        {both ? 'both faces to the same mark' : 'one face'}. The taper is true to scale, so it is hard to see; the pivot
        leans as far as this hole lets it.
      </figcaption>
    </figure>
  );
}
