import type { LinkedRecord } from '@shared/schemas/submission';
import { useLinkOptions } from '../api/get-submissions';

interface Props {
  logEntryIds: number[];
  calculationIds: number[];
  onChange: (next: { logEntryIds: number[]; calculationIds: number[] }) => void;
  /** Records already linked, so they show even when older than the offered list. */
  linked: { logEntries: LinkedRecord[]; calculations: LinkedRecord[] };
}

const merge = (offered: LinkedRecord[], linked: LinkedRecord[]) => {
  const seen = new Set(offered.map((r) => r.id));
  return [...linked.filter((r) => !seen.has(r.id)), ...offered];
};

/** Optional links from the piece to bench-log entries and saved calculator results that back it up. */
export function LinkPicker({ logEntryIds, calculationIds, onChange, linked }: Props) {
  const { data, isPending, isError } = useLinkOptions();
  const groups = [
    {
      key: 'logEntryIds' as const,
      title: 'Bench-log entries',
      ids: logEntryIds,
      records: merge(data?.logEntries ?? [], linked.logEntries),
    },
    {
      key: 'calculationIds' as const,
      title: 'Saved calculator results',
      ids: calculationIds,
      records: merge(data?.calculations ?? [], linked.calculations),
    },
  ];
  const toggle = (key: 'logEntryIds' | 'calculationIds', id: number, on: boolean) => {
    const current = key === 'logEntryIds' ? logEntryIds : calculationIds;
    const next = on ? [...current, id] : current.filter((x) => x !== id);
    onChange({ logEntryIds, calculationIds, [key]: next });
  };
  const count = logEntryIds.length + calculationIds.length;
  return (
    <details className="rounded-lg border border-rule bg-card p-4" open={count > 0}>
      <summary className="min-h-11 cursor-pointer content-center font-semibold">
        Link bench-log entries and saved results <span className="num font-normal text-muted">({count} linked)</span>
      </summary>
      {isPending && <p className="mt-2 text-sm text-muted">Loading your records…</p>}
      {isError && <p className="mt-2 text-sm text-error">Your records could not be loaded.</p>}
      <div className="mt-3 grid gap-4 md:grid-cols-2">
        {groups.map((g) => (
          <fieldset key={g.key} className="space-y-1">
            <legend className="text-sm font-semibold">{g.title}</legend>
            {g.records.length === 0 && <p className="text-sm text-muted">None yet.</p>}
            <div className="max-h-56 space-y-1 overflow-y-auto pr-2">
              {g.records.map((r) => (
                <label key={r.id} className="flex min-h-11 items-center gap-3 rounded px-2 hover:bg-rule/30">
                  <input
                    type="checkbox"
                    className="size-5"
                    checked={g.ids.includes(r.id)}
                    onChange={(e) => toggle(g.key, r.id, e.target.checked)}
                  />
                  <span className="text-sm">{r.label ?? `Record ${r.id} (no longer available)`}</span>
                </label>
              ))}
            </div>
          </fieldset>
        ))}
      </div>
    </details>
  );
}
