import { useCalcForm } from '../../components/calculator-context';
import { ModeChoice } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { num } from '../../lib/draft';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';

const KINDS = [
  { value: 'leaf', label: 'Leaf pinion' },
  { value: 'lantern', label: 'Lantern pinion' },
] as const;

export function WheelPinionInputs() {
  const { draft, unitSystem } = useCalcForm();
  const m = num(draft.moduleMm);
  // The trundle must pass between the wheel teeth: show the space it has to fit while it is being typed.
  const space = m !== undefined && m > 0 ? (Math.PI * m) / 2 : NaN;
  const spaceText = withUnit(formatNumber(toDisplay(space, 'length', unitSystem), 4), unitLabel('length', unitSystem));
  return (
    <>
      <NumberField
        name="moduleMm"
        label="Module"
        quantity="length"
        hint="Pitch diameter divided by the tooth count; clock wheels are usually about 0.1–3 mm."
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField name="wheelTeeth" label="Wheel teeth" quantity="count" />
        <NumberField name="pinionLeaves" label="Pinion leaves" quantity="count" />
      </div>
      <ModeChoice name="pinionKind" legend="Pinion" choices={KINDS} />
      {draft.pinionKind === 'lantern' && (
        <NumberField
          name="trundleDiameterMm"
          label="Trundle diameter"
          quantity="length"
          hint={`No published trundle ratio was found: measure the wire you will use. It must be narrower than the wheel's tooth space, ${spaceText} at this module.`}
        />
      )}
    </>
  );
}
