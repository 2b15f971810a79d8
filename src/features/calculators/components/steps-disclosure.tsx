import { useEffect, useState } from 'react';
import type { CalcStep } from '@shared/calc/types';

/**
 * The working behind the figures and what the formulas take for granted, folded away until asked for. It opens by
 * itself for printing, so that a bench sheet carries its working.
 */
export function StepsDisclosure({
  steps,
  assumptions,
  imperial,
}: {
  steps: readonly CalcStep[];
  assumptions: readonly string[];
  /** The working stays in the calculator's own units; imperial users are told so. */
  imperial?: boolean;
}) {
  const [open, setOpen] = useState(false);
  useEffect(() => {
    const openForPrint = () => setOpen(true);
    window.addEventListener('beforeprint', openForPrint);
    return () => window.removeEventListener('beforeprint', openForPrint);
  }, []);
  return (
    <details
      open={open}
      onToggle={(e) => setOpen(e.currentTarget.open)}
      className="rounded-lg border border-rule bg-card p-4 print:border-0 print:p-0"
    >
      <summary className="min-h-11 cursor-pointer content-center font-serif text-lg font-semibold text-ink">
        How the figures are worked out
      </summary>
      {imperial && steps.length > 0 && (
        <p className="mt-2 text-sm text-muted">The working is shown in the calculator’s own units: mm, °C and g.</p>
      )}
      {steps.length > 0 && (
        <table className="mt-3 w-full border-collapse text-sm">
          <caption className="sr-only">Formula steps</caption>
          <thead>
            <tr className="border-b border-rule text-left text-muted">
              <th scope="col" className="py-1 pr-3 font-semibold">
                Step
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Formula
              </th>
              <th scope="col" className="py-1 text-right font-semibold">
                Result
              </th>
            </tr>
          </thead>
          <tbody>
            {steps.map((s, i) => (
              <tr key={`${i}-${s.label}`} className="border-b border-rule/70 align-top">
                <td className="py-1.5 pr-3">{s.label}</td>
                <td className="num py-1.5 pr-3">{s.formula}</td>
                <td className="num py-1.5 text-right">{s.result}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <h3 className="mt-4 text-base font-semibold">What the formulas assume</h3>
      <ul className="mt-1 list-disc space-y-1 pl-6 text-sm">
        {assumptions.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </details>
  );
}

export function SourcesList({ sources }: { sources: readonly string[] }) {
  if (sources.length === 0) return null;
  return (
    <section aria-label="Sources" className="text-sm text-muted">
      <h3 className="text-base font-semibold text-ink">Sources</h3>
      <ul className="mt-1 list-disc space-y-0.5 pl-6">
        {sources.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
    </section>
  );
}
