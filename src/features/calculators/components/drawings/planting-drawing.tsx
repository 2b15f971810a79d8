import { useId, type CSSProperties, type Ref } from 'react';
import type { PlantingResults } from '@shared/calc/planting';
import type { UnitSystem } from '@shared/schemas/user';
import { formatNumber, toDisplay, unitLabel } from '../../lib/units';
import { SHEET, sheetLayout } from './planting-sheet';

const INK = '#1f2328';
const MUTED = '#5b5f66';
const BRASS = '#a8802f';
const STEEL = '#2b4c7e';
const MONO = 'JetBrains Mono, monospace';

interface Props {
  results: PlantingResults;
  datum: { x: number; y: number };
  unitSystem: UnitSystem;
  svgRef?: Ref<SVGSVGElement>;
  testId?: string;
}

/**
 * The plate layout at 1:1: one SVG user unit is one millimetre and the SVG's width and height are given in mm, so
 * the printed sheet and the saved file are true size. On screen it is scaled to the page; the print styles put the
 * true size back. The datum lines are the axes (x = 0 and y = 0); plate y runs upwards, SVG y downwards, hence the
 * minus signs.
 */
export function PlantingDrawing({ results, datum, unitSystem, svgRef, testId = 'planting-drawing' }: Props) {
  const { arbors, depths } = results;
  const titleId = useId();
  const sheet = sheetLayout(arbors, datum);
  const left = sheet.minX - SHEET.margin;
  const top = -sheet.maxY - SHEET.margin;
  const right = left + sheet.widthMm;
  const footTop = -sheet.minY + SHEET.margin;
  const at = new Map(arbors.map((a) => [a.name, a]));
  const coord = (mm: number) => formatNumber(toDisplay(mm, 'length', unitSystem), 5);
  const unit = unitLabel('length', unitSystem);
  const size = { '--sheet-w': `${sheet.widthMm}mm`, '--sheet-h': `${sheet.heightMm}mm` } as CSSProperties;
  const barX = left + SHEET.margin;
  const barY = footTop + 5;

  return (
    <figure className="space-y-2">
      <svg
        ref={svgRef}
        xmlns="http://www.w3.org/2000/svg"
        role="img"
        aria-labelledby={titleId}
        width={`${sheet.widthMm}mm`}
        height={`${sheet.heightMm}mm`}
        viewBox={`${left} ${top} ${sheet.widthMm} ${sheet.heightMm}`}
        style={size}
        className="h-auto max-h-[70vh] w-full rounded-md border border-rule bg-white print:h-(--sheet-h) print:max-h-none print:w-(--sheet-w) print:max-w-none print:rounded-none print:border-0"
        data-testid={testId}
      >
        <title id={titleId}>{`Planting layout at 1:1, ${arbors.length} arbor${arbors.length === 1 ? '' : 's'}`}</title>
        <rect x={left} y={top} width={sheet.widthMm} height={sheet.heightMm} fill="#ffffff" />
        <g stroke={MUTED} strokeWidth={0.25} strokeDasharray="6 1.5 1 1.5" fill="none">
          <line x1={left + 4} y1={0} x2={right - 4} y2={0} />
          <line x1={0} y1={top + 4} x2={0} y2={footTop - 2} />
        </g>
        <g fill={MUTED} fontSize={SHEET.smallFont} fontFamily={MONO}>
          <text x={right - 4} y={-1} textAnchor="end">
            X datum line
          </text>
          <text x={1} y={top + 4 + SHEET.smallFont}>
            Y datum line
          </text>
        </g>
        {(datum.x !== 0 || datum.y !== 0) && (
          <g>
            <circle cx={datum.x} cy={-datum.y} r={1.2} fill="none" stroke={MUTED} strokeWidth={0.25} />
            <text
              x={datum.x + 1.5}
              y={-datum.y + SHEET.smallFont + 1}
              fontSize={SHEET.smallFont}
              fontFamily={MONO}
              fill={MUTED}
            >
              datum point
            </text>
          </g>
        )}
        <g stroke={BRASS} strokeWidth={0.2} fill="none">
          {depths.map((d) => {
            const a = at.get(d.from);
            const b = at.get(d.to);
            return a && b ? <line key={`${d.from}>${d.to}`} x1={a.x} y1={-a.y} x2={b.x} y2={-b.y} /> : null;
          })}
        </g>
        {arbors.map((a) => (
          <g key={a.name} data-arbor={a.name}>
            {a.pitchRadiusMm !== undefined && (
              <circle
                cx={a.x}
                cy={-a.y}
                r={a.pitchRadiusMm}
                fill="none"
                stroke={STEEL}
                strokeWidth={0.3}
                strokeDasharray="2 1"
              />
            )}
            <g stroke={INK} strokeWidth={0.2}>
              <line x1={a.x - SHEET.marker} y1={-a.y} x2={a.x + SHEET.marker} y2={-a.y} />
              <line x1={a.x} y1={-a.y - SHEET.marker} x2={a.x} y2={-a.y + SHEET.marker} />
            </g>
            <circle cx={a.x} cy={-a.y} r={0.5} fill={INK} />
            <text x={a.x + 1} y={-a.y - 1.2} fontSize={SHEET.font} fontFamily="Inter, sans-serif" fill={INK}>
              {a.name}
            </text>
            <text x={a.x + 1} y={-a.y + 1 + SHEET.smallFont} fontSize={SHEET.smallFont} fontFamily={MONO} fill={MUTED}>
              {`X ${coord(a.x)}, Y ${coord(a.y)} ${unit}`}
            </text>
          </g>
        ))}
        <g data-check-bar="10mm">
          <rect x={barX} y={barY} width={5} height={1.5} fill={INK} />
          <rect x={barX + 5} y={barY} width={5} height={1.5} fill="#ffffff" stroke={INK} strokeWidth={0.15} />
          <text x={barX + 12} y={barY + 1.5} fontSize={SHEET.smallFont} fontFamily={MONO} fill={INK}>
            10 mm check bar · scale 1:1
          </text>
        </g>
      </svg>
      <figcaption className="text-sm text-muted">
        Sheet {formatNumber(sheet.widthMm, 4)} × {formatNumber(sheet.heightMm, 4)} mm. Print at 100 % (not “fit to
        page”) and measure the 10 mm check bar before you mark the plate from it.
        {!sheet.fitsA4 && ' This layout is larger than an A4 page at 1:1; print it in parts or on larger paper.'}
      </figcaption>
    </figure>
  );
}
