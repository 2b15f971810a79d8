import { useState, type ReactNode } from 'react';
import type { Quantity } from '@shared/calc/types';
import type { UnitSystem } from '@shared/schemas/user';
import { FieldShell } from '@/components/ui/field';
import { describeIssue } from '../lib/describe-issue';
import { formatNumber, fromDisplay, INPUT_FIGURES, toDisplay, unitLabel } from '../lib/units';
import { useCalcForm } from './calculator-context';

interface NumberFieldProps {
  /** The draft key (usually the calculator input's name). */
  name: string;
  label: ReactNode;
  quantity: Quantity;
  /** Overrides the unit shown, for quantities without one of their own (e.g. "mm/mm" for a taper). */
  unit?: string;
  hint?: ReactNode;
  /** Shows the schema issue of another key here, when this field feeds a derived input (e.g. a taper from diameters). */
  issueKey?: string;
  /** Issues under the field's own name come from the schema; a form may also pass one it found itself. */
  error?: string;
}

/** The draft holds mm/°C/g; the field shows and takes the user's units, converting only what they type. */
function toText(canonical: string, quantity: Quantity, system: UnitSystem): string {
  const n = Number(canonical);
  if (canonical.trim() === '' || !Number.isFinite(n)) return canonical;
  return system === 'metric' ? canonical : formatNumber(toDisplay(n, quantity, system), INPUT_FIGURES);
}

function toCanonical(text: string, quantity: Quantity, system: UnitSystem): string {
  const n = Number(text.trim().replace(',', '.'));
  if (text.trim() === '' || !Number.isFinite(n) || system === 'metric') return text;
  return String(Number(fromDisplay(n, quantity, system).toPrecision(12)));
}

/**
 * A number input bound to the calculator draft, with its unit beside it and the schema's complaint in plain words.
 * A text input rather than type="number", so that "0," or "1." can be typed on the way to a number.
 */
export function NumberField({ name, label, quantity, unit, hint, issueKey, error }: NumberFieldProps) {
  const { draft, setField, issues, unitSystem } = useCalcForm();
  const canonical = draft[name] ?? '';
  const [shown, setShown] = useState({ text: toText(canonical, quantity, unitSystem), canonical, unitSystem });
  // Follow changes made elsewhere (unit toggle, reopened result) without disturbing what is being typed.
  if (shown.canonical !== canonical || shown.unitSystem !== unitSystem) {
    setShown({ text: toText(canonical, quantity, unitSystem), canonical, unitSystem });
  }
  const issue = issues[issueKey ?? name];
  const message = error ?? (issue ? describeIssue(issue, quantity, unitSystem) : undefined);
  const suffix = unit ?? unitLabel(quantity, unitSystem);
  return (
    <FieldShell
      label={
        <>
          {label}
          {suffix && <span className="num font-normal text-muted"> ({suffix})</span>}
        </>
      }
      hint={hint}
      error={message}
    >
      {({ id, describedBy, invalid }) => (
        <div className="flex items-stretch">
          <input
            id={id}
            name={name}
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            aria-describedby={describedBy}
            aria-invalid={invalid}
            value={shown.text}
            onChange={(e) => {
              const next = toCanonical(e.target.value, quantity, unitSystem);
              setShown({ text: e.target.value, canonical: next, unitSystem });
              setField(name, next);
            }}
            className={`num block min-h-11 w-full ${suffix ? 'rounded-l-md' : 'rounded-md'} border border-rule bg-white px-3 py-2 text-ink shadow-inner focus:border-steel aria-[invalid=true]:border-error print:border-0 print:shadow-none`}
          />
          {suffix && (
            <span
              aria-hidden
              className="num flex min-w-12 items-center justify-center rounded-r-md border border-l-0 border-rule bg-paper px-2 text-sm text-muted print:border-0"
            >
              {suffix}
            </span>
          )}
        </div>
      )}
    </FieldShell>
  );
}
