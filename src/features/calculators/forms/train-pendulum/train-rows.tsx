import { Minus, Plus } from 'lucide-react';
import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { describeIssue } from '../../lib/describe-issue';
import { CellInput } from '../row-cells/cell-input';
import { joinCells, rowNames, splitCells } from './train-cells';

// The calculator takes up to four wheel and pinion pairs between the centre wheel and the escape pinion.
const MAX_ROWS = 4;

/** The train as rows of wheel teeth and the pinion each wheel drives, from the centre wheel to the escape pinion. */
export function TrainRows() {
  const { draft, setFields, issues, unitSystem } = useCalcForm();
  const wheels = splitCells(draft.wheelTeeth);
  const pinions = splitCells(draft.pinionLeaves);
  const rows = Math.max(wheels.length, pinions.length);
  const cell = (list: string[], i: number) => list[i] ?? '';
  const write = (w: string[], p: string[]) => setFields({ wheelTeeth: joinCells(w), pinionLeaves: joinCells(p) });
  const error = (key: string, i: number) => {
    const issue = issues[`${key}.${i}`];
    return issue ? describeIssue(issue, 'count', unitSystem) : undefined;
  };
  // The rows keep the two lists the same length; a hand-edited address may not, and the schema says so here.
  const listIssue = [issues.wheelTeeth, issues.pinionLeaves].find((x) => x?.code === 'custom')?.message;
  const indexes = Array.from({ length: rows }, (_, i) => i);
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-ink">Train, from the centre wheel to the escape pinion</legend>
      {indexes.map((i) => {
        const names = rowNames(i, rows);
        return (
          <div key={i} className="grid grid-cols-[1fr_1fr_auto] items-start gap-2" data-testid="train-row">
            <div>
              <CellInput
                showLabel
                label={`${names.wheel} teeth`}
                quantity="count"
                value={cell(wheels, i)}
                error={error('wheelTeeth', i)}
                onChange={(v) =>
                  write(
                    indexes.map((j) => (j === i ? v : cell(wheels, j))),
                    indexes.map((j) => cell(pinions, j)),
                  )
                }
              />
            </div>
            <div>
              <CellInput
                showLabel
                label={`${names.pinion} leaves`}
                quantity="count"
                value={cell(pinions, i)}
                error={error('pinionLeaves', i)}
                onChange={(v) =>
                  write(
                    indexes.map((j) => cell(wheels, j)),
                    indexes.map((j) => (j === i ? v : cell(pinions, j))),
                  )
                }
              />
            </div>
            <Button
              variant="quiet"
              className="no-print mt-6 w-11 px-0"
              aria-label={`Remove the ${names.wheel.toLowerCase()} row`}
              disabled={rows <= 1}
              onClick={() => {
                const keep = indexes.filter((j) => j !== i);
                write(
                  keep.map((j) => cell(wheels, j)),
                  keep.map((j) => cell(pinions, j)),
                );
              }}
            >
              <Minus className="size-4" aria-hidden />
            </Button>
          </div>
        );
      })}
      {listIssue && (
        <p role="alert" className="text-sm font-medium text-error">
          {listIssue}
        </p>
      )}
      <Button
        variant="secondary"
        className="no-print"
        disabled={rows >= MAX_ROWS}
        onClick={() =>
          write([...indexes.map((j) => cell(wheels, j)), ''], [...indexes.map((j) => cell(pinions, j)), ''])
        }
      >
        <Plus className="size-4" aria-hidden />
        Add a wheel and pinion
      </Button>
    </fieldset>
  );
}
