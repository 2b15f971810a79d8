import type { z } from 'zod';
import type { TrainPendulumInput, TrainPendulumResults } from '@shared/calc/train-pendulum';
import type { CalcOutput } from '@shared/calc/types';
import { ResultList, ResultRow } from '../../components/result-row';
import { TrainSuggestions } from './train-suggestions';

export function TrainResults({
  output,
  input,
}: {
  output: CalcOutput<TrainPendulumResults>;
  input: z.output<typeof TrainPendulumInput>;
}) {
  const r = output.results;
  return (
    <>
      <ResultList>
        <ResultRow label="Beats per hour" value={r.beatsPerHour} quantity="count" unit="beats/h" significant={6} main />
        <ResultRow label="Full period (there and back)" value={r.periodS} quantity="time" significant={6} />
        <ResultRow label="One beat" value={r.periodS / 2} quantity="time" significant={6} />
        <ResultRow
          label="Theoretical pendulum length"
          value={r.pendulumLengthMm}
          quantity="length"
          decimals={1}
          main
          note={`Simple pendulum at ${input.gravity} m/s², from the suspension point to the centre of oscillation.`}
        />
        {r.equivalentLengthMm !== undefined && (
          <>
            <ResultRow
              label="Your pendulum's equivalent simple length"
              value={r.equivalentLengthMm}
              quantity="length"
              decimals={1}
            />
            <ResultRow label="Your pendulum's full period" value={r.physicalPeriodS} quantity="time" significant={6} />
          </>
        )}
      </ResultList>
      {r.suggestions && <TrainSuggestions suggestions={r.suggestions} gravity={input.gravity} />}
    </>
  );
}
