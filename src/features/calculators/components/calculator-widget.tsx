import { ExternalLink } from 'lucide-react';
import { Suspense } from 'react';
import { Link } from 'react-router-dom';
import { isCalculatorName, type CalculatorName } from '@shared/calc/names';
import { Card } from '@/components/ui/card';
import { Loading } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useCalculatorForm } from '../forms/load-form';
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
  // The lesson's text shows at once; only the calculator waits for its own chunk.
  return (
    <Suspense fallback={<Loading label="Loading the calculator…" />}>
      <EmbeddedCalculator name={name} />
    </Suspense>
  );
}

function EmbeddedCalculator({ name }: { name: CalculatorName }) {
  const form = useCalculatorForm(name);
  const header = (
    <div>
      <p className="font-serif text-xl font-semibold text-ink">{form.calculator.title} calculator</p>
      <Link to={paths.calculator(name)} className="no-print inline-flex min-h-11 items-center gap-1 text-sm">
        Open on its own page <ExternalLink className="size-3.5" aria-hidden />
      </Link>
    </div>
  );
  return (
    <div className="not-prose rounded-lg border border-rule bg-paper p-4">
      <CalculatorShell form={form} header={header} />
    </div>
  );
}
