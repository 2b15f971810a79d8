import type { DividingResults as Results } from '@shared/calc/dividing';
import type { CalcOutput } from '@shared/calc/types';
import { ResultLine, ResultList } from '../../components/result-row';

export function DividingResults({ output }: { output: CalcOutput<Results> }) {
  const { solutions, turnsExact } = output.results;
  const whole = turnsExact.denominator === 1;
  return (
    <>
      <ResultList>
        <ResultLine label="Crank turns per division" main>
          {turnsExact.numerator}/{turnsExact.denominator} turn{whole && turnsExact.numerator !== 1 ? 's' : ''}
        </ResultLine>
      </ResultList>
      {solutions.length === 0 ? (
        <div role="alert" className="mt-4 rounded-md border border-error/40 bg-error/5 p-3">
          <p className="font-semibold text-error">Not possible with these circles</p>
          <p className="mt-1 text-sm text-ink">
            It needs a circle whose hole count is a multiple of {turnsExact.denominator}. Try the other plate, type in a
            circle you have, or use differential indexing.
          </p>
        </div>
      ) : (
        <div className="mt-4 overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="pb-2 text-left font-serif text-lg font-semibold text-ink">
              {solutions.length === 1 ? 'How to index' : `${solutions.length} ways to index, smallest circle first`}
            </caption>
            <thead>
              <tr className="border-b border-rule text-left align-bottom">
                <th scope="col" className="py-1 pr-2">
                  Move
                </th>
                <th scope="col" className="py-1 pr-2 text-right">
                  Whole turns
                </th>
                <th scope="col" className="py-1 pr-2 text-right">
                  Circle (holes)
                </th>
                <th scope="col" className="py-1 pr-2 text-right">
                  Holes to move
                </th>
                <th scope="col" className="py-1 text-right">
                  Sector arms (spaces)
                </th>
              </tr>
            </thead>
            <tbody className="num">
              {solutions.map((s) => (
                <tr key={s.circle} className="border-b border-rule/60" data-testid="indexing-row">
                  <th scope="row" className="py-1 pr-2 text-left font-semibold">
                    {s.fraction}
                  </th>
                  <td className="py-1 pr-2 text-right">{s.wholeTurns}</td>
                  <td className="py-1 pr-2 text-right">{whole ? 'any' : s.circle}</td>
                  <td className="py-1 pr-2 text-right">{s.holes}</td>
                  <td className="py-1 text-right">{whole ? '—' : s.sectorSpaces}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="mt-2 text-sm text-ink">{solutions[0].instruction}.</p>
        </div>
      )}
    </>
  );
}
