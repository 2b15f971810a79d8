import { Trash2 } from 'lucide-react';
import type { Quantity } from '@shared/calc/types';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { useCalcForm } from '../../components/calculator-context';
import { describeIssue } from '../../lib/describe-issue';
import type { FieldIssues } from '../../lib/draft';
import { CellInput } from '../row-cells/cell-input';
import type { ArborRow, PlacedBy } from './arbor-rows';

const PLACED_BY: { value: PlacedBy; label: string }[] = [
  { value: 'two', label: 'From two arbors, by two centre distances' },
  { value: 'polar', label: 'From one arbor, by distance and angle' },
  { value: 'xy', label: 'By its coordinates' },
];

interface Props {
  row: ArborRow;
  index: number;
  /** Names of the arbors listed before this one: the only ones it can be measured from. */
  earlier: string[];
  issues: FieldIssues;
  onChange(row: ArborRow): void;
  onRemove?: () => void;
}

function ArborSelect({
  label,
  value,
  earlier,
  onChange,
  error,
}: {
  label: string;
  value: string;
  earlier: string[];
  onChange(v: string): void;
  error?: string;
}) {
  // A name typed earlier and since changed stays visible, so the calculator can say it is not listed before.
  const names = value && !earlier.includes(value) ? [...earlier, value] : earlier;
  return (
    <SelectField label={label} value={value} error={error} onChange={(e) => onChange(e.target.value)}>
      <option value="">Choose an arbor</option>
      {names.map((n) => (
        <option key={n} value={n}>
          {n}
        </option>
      ))}
    </SelectField>
  );
}

/** One arbor of the layout: its name, how it is placed, and an optional pitch circle for the drawing. */
export function ArborEditor({ row, index, earlier, issues, onChange, onRemove }: Props) {
  const { unitSystem } = useCalcForm();
  const how: PlacedBy = index === 0 ? 'xy' : (row.how as PlacedBy);
  const title = row.name.trim() || `Arbor ${index + 1}`;
  const set = (patch: Partial<ArborRow>) => onChange({ ...row, ...patch });
  const error = (key: string, quantity: Quantity) =>
    issues[key] ? describeIssue(issues[key], quantity, unitSystem) : undefined;
  const cell = (field: keyof ArborRow, label: string, quantity: Quantity, issueKey: string) => (
    <CellInput
      showLabel
      label={label}
      quantity={quantity}
      value={row[field]}
      error={error(issueKey, quantity)}
      onChange={(v) => set({ [field]: v })}
    />
  );
  const a = row.fromA || 'the first';
  const b = row.fromB || 'the second';
  return (
    <fieldset className="space-y-3 rounded-md border border-rule p-3" data-testid="arbor-editor">
      <legend className="px-1 font-semibold">{title}</legend>
      <div className="flex items-end gap-2">
        <div className="flex-1">
          <CellInput
            showLabel
            text
            label="Name"
            quantity="count"
            value={row.name}
            error={issues.name ? 'Give the arbor a name of up to 40 characters.' : undefined}
            onChange={(v) => set({ name: v })}
          />
        </div>
        {onRemove && (
          <Button variant="quiet" className="no-print w-11 px-0" aria-label={`Remove ${title}`} onClick={onRemove}>
            <Trash2 className="size-4" aria-hidden />
          </Button>
        )}
      </div>
      {index > 0 && (
        <SelectField label="Placed" value={how} onChange={(e) => set({ how: e.target.value })}>
          {PLACED_BY.map((p) => (
            <option key={p.value} value={p.value}>
              {p.label}
            </option>
          ))}
        </SelectField>
      )}
      {how === 'xy' && (
        <div className="grid gap-3 sm:grid-cols-2">
          {cell('x', 'X from the datum line', 'length', 'x')}
          {cell('y', 'Y from the datum line', 'length', 'y')}
        </div>
      )}
      {how === 'two' && (
        <>
          <div className="grid gap-3 sm:grid-cols-2">
            <ArborSelect
              label="First arbor"
              value={row.fromA}
              earlier={earlier}
              error={error('from.0', 'count')}
              onChange={(v) => set({ fromA: v })}
            />
            {cell('distA', 'Centre distance to it', 'length', 'distances.0')}
            <ArborSelect
              label="Second arbor"
              value={row.fromB}
              earlier={earlier}
              error={error('from.1', 'count')}
              onChange={(v) => set({ fromB: v })}
            />
            {cell('distB', 'Centre distance to it', 'length', 'distances.1')}
          </div>
          <SelectField label="Side" value={row.side} onChange={(e) => set({ side: e.target.value })}>
            <option value="left">{`Left, looking from ${a} towards ${b}`}</option>
            <option value="right">{`Right, looking from ${a} towards ${b}`}</option>
          </SelectField>
        </>
      )}
      {how === 'polar' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <ArborSelect
            label="From arbor"
            value={row.from}
            earlier={earlier}
            error={error('from', 'count')}
            onChange={(v) => set({ from: v })}
          />
          {cell('distance', 'Centre distance', 'length', 'distance')}
          {cell('angle', 'Angle, counter-clockwise from the X datum line', 'angle', 'angleDeg')}
        </div>
      )}
      {cell('pitch', 'Pitch radius to draw (optional)', 'length', 'pitchRadiusMm')}
    </fieldset>
  );
}
