import type { LogEntryDTO } from '@shared/schemas/log-entry';

export function MeasurementsTable({ measurements }: { measurements: LogEntryDTO['measurements'] }) {
  if (measurements.length === 0) return <p className="text-muted">No measurements recorded.</p>;
  return (
    <table className="w-full max-w-xl border-collapse text-left">
      <caption className="sr-only">Measurements</caption>
      <thead>
        <tr className="border-b border-rule text-sm text-muted">
          <th scope="col" className="py-2 pr-4 font-semibold">
            What
          </th>
          <th scope="col" className="py-2 text-right font-semibold">
            Value
          </th>
        </tr>
      </thead>
      <tbody>
        {measurements.map((m, i) => (
          <tr key={i} className="border-b border-rule/60">
            <td className="py-2 pr-4">{m.name}</td>
            <td className="num py-2 text-right">
              {m.value}&nbsp;{m.unit}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
