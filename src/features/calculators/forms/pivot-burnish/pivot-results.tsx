import type { PivotBurnishResults } from '@shared/calc/pivot-burnish';
import type { CalcOutput } from '@shared/calc/types';
import { ResultList, ResultRow } from '../../components/result-row';

export function PivotResults({ output }: { output: CalcOutput<PivotBurnishResults> }) {
  const r = output.results;
  return (
    <ResultList>
      <ResultRow label="Bending stress at the shoulder" value={r.bendingStressMPa} quantity="stress" main />
      <ResultRow
        label="Safety factor on bending"
        value={r.safetyFactor}
        quantity="ratio"
        unit="×"
        significant={3}
        note="Allowable stress ÷ working (bending) stress; below 1 the pivot may bend or snap."
      />
      <ResultRow label="Smallest safe diameter" value={r.minDiameterMm} quantity="length" />
      <ResultRow label="Projected bearing pressure" value={r.bearingPressureMPa} quantity="stress" />
      <ResultRow label="Friction torque" value={r.frictionTorqueNmm} quantity="torque" />
      <ResultRow
        label="Spindle speed for turning"
        value={r.spindleRpm}
        quantity="rpm"
        note="Burnish slowly; on small work the lathe’s top speed is usually the limit."
      />
    </ResultList>
  );
}
