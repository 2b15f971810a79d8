import { lazy, Suspense } from 'react';
import type { z } from 'zod';
import type { FuseeInput, FuseeResults as Results } from '@shared/calc/fusee';
import type { CalcOutput } from '@shared/calc/types';
import { Loading } from '@/components/ui/states';
import { ResultLine, ResultList, ResultRow } from '../../components/result-row';
import { formatNumber } from '../../lib/units';
import { RadiiTable } from './radii-table';

// Rounding leaves the evened torque a hair off level (1e-14 %); below a hundredth of a percent it reads as 0.
const percent = (x: number) => formatNumber(Math.abs(x) < 0.005 ? 0 : x, 3);

// recharts is large; it loads when the first readings need plotting.
const TorquePlot = lazy(() => import('../../components/plots/torque-plot').then((m) => ({ default: m.TorquePlot })));

function Note({ children }: { children: string }) {
  return <p className="mt-4 rounded-md border border-dashed border-rule p-3 text-sm text-muted">{children}</p>;
}

export function FuseeResults({ output, input }: { output: CalcOutput<Results>; input: z.output<typeof FuseeInput> }) {
  const r = output.results;
  const given = input.springLengthMm !== undefined;
  const curve = r.torqueCurve.length > 0;
  return (
    <>
      <ResultList>
        {r.springLengthMm !== null && (
          <ResultRow
            label={given ? 'Spring length (as given)' : 'Spring length at half fill'}
            value={r.springLengthMm}
            quantity="length"
            significant={5}
            main={!given}
          />
        )}
        {r.turns !== null && (
          <>
            <ResultRow label="Turns of the barrel" value={r.turns} quantity="count" unit="turns" main />
            <ResultRow label="Coils wound up, on the arbor" value={r.coilsWoundUp} quantity="count" unit="coils" />
            <ResultRow
              label="Coils run down, against the barrel"
              value={r.coilsRunDown}
              quantity="count"
              unit="coils"
            />
          </>
        )}
        {r.stiffnessNmmPerRad !== undefined && (
          <>
            <ResultRow label="Stiffness" value={r.stiffnessNmmPerRad} quantity="torque" unit="N·mm/rad" />
            <ResultRow label="Torque added per turn" value={r.torquePerTurnNmm} quantity="torque" />
          </>
        )}
        {r.chainRadiusMm !== null && (
          <ResultRow
            label="Chain radius on the barrel"
            value={r.chainRadiusMm}
            quantity="length"
            decimals={2}
            note={input.chainRadiusMm === undefined ? 'Offered from the outside diameter and the chain.' : undefined}
          />
        )}
      </ResultList>
      {!curve ? (
        <Note>Enter adjusting-rod readings to see the torque curve and the fusee radii.</Note>
      ) : (
        <div className="mt-6 space-y-4">
          <h3 className="font-serif text-lg font-semibold">Torque curve</h3>
          <Suspense fallback={<Loading label="Drawing the torque curve…" />}>
            <TorquePlot
              springTorqueNmm={r.torqueCurve.map((p) => p.springTorqueNmm)}
              fuseeTorqueNmm={r.fuseeTorqueNmm}
            />
          </Suspense>
          <ResultList>
            <ResultLine label="Spread of the torque" main>
              {percent(r.spreadBeforePercent)} %
              {r.spreadAfterPercent !== null && ` → ${percent(r.spreadAfterPercent)} %`}
            </ResultLine>
          </ResultList>
          <p className="text-sm text-muted">
            Spread is (largest − smallest) / mean: the spring alone, then at the fusee arbor with these radii.
          </p>
          {r.radiiMm.length > 0 ? (
            <RadiiTable readings={input.readings} results={r} />
          ) : (
            <Note>Enter the largest fusee radius to see the radius for every turn.</Note>
          )}
        </div>
      )}
    </>
  );
}
