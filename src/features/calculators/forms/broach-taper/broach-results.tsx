import type { z } from 'zod';
import type { BroachTaperInput, BroachTaperResults } from '@shared/calc/broach-taper';
import type { CalcOutput } from '@shared/calc/types';
import { ResultList, ResultRow } from '../../components/result-row';
import { BroachSection } from './broach-section';

export function BroachResults({
  output,
  input,
}: {
  output: CalcOutput<BroachTaperResults>;
  input: z.output<typeof BroachTaperInput>;
}) {
  const r = output.results;
  const both = input.openedFrom === 'both';
  return (
    <>
      <ResultList>
        <ResultRow
          label="Insertion depth"
          value={r.insertionDepthMm}
          quantity="length"
          main
          note="Along the broach from your reference mark: stop when the mark reaches the face the broach enters."
        />
        <ResultRow
          label="Hole at the entry face"
          value={r.entryDiameterMm}
          quantity="length"
          note={
            both
              ? 'Each face, with the narrowest point at mid-plate.'
              : 'The face the broach enters; the far face is the narrowest.'
          }
        />
        {r.cuttingFactor !== 1 && (
          <ResultRow
            label="Cutting diameter ÷ micrometer reading"
            value={r.cuttingFactor}
            quantity="ratio"
            unit="×"
            note="The corners cut a larger circle than the micrometer spans corner to flat."
          />
        )}
        <ResultRow label="Taper left, opened from one side" value={r.oneSideTaperMm} quantity="length" />
        <ResultRow label="Taper left, opened from both sides" value={r.twoSideTaperMm} quantity="length" />
        <ResultRow
          label="Diametral clearance (side shake) at the narrowest point"
          value={r.clearanceMm}
          quantity="length"
        />
        <ResultRow label="Radial shake" value={r.radialShakeMm} quantity="length" />
        <ResultRow
          label="Clearance as a share of the pivot"
          value={r.clearancePercent}
          quantity="ratio"
          unit="%"
          significant={3}
        />
        <ResultRow label="Tilt of the pivot in one hole" value={r.tiltDeg} quantity="angle" decimals={2} />
        <ResultRow label="Tilt, small-angle form" value={r.tiltSmallAngleDeg} quantity="angle" decimals={2} />
        <ResultRow label="Half-angle of the cutting broach" value={r.halfAngleDeg} quantity="angle" decimals={2} />
      </ResultList>
      <BroachSection input={input} entryDiameterMm={r.entryDiameterMm} tiltDeg={r.tiltDeg} />
    </>
  );
}
