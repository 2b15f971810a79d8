import { ExternalLink } from 'lucide-react';
import { Link } from 'react-router-dom';
import { calculators, isCalculatorName } from '@shared/calc/index';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';
import { FORMS } from '../forms';
import { CalculatorShell } from './calculator-shell';

/**
 * Any calculator by name, for embedding (a lesson's `::calculator{name="broach-taper"}`). The inputs stay in the
 * widget rather than the page address, so two calculators on one page do not fight over it.
 */
export function CalculatorWidget({ name }: { name: string }) {
  if (!isCalculatorName(name)) {
    return (
      <Card role="note" className="text-muted">
        There is no calculator called “{name}”.
      </Card>
    );
  }
  const calculator = calculators[name];
  const form = FORMS[name];
  const header = (
    <div>
      <p className="font-serif text-xl font-semibold text-ink">{calculator.title} calculator</p>
      {form && (
        <Link to={paths.calculator(name)} className="no-print inline-flex min-h-11 items-center gap-1 text-sm">
          Open on its own page <ExternalLink className="size-3.5" aria-hidden />
        </Link>
      )}
    </div>
  );
  if (!form) {
    return (
      <Card>
        {header}
        <p className="mt-2 text-muted">{calculator.summary}</p>
        <p className="mt-2 text-sm text-muted">The form for this calculator is still being made.</p>
      </Card>
    );
  }
  return (
    <div className="not-prose rounded-lg border border-rule bg-paper p-4">
      <CalculatorShell form={form} header={header} />
    </div>
  );
}
