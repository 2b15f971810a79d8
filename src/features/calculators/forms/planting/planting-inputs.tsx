import { Plus } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { NumberField } from '../../components/number-field';
import { writeRows } from '../row-cells/json-rows';
import { ArborEditor } from './arbor-editor';
import { arborRows, blankArbor, rowIssues, type ArborRow } from './arbor-rows';

// The calculator takes up to 50 arbors; a clock plate rarely holds more than a dozen.
const MAX_ARBORS = 50;

export function PlantingInputs() {
  const { draft, setField } = useCalcForm();
  const rows = arborRows(draft);
  const write = (next: ArborRow[]) => setField('arbors', writeRows(next));
  const names = rows.map((r) => r.name.trim());
  return (
    <>
      <p className="text-sm text-muted">
        Positions are in the plate's plane, X to the right and Y upwards from the datum lines. The first arbor is placed
        by its coordinates; each next one from arbors listed above it.
      </p>
      {rows.map((row, i) => (
        <ArborEditor
          key={i}
          row={row}
          index={i}
          earlier={names.slice(0, i).filter(Boolean)}
          issues={rowIssues(row, i)}
          onChange={(next) => write(rows.map((r, j) => (j === i ? next : r)))}
          onRemove={rows.length > 1 ? () => write(rows.filter((_, j) => j !== i)) : undefined}
        />
      ))}
      <Button
        variant="secondary"
        className="no-print"
        disabled={rows.length >= MAX_ARBORS}
        onClick={() => write([...rows, blankArbor(rows.length === 0 ? 'xy' : rows.length === 1 ? 'polar' : 'two')])}
      >
        <Plus className="size-4" aria-hidden />
        Add an arbor
      </Button>
      <fieldset className="space-y-3 rounded-md border border-rule p-3">
        <legend className="px-1 text-sm font-semibold">Datum point (optional)</legend>
        <p className="text-sm text-muted">
          A pillar or the centre arbor, measured from the datum lines. Drilling coordinates are also given from it.
        </p>
        <div className="grid gap-3 sm:grid-cols-2">
          <NumberField name="datumX" issueKey="datum.x" label="X" quantity="length" />
          <NumberField name="datumY" issueKey="datum.y" label="Y" quantity="length" />
        </div>
      </fieldset>
    </>
  );
}
