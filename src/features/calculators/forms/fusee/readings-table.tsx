import { Minus, Plus } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { describeIssue } from '../../lib/describe-issue';
import { unitLabel } from '../../lib/units';
import { CellInput } from '../row-cells/cell-input';
import { writeRows } from '../row-cells/json-rows';
import { EMPTY_ROWS, emptyRows, isBlankRow, readingRows, showsExample, type ReadingRow } from './readings';

/** The adjusting-rod readings, one row per turn of winding; blank rows are spare lines and are left out. */
export function ReadingsTable() {
  const { draft, setField, issues, unitSystem } = useCalcForm();
  const rows = readingRows(draft);
  const write = (next: ReadingRow[]) => setField('readings', writeRows(next));
  // The schema numbers the readings it was given, which skip the blank rows: map them back to table rows.
  let k = -1;
  const inputIndex = rows.map((r) => (isBlankRow(r) ? -1 : ++k));
  const cellError = (i: number, key: keyof ReadingRow) => {
    const issue = inputIndex[i] < 0 ? undefined : issues[`readings.${inputIndex[i]}.${key}`];
    return issue ? describeIssue(issue, key === 'massG' ? 'mass' : 'length', unitSystem) : undefined;
  };
  const example = showsExample(rows);
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-ink">Adjusting-rod readings, one per turn of winding</legend>
      <p className="text-sm text-muted">
        From the first turn of winding (weakest) to fully wound. The torque is the weight times its balance distance
        from the winding square.
      </p>
      {example && (
        <div
          role="note"
          className="no-print flex flex-wrap items-center gap-3 rounded-md border border-brass/50 bg-brass/10 p-2 text-sm"
        >
          <span>
            <strong>Example readings</strong>, invented for practice: clear them and enter your own.
          </span>
          <Button variant="secondary" onClick={() => write(emptyRows(EMPTY_ROWS))}>
            Clear the example
          </Button>
        </div>
      )}
      <div className="grid grid-cols-[2.5rem_1fr_1fr_auto] items-end gap-x-2 text-sm text-muted" aria-hidden>
        <span>Turn</span>
        <span>Weight ({unitLabel('mass', unitSystem)})</span>
        <span>Balance distance ({unitLabel('length', unitSystem)})</span>
        <span className="w-11" />
      </div>
      {rows.map((r, i) => (
        <div key={i} className="grid grid-cols-[2.5rem_1fr_1fr_auto] items-start gap-x-2" data-testid="reading-row">
          <span className="num flex min-h-11 items-center text-muted">{i + 1}</span>
          <CellInput
            label={`Turn ${i + 1} weight`}
            quantity="mass"
            value={r.massG}
            error={cellError(i, 'massG')}
            onChange={(v) => write(rows.map((x, j) => (j === i ? { ...x, massG: v } : x)))}
          />
          <CellInput
            label={`Turn ${i + 1} balance distance`}
            quantity="length"
            value={r.distanceMm}
            error={cellError(i, 'distanceMm')}
            onChange={(v) => write(rows.map((x, j) => (j === i ? { ...x, distanceMm: v } : x)))}
          />
          <Button
            variant="quiet"
            className="no-print w-11 px-0"
            aria-label={`Remove the turn ${i + 1} reading`}
            onClick={() => write(rows.filter((_, j) => j !== i))}
          >
            <Minus className="size-4" aria-hidden />
          </Button>
        </div>
      ))}
      <Button variant="secondary" className="no-print" onClick={() => write([...rows, ...emptyRows(1)])}>
        <Plus className="size-4" aria-hidden />
        Add a reading
      </Button>
    </fieldset>
  );
}
