import { lazy, Suspense } from 'react';
import { Calculator } from 'lucide-react';

// The calculators carry their forms, drawings and plots: loaded only when a lesson actually embeds one.
const CalculatorWidget = lazy(() =>
  import('@/features/calculators/components/calculator-widget').then((m) => ({ default: m.CalculatorWidget })),
);

function CalculatorLoading({ name }: { name: string }) {
  return (
    <div
      role="status"
      className="flex min-h-24 items-center gap-3 rounded-lg border border-dashed border-rule p-4 text-muted"
    >
      <Calculator className="size-5 text-brass" aria-hidden />
      Loading the {name.replace(/-/g, ' ')} calculator…
    </div>
  );
}

/** A live calculator inside a lesson (`::calculator{name="..."}`). */
export function CalculatorEmbed({ name }: { name: string }) {
  return (
    <div className="not-prose my-8" data-calculator-embed={name}>
      <Suspense fallback={<CalculatorLoading name={name} />}>
        <CalculatorWidget name={name} />
      </Suspense>
    </div>
  );
}
