import { Link } from 'react-router-dom';
import { calculators } from '@shared/calc/index';
import { isCalculatorName } from '@shared/calc/names';
import { paths } from '@/config/paths';
import { useSavedResults } from '../api/get-attach-options';

/** Tick the saved calculator results that belong with this entry. */
export function ResultAttach({
  value,
  onChange,
  error,
}: {
  value: number[];
  onChange: (ids: number[]) => void;
  error?: string;
}) {
  const { data, isLoading, error: loadError } = useSavedResults();
  const toggle = (id: number, on: boolean) => onChange(on ? [...value, id] : value.filter((x) => x !== id));
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold text-ink">Saved calculator results</legend>
      {isLoading && <p className="text-sm text-muted">Loading your saved results…</p>}
      {loadError && (
        <p className="text-sm text-error">
          Your saved results could not be loaded; the entry can be saved without them.
        </p>
      )}
      {data && data.length === 0 && (
        <p className="text-sm text-muted">
          None saved yet. Save a result from any{' '}
          <Link to={paths.calculators} className="underline">
            calculator
          </Link>{' '}
          to attach it here.
        </p>
      )}
      {data && data.length > 0 && (
        <ul className="max-h-48 space-y-1 overflow-y-auto rounded-md border border-rule bg-white p-2">
          {data.map((c) => (
            <li key={c.id}>
              <label className="flex min-h-11 items-center gap-3 px-1">
                <input
                  type="checkbox"
                  className="size-5 accent-steel"
                  checked={value.includes(c.id)}
                  onChange={(e) => toggle(c.id, e.target.checked)}
                />
                <span>
                  {c.title}
                  <span className="block text-xs text-muted">
                    {isCalculatorName(c.calculator) ? calculators[c.calculator].title : c.calculator} ·{' '}
                    {new Date(c.createdAt).toLocaleDateString()}
                  </span>
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {error && (
        <p role="alert" className="text-sm font-medium text-error">
          {error}
        </p>
      )}
    </fieldset>
  );
}
