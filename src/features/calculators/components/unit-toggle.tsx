import type { UnitSystem } from '@shared/schemas/user';

const OPTIONS: { value: UnitSystem; label: string; units: string }[] = [
  { value: 'metric', label: 'Metric', units: 'mm · °C · g' },
  { value: 'imperial', label: 'Imperial', units: 'in · °F · oz' },
];

/** Lengths, temperatures and masses in one system or the other; the choice is kept on the user's account. */
export function UnitToggle({ value, onChange }: { value: UnitSystem; onChange: (next: UnitSystem) => void }) {
  return (
    <fieldset className="no-print flex items-center gap-2">
      <legend className="sr-only">Units</legend>
      {OPTIONS.map((o) => (
        <label
          key={o.value}
          className="relative flex min-h-11 cursor-pointer items-center gap-2 rounded-md border border-rule bg-card px-3 text-sm has-[:checked]:border-steel has-[:checked]:bg-steel/10 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-steel"
        >
          <input
            type="radio"
            name="unit-system"
            className="absolute inset-0 cursor-pointer appearance-none opacity-0"
            value={o.value}
            checked={value === o.value}
            onChange={() => onChange(o.value)}
          />
          <span className="font-semibold">{o.label}</span>
          <span className="num text-muted">{o.units}</span>
        </label>
      ))}
    </fieldset>
  );
}
