/**
 * The calculator shell: one frame for every bench calculator.
 *
 * It keeps the form's draft (in the page address when `syncUrl`, so a result can be shared), parses it with the
 * calculator's schema on every change and runs `compute` in the browser. Bad input shows as field errors and no
 * results, never NaN. Around the form it puts the unit toggle (remembered on the account), the results with their
 * warnings, the save button (apprentices), the working and assumptions in a disclosure, the cautions and the sources,
 * and print styles for a bench sheet.
 *
 * Adding a calculator form (e.g. for `wheel-pinion`):
 * 1. Make `src/features/calculators/forms/wheel-pinion/` with an `index.ts` exporting
 *    `wheelPinionForm = defineForm({ calculator, initial, toInput, fromInput?, Inputs, Results })` (lib/define-form.ts).
 *    - `initial`: every draft key the form reads, as text in mm / °C / g: `{ moduleMm: '0.5', wheelTeeth: '64' }`.
 *    - `toInput(draft)`: build the calculator input with `num()` and `list()` from lib/draft.ts. Do not validate;
 *      blanks stay undefined and bad text becomes NaN, and the schema reports both on the field.
 *    - `fromInput(input)`: only when the draft has keys the input lacks (a "typed in / from the table" choice),
 *      so that a reopened saved result lands on the same choice.
 * 2. `Inputs`: a component of fields that read and write the draft through `useCalcForm()`:
 *    - `<NumberField name="moduleMm" label="Module" quantity="length" />` converts mm/in, °C/°F, g/oz and shows
 *      the schema issue for `name` (or for `issueKey`); give `unit` for quantities without one (e.g. "mm/mm").
 *    - `<ChoiceField>` (drop-down), `<ModeChoice>` (radio row for modes), `<TextInputField>` (free text).
 *    - For lists of rows, keep a JSON or comma list under one key and read `issues['readings.2.massG']`.
 * 3. `Results({ output, input })`: `<ResultList>` of `<ResultRow label value quantity />` (units converted, a dash
 *    for anything not finite) and `<ResultLine>` for words; drawings as SVG in mm with a viewBox (they print to
 *    scale), plots with recharts loaded through React.lazy. Warnings, steps, cautions and sources are drawn by the
 *    shell; do not repeat them.
 * 4. Add the form to `FORMS` in forms/index.ts. The index page links it, /calculators/<name> shows it, saved
 *    results reopen into it and `::calculator{name="wheel-pinion"}` embeds it through <CalculatorWidget>.
 * 5. Test it like tests/client/calculator-shell.test.tsx: type, read a figure with its unit, check an error.
 */
import { useMemo, useState, type ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { CalcOutput } from '@shared/calc/types';
import { Card } from '@/components/ui/card';
import { useUnitSystem } from '../api/use-unit-system';
import type { AnyCalculatorForm } from '../lib/define-form';
import { collectIssues, type Draft, type FieldIssues } from '../lib/draft';
import { CalculatorCautions } from './caution-box';
import { CalcFormContext, type CalcFormState } from './calculator-context';
import { SaveResultButton } from './save-result-button';
import { SourcesList, StepsDisclosure } from './steps-disclosure';
import { UnitToggle } from './unit-toggle';
import { WarningsList } from './warnings-list';

interface Evaluation {
  /** What toInput built: sent as is when saving, so that the server parses exactly what the browser parsed. */
  candidate: Record<string, unknown> | null;
  input: unknown;
  output: CalcOutput<unknown> | null;
  issues: FieldIssues;
}

function evaluate(form: AnyCalculatorForm, draft: Draft): Evaluation {
  const candidate = form.toInput(draft) as Record<string, unknown>;
  const parsed = form.calculator.inputSchema.safeParse(candidate);
  if (!parsed.success) return { candidate: null, input: null, output: null, issues: collectIssues(parsed.error) };
  try {
    return { candidate, input: parsed.data, output: form.calculator.compute(candidate), issues: {} };
  } catch {
    const issue = { code: 'custom', message: 'These inputs could not be worked out; check them.' };
    return { candidate: null, input: null, output: null, issues: { _: issue } };
  }
}

/** The draft in the page address (merged over the form's starting values), or in component state. */
function useDraft(initial: Draft, syncUrl: boolean): [Draft, (update: (d: Draft) => Draft) => void] {
  const [params, setParams] = useSearchParams();
  const [local, setLocal] = useState(initial);
  const fromUrl = useMemo(() => ({ ...initial, ...Object.fromEntries(params) }), [initial, params]);
  if (!syncUrl) return [local, setLocal];
  return [
    fromUrl,
    (update) =>
      setParams((prev) => new URLSearchParams(update({ ...initial, ...Object.fromEntries(prev) })), {
        replace: true,
        preventScrollReset: true,
      }),
  ];
}

interface CalculatorShellProps {
  form: AnyCalculatorForm;
  /** Keep the inputs in the page address: true on a calculator's own page, false when embedded in a lesson. */
  syncUrl?: boolean;
  /** Shown above the form beside the unit toggle (the embedded widget puts its title here). */
  header?: ReactNode;
}

export function CalculatorShell({ form, syncUrl = false, header }: CalculatorShellProps) {
  const { calculator } = form;
  const [unitSystem, setUnitSystem] = useUnitSystem();
  const [draft, update] = useDraft(form.initial, syncUrl);
  const evaluation = useMemo(() => evaluate(form, draft), [form, draft]);
  const state = useMemo<CalcFormState>(
    () => ({
      draft,
      setField: (name, value) => update((d) => ({ ...d, [name]: value })),
      setFields: (values) => update((d) => ({ ...d, ...values })),
      issues: evaluation.issues,
      unitSystem,
    }),
    // `update` changes identity with every address change, as `draft` does; listing draft is enough.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [draft, evaluation.issues, unitSystem],
  );
  const { output, input, candidate } = evaluation;
  return (
    <CalcFormContext.Provider value={state}>
      <section aria-label={calculator.title} className="space-y-6">
        <div className="flex flex-wrap items-center justify-between gap-3">
          <div>{header}</div>
          <UnitToggle value={unitSystem} onChange={setUnitSystem} />
        </div>
        <div className="grid gap-6 md:grid-cols-2 print:grid-cols-2">
          <Card className="print:border-0 print:p-0">
            <h2 className="mb-4 font-serif text-xl font-semibold">Inputs</h2>
            <form noValidate onSubmit={(e) => e.preventDefault()} className="space-y-4">
              <form.Inputs />
            </form>
          </Card>
          <Card className="print:border-0 print:p-0">
            <h2 className="mb-2 font-serif text-xl font-semibold">Results</h2>
            {output ? (
              <>
                <form.Results output={output} input={input} />
                <WarningsList warnings={output.warnings} />
              </>
            ) : (
              <p className="rounded-md border border-dashed border-rule p-4 text-muted">
                {evaluation.issues._?.message ?? 'Correct the marked inputs to see the results.'}
              </p>
            )}
            <SaveResultButton calculator={calculator.name} defaultTitle={calculator.title} input={candidate} />
          </Card>
        </div>
        <StepsDisclosure
          steps={output?.steps ?? []}
          assumptions={calculator.assumptions}
          imperial={unitSystem === 'imperial'}
        />
        <CalculatorCautions cautions={calculator.cautions} />
        <SourcesList sources={calculator.sources} />
      </section>
    </CalcFormContext.Provider>
  );
}
