import type { ReactNode } from 'react';
import type { Quantity } from '@shared/calc/types';
import { decimalsIn, formatFixed, formatNumber, toDisplay, unitLabel, withUnit } from '../lib/units';
import { useCalcForm } from './calculator-context';

/** The list the rows sit in: a definition list, so each figure is read with its name. */
export function ResultList({ children }: { children: ReactNode }) {
  return <dl className="divide-y divide-rule">{children}</dl>;
}

interface ResultRowProps {
  label: ReactNode;
  /** In the calculator's unit; null or a non-finite value shows a dash. */
  value: number | null | undefined;
  quantity: Quantity;
  unit?: string;
  significant?: number;
  /** Fixed decimals in the calculator's unit, for figures whose precision is what was measured; overrides `significant`. */
  decimals?: number;
  /** The figure the user came for: larger type. */
  main?: boolean;
  note?: ReactNode;
}

/** One result with its unit, converted to the user's units where the quantity has another. */
export function ResultRow({ label, value, quantity, unit, significant = 4, decimals, main, note }: ResultRowProps) {
  const { unitSystem } = useCalcForm();
  const shown = value === null || value === undefined ? NaN : toDisplay(value, quantity, unitSystem);
  const text =
    decimals === undefined
      ? formatNumber(shown, significant)
      : formatFixed(shown, decimalsIn(quantity, unitSystem, decimals));
  return (
    <ResultLine label={label} main={main} note={note}>
      {withUnit(text, unit ?? unitLabel(quantity, unitSystem))}
    </ResultLine>
  );
}

/** A result that is words or a composed figure (a range, a colour name) rather than one number. */
export function ResultLine({
  label,
  children,
  main,
  note,
}: {
  label: ReactNode;
  children: ReactNode;
  main?: boolean;
  note?: ReactNode;
}) {
  return (
    <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1 py-2">
      <dt className={main ? 'font-semibold text-ink' : 'text-ink'}>{label}</dt>
      <dd className={`num text-right ${main ? 'text-2xl font-semibold text-ink' : 'text-ink'}`}>{children}</dd>
      {note && <dd className="w-full text-sm text-muted">{note}</dd>}
    </div>
  );
}
