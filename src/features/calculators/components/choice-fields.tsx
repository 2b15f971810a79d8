import { useId, type ReactNode } from 'react';
import { SelectField, TextField } from '@/components/ui/field';
import { useCalcForm } from './calculator-context';

export interface Choice {
  value: string;
  label: string;
}

/** A drop-down bound to the calculator draft: a material, a table row, or "typed in". */
export function ChoiceField({
  name,
  label,
  choices,
  hint,
}: {
  name: string;
  label: ReactNode;
  choices: readonly Choice[];
  hint?: ReactNode;
}) {
  const { draft, setField, issues } = useCalcForm();
  return (
    <SelectField
      label={label}
      hint={hint}
      name={name}
      value={draft[name] ?? ''}
      error={issues[name]?.message}
      onChange={(e) => setField(name, e.target.value)}
    >
      {choices.map((c) => (
        <option key={c.value} value={c.value}>
          {c.label}
        </option>
      ))}
    </SelectField>
  );
}

/** A row of large radio buttons for a calculator's modes; the choice lives in the draft like any input. */
export function ModeChoice({ name, legend, choices }: { name: string; legend: string; choices: readonly Choice[] }) {
  const { draft, setField } = useCalcForm();
  const group = useId();
  return (
    <fieldset className="space-y-1">
      <legend className="text-sm font-semibold text-ink">{legend}</legend>
      <div className="flex flex-wrap gap-2">
        {choices.map((c) => (
          <label
            key={c.value}
            className="relative flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-white px-3 text-sm has-[:checked]:border-steel has-[:checked]:bg-steel/10 has-[:checked]:font-semibold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-steel"
          >
            <input
              type="radio"
              className="absolute inset-0 cursor-pointer appearance-none opacity-0"
              name={`${group}-${name}`}
              value={c.value}
              checked={(draft[name] ?? '') === c.value}
              onChange={() => setField(name, c.value)}
            />
            {c.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** Free text bound to the draft (a ratio such as "1:50"); the form turns it into an input and names the problem. */
export function TextInputField({
  name,
  label,
  hint,
  error,
}: {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
}) {
  const { draft, setField } = useCalcForm();
  return (
    <TextField
      label={label}
      hint={hint}
      error={error}
      name={name}
      autoComplete="off"
      spellCheck={false}
      className="num"
      value={draft[name] ?? ''}
      onChange={(e) => setField(name, e.target.value)}
    />
  );
}
