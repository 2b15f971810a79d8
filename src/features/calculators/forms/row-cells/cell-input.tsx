import { useId, useState } from 'react';
import type { Quantity } from '@shared/calc/types';
import type { UnitSystem } from '@shared/schemas/user';
import { useCalcForm } from '../../components/calculator-context';
import { formatNumber, fromDisplay, INPUT_FIGURES, toDisplay, unitLabel } from '../../lib/units';

interface CellInputProps {
  /** Read by screen readers, and shown above the box unless the table header already says it. */
  label: string;
  /** The cell as draft text in the calculator's unit (mm, g); "" when blank. */
  value: string;
  onChange(canonical: string): void;
  quantity: Quantity;
  error?: string;
  showLabel?: boolean;
  /** Free text (an arbor's name) rather than a number. */
  text?: boolean;
}

function shownText(canonical: string, quantity: Quantity, system: UnitSystem): string {
  const n = Number(canonical);
  if (canonical.trim() === '' || !Number.isFinite(n) || system === 'metric') return canonical;
  return formatNumber(toDisplay(n, quantity, system), INPUT_FIGURES);
}

function canonicalText(typed: string, quantity: Quantity, system: UnitSystem): string {
  const n = Number(typed.trim().replace(',', '.'));
  if (typed.trim() === '' || !Number.isFinite(n) || system === 'metric') return typed;
  return String(Number(fromDisplay(n, quantity, system).toPrecision(12)));
}

/**
 * One cell of a row editor (a reading, a train row, an arbor): the same unit handling as a NumberField, for values
 * kept inside a list in the draft rather than under a key of their own.
 */
export function CellInput({ label, value, onChange, quantity, error, showLabel, text }: CellInputProps) {
  const { unitSystem } = useCalcForm();
  const id = useId();
  const [shown, setShown] = useState({ text: shownText(value, quantity, unitSystem), value, unitSystem });
  // Follow changes made elsewhere (the unit toggle, a chosen train) without disturbing what is being typed.
  if (shown.value !== value || shown.unitSystem !== unitSystem) {
    setShown({ text: text ? value : shownText(value, quantity, unitSystem), value, unitSystem });
  }
  const unit = text ? '' : unitLabel(quantity, unitSystem);
  const fullLabel = unit ? `${label} (${unit})` : label;
  return (
    <div className="min-w-0 space-y-1">
      <label htmlFor={id} className={showLabel ? 'block text-sm font-semibold text-ink' : 'sr-only'}>
        {fullLabel}
      </label>
      <input
        id={id}
        inputMode={text ? 'text' : 'decimal'}
        autoComplete="off"
        spellCheck={false}
        aria-invalid={Boolean(error)}
        aria-describedby={error ? `${id}-error` : undefined}
        value={shown.text}
        onChange={(e) => {
          const next = text ? e.target.value : canonicalText(e.target.value, quantity, unitSystem);
          setShown({ text: e.target.value, value: next, unitSystem });
          onChange(next);
        }}
        className={`${text ? '' : 'num'} block min-h-11 w-full rounded-md border border-rule bg-white px-2 py-2 text-ink shadow-inner focus:border-steel aria-[invalid=true]:border-error print:border-0 print:shadow-none`}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-error">
          {error}
        </p>
      )}
    </div>
  );
}
