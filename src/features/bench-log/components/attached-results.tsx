import { Link } from 'react-router-dom';
import { calculators } from '@shared/calc/index';
import { isCalculatorName } from '@shared/calc/names';
import type { LogEntryDTO } from '@shared/schemas/log-entry';
import { paths } from '@/config/paths';
import { resultLines } from '../lib/result-lines';

/** Saved calculator results attached to an entry: the main figures, and a link to the calculator for the working. */
export function AttachedResults({ calculations }: { calculations: LogEntryDTO['calculations'] }) {
  if (calculations.length === 0) return <p className="text-muted">No saved results attached.</p>;
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {calculations.map((c) => {
        const name = c.calculator;
        return (
          <li key={c.id} className="rounded-md border border-rule bg-white p-3">
            <p className="font-semibold">{c.title}</p>
            <p className="text-sm text-muted">
              {isCalculatorName(name) ? <Link to={paths.calculator(name)}>{calculators[name].title}</Link> : name}
            </p>
            <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
              {resultLines(c.results).map((line) => (
                <div key={line.label} className="contents">
                  <dt>{line.label}</dt>
                  <dd className="num text-right">{line.value}</dd>
                </div>
              ))}
            </dl>
            {c.warnings.length > 0 && (
              <ul className="mt-2 list-disc pl-5 text-sm text-rework">
                {c.warnings.map((w) => (
                  <li key={w}>{w}</li>
                ))}
              </ul>
            )}
          </li>
        );
      })}
    </ul>
  );
}
