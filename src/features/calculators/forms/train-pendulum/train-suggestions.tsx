import { lengthForBeats, type TrainPendulumResults } from '@shared/calc/train-pendulum';
import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { decimalsIn, formatFixed, formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';
import { joinCells } from './train-cells';

type Suggestion = NonNullable<TrainPendulumResults['suggestions']>[number];

/** Trains that give the wanted beat, best first, each with a button that puts its counts into the train rows. */
export function TrainSuggestions({ suggestions, gravity }: { suggestions: Suggestion[]; gravity: number }) {
  const { setFields, unitSystem } = useCalcForm();
  if (suggestions.length === 0) return null;
  const length = (bph: number) =>
    withUnit(
      // To 0.1 mm, as a pendulum is measured.
      formatFixed(toDisplay(lengthForBeats(bph, gravity), 'length', unitSystem), decimalsIn('length', unitSystem, 1)),
      unitLabel('length', unitSystem),
    );
  return (
    <section className="mt-4 space-y-2" aria-labelledby="train-suggestions-title">
      <h3 id="train-suggestions-title" className="font-serif text-lg font-semibold">
        Trains for {formatNumber(suggestions[0].beatsPerHour, 6)} beats/h
      </h3>
      <p className="text-sm text-muted">
        Fewest small pinions first, then the least cutting, then the most even ratios. Pendulum{' '}
        {length(suggestions[0].beatsPerHour)}.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead>
            <tr className="border-b border-rule text-left">
              <th scope="col" className="py-1 pr-2">
                Wheels (teeth)
              </th>
              <th scope="col" className="py-1 pr-2">
                Pinions (leaves)
              </th>
              <th scope="col" className="py-1 pr-2">
                Escape (teeth)
              </th>
              <th scope="col" className="no-print py-1">
                <span className="sr-only">Use</span>
              </th>
            </tr>
          </thead>
          <tbody className="num">
            {suggestions.map((s) => {
              const label = `${s.wheelTeeth.join(' · ')} / ${s.pinionLeaves.join(' · ')}, escape ${s.escapeTeeth}`;
              return (
                <tr key={label} className="border-b border-rule/60">
                  <td className="py-1 pr-2">{s.wheelTeeth.join(' · ')}</td>
                  <td className="py-1 pr-2">{s.pinionLeaves.join(' · ')}</td>
                  <td className="py-1 pr-2">{s.escapeTeeth}</td>
                  <td className="no-print py-1 text-right">
                    <Button
                      variant="quiet"
                      aria-label={`Use the train ${label}`}
                      onClick={() =>
                        setFields({
                          wheelTeeth: joinCells(s.wheelTeeth),
                          pinionLeaves: joinCells(s.pinionLeaves),
                          escapeTeeth: String(s.escapeTeeth),
                        })
                      }
                    >
                      Use this train
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </section>
  );
}
