import { lazy, Suspense } from 'react';
import type { z } from 'zod';
import { WORKING_SHARE } from '@shared/calc/click-spring';
import type { SpringTemperInput, SpringTemperResults } from '@shared/calc/spring-temper';
import type { CalcOutput } from '@shared/calc/types';
import { Loading } from '@/components/ui/states';
import { useCalcForm } from '../../components/calculator-context';
import { ResultLine, ResultList, ResultRow } from '../../components/result-row';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';
import { BrassTable } from './brass-table';
import { Swatch, TemperSwatches } from './temper-swatches';

// recharts is large; only the steel view needs it, so it loads when that view first shows.
const HardnessPlot = lazy(() => import('./hardness-plot'));

type Of<M> = Extract<SpringTemperResults, { mode: M }>;

function SteelResults({ r, tempC }: { r: Of<'steel'>; tempC: number | undefined }) {
  const { unitSystem } = useCalcForm();
  const temp = (c: number) =>
    withUnit(formatNumber(toDisplay(c, 'temperature', unitSystem)), unitLabel('temperature', unitSystem));
  const h = r.hardening;
  return (
    <>
      <ResultList>
        <ResultLine label="Harden at" note={h.source}>
          {temp(h.temperatureC.min)} to {temp(h.temperatureC.max)}
        </ResultLine>
        <ResultLine label="Quench in">{h.quench}</ResultLine>
        {h.asQuenchedHrc !== null && (
          <ResultRow label="Hardness as quenched" value={h.asQuenchedHrc} quantity="count" unit="HRC" decimals={0} />
        )}
        {r.colourForTemperature && (
          <ResultLine label="Temper colour at that heat" main>
            <Swatch band={r.colourForTemperature} /> {r.colourForTemperature.name}
          </ResultLine>
        )}
        {r.hardnessAtTemperatureHrc !== null && (
          <ResultRow
            label="Hardness after tempering"
            value={r.hardnessAtTemperatureHrc}
            quantity="count"
            unit="HRC"
            decimals={0}
            note="Read off a straight line between the table’s points, to the whole HRC a hardness test reads."
          />
        )}
        {r.springTemper && (
          <ResultLine
            label="Temper for a flat spring (about 44–50 HRC)"
            note={`${r.springTemper.source}. Use a thermometer or oven: no temper colour shows this heat.`}
          >
            {temp(r.springTemper.temperatureC.min)} to {temp(r.springTemper.temperatureC.max)}, {r.springTemper.hrc.max}
            –{r.springTemper.hrc.min} HRC
          </ResultLine>
        )}
        {r.temperatureForColour && (
          <ResultRow
            label={`Temperature for ${r.temperatureForColour.name.toLowerCase()}`}
            value={r.temperatureForColour.tempC}
            quantity="temperature"
            main
          />
        )}
      </ResultList>
      <TemperSwatches bands={r.temperColours} marked={[r.colourForTemperature, r.temperatureForColour]} />
      {r.hardnessCurve.length > 0 && (
        <Suspense fallback={<Loading label="Drawing the hardness curve…" />}>
          <HardnessPlot
            steel={r.steel}
            points={r.hardnessCurve}
            source={r.hardnessCurveSource ?? ''}
            mark={
              r.hardnessAtTemperatureHrc === null || tempC === undefined
                ? null
                : { tempC, hrc: r.hardnessAtTemperatureHrc }
            }
          />
        </Suspense>
      )}
    </>
  );
}

function BrassResults({ r }: { r: Of<'brass'> }) {
  const s = r.strength;
  return (
    <>
      <ResultList>
        <ResultRow
          label="Thickness reduction"
          value={r.reductionPercent}
          quantity="ratio"
          unit="%"
          significant={4}
          main
        />
        <ResultLine label="Temper">{r.temperName}</ResultLine>
        {r.publishedReductionPercent !== null && (
          <ResultRow
            label="Published reduction for this temper"
            value={r.publishedReductionPercent}
            quantity="ratio"
            unit="%"
            note="Precision Steel Warehouse table (rounded)."
          />
        )}
        <ResultLine label="Tensile strength (C26000 strip)">
          {s.tensileMPa.min}–{s.tensileMPa.max}&nbsp;MPa
        </ResultLine>
        <ResultRow label="Yield strength (C26000 strip)" value={s.yieldMPa} quantity="stress" note={s.note} />
      </ResultList>
      <BrassTable current={r.temperName} />
    </>
  );
}

function ClickSpringResults({ r }: { r: Of<'click-spring'> }) {
  const { unitSystem } = useCalcForm();
  return (
    <ResultList>
      {r.forceN === null ? (
        <ResultLine label="Force at the tip" main note="Past the elastic limit the spring sets or breaks first.">
          not reached
        </ResultLine>
      ) : (
        <ResultRow label="Force at the tip" value={r.forceN} quantity="force" main />
      )}
      <ResultRow
        label={r.forceN === null ? 'Root stress, by the elastic formula' : 'Root stress'}
        value={r.stressMPa}
        quantity="stress"
      />
      <ResultRow label="Stiffness" value={r.stiffnessNPerMm} quantity="force" unit="N/mm" />
      {r.stressToYield !== null && (
        <ResultRow
          label="Share of the elastic limit used"
          value={r.stressToYield * 100}
          quantity="ratio"
          unit="%"
          significant={3}
          note={`Keep a click spring under ${WORKING_SHARE * 100} %: it flexes at every click.`}
        />
      )}
      {r.deflectionAtWorkingShareMm !== null && (
        <ResultLine label={`Deflection at ${WORKING_SHARE * 100} % of the elastic limit`}>
          {withUnit(
            formatNumber(toDisplay(r.deflectionAtWorkingShareMm, 'length', unitSystem)),
            unitLabel('length', unitSystem),
          )}
        </ResultLine>
      )}
    </ResultList>
  );
}

export function SpringResults({
  output,
  input,
}: {
  output: CalcOutput<SpringTemperResults>;
  input: z.output<typeof SpringTemperInput>;
}) {
  const r = output.results;
  if (r.mode === 'brass') return <BrassResults r={r} />;
  if (r.mode === 'click-spring') return <ClickSpringResults r={r} />;
  return <SteelResults r={r} tempC={input.mode === 'steel' ? input.temperatureC : undefined} />;
}
