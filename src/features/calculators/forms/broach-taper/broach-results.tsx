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
  return (
    <>
      <ResultList>
        <ResultRow
          label="Insertion depth"
          value={r.insertionDepthMm}
          quantity="length"
          main
          note="Along the broach from your reference mark: stop when the mark reaches the plate face."
        />
        <ResultRow label="Taper left, opened from one side" value={r.oneSideTaperMm} quantity="length" />
        <ResultRow label="Taper left, opened from both sides" value={r.twoSideTaperMm} quantity="length" />
        <ResultRow label="Diametral clearance (side shake)" value={r.clearanceMm} quantity="length" />
        <ResultRow label="Radial shake" value={r.radialShakeMm} quantity="length" />
        <ResultRow
          label="Clearance as a share of the pivot"
          value={r.clearancePercent}
          quantity="ratio"
          unit="%"
          significant={3}
        />
        <ResultRow label="Tilt of the pivot in one hole" value={r.tiltDeg} quantity="angle" />
        <ResultRow label="Tilt, small-angle form" value={r.tiltSmallAngleDeg} quantity="angle" />
        <ResultRow label="Half-angle of the broach" value={r.halfAngleDeg} quantity="angle" />
      </ResultList>
      <BroachSection input={input} tiltDeg={r.tiltDeg} />
    </>
  );
}
