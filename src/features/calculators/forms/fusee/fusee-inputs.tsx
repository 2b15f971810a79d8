import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { num } from '../../lib/draft';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';
import { MATERIALS, TYPED_MODULUS } from './material';
import { ReadingsTable } from './readings-table';

/** The chain radius the calculator offers when none is measured: outside radius + half the chain's thickness. */
function OfferedChainRadius() {
  const { draft, unitSystem } = useCalcForm();
  const [od, c] = [num(draft.barrelOutsideDiameterMm), num(draft.chainThicknessMm)];
  if (num(draft.chainRadiusMm) !== undefined || od === undefined || c === undefined) return null;
  const offered = od / 2 + c / 2;
  if (!Number.isFinite(offered)) return null;
  return (
    <p className="text-sm text-muted" role="status">
      Chain radius offered:{' '}
      <span className="num text-ink">
        {withUnit(formatNumber(toDisplay(offered, 'length', unitSystem), 4), unitLabel('length', unitSystem))}
      </span>{' '}
      (outside radius + half the chain). Measure it on the barrel to confirm.
    </p>
  );
}

export function FuseeInputs() {
  const { draft } = useCalcForm();
  return (
    <>
      <fieldset className="space-y-4">
        <legend className="font-serif text-lg font-semibold">Barrel and spring (for length and turns)</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField name="barrelDiameterMm" label="Barrel inside diameter" quantity="length" />
          <NumberField
            name="arborDiameterMm"
            label="Arbor diameter"
            quantity="length"
            hint="Usually a third of the barrel."
          />
        </div>
        <NumberField name="springThicknessMm" label="Spring thickness" quantity="length" />
        <NumberField
          name="springLengthMm"
          label="Spring length (optional)"
          quantity="length"
          hint="Blank: the length that fills half the free area, which gives the most turns."
        />
        <NumberField
          name="springWidthMm"
          label="Spring width (optional)"
          quantity="length"
          hint="Needed for the stiffness and the torque added per turn."
        />
        <ChoiceField name="material" label="Spring material" choices={MATERIALS} />
        {draft.material === TYPED_MODULUS && (
          <NumberField name="youngsModulusGPa" label="Young's modulus" quantity="modulus" />
        )}
      </fieldset>
      <fieldset className="space-y-4">
        <legend className="font-serif text-lg font-semibold">Fusee</legend>
        <ReadingsTable />
        <NumberField
          name="maxRadiusMm"
          label="Largest fusee radius"
          quantity="length"
          hint="At the first turn, where the spring is weakest. With the readings it sets every radius."
        />
      </fieldset>
      <fieldset className="space-y-4">
        <legend className="font-serif text-lg font-semibold">Chain on the barrel (for the chain&apos;s pull)</legend>
        <NumberField
          name="chainRadiusMm"
          label="Chain radius on the barrel, measured (optional)"
          quantity="length"
          hint="To the chain's centre line on the barrel's outside, not half the inside diameter."
        />
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField name="barrelOutsideDiameterMm" label="Barrel outside diameter" quantity="length" />
          <NumberField name="chainThicknessMm" label="Chain thickness" quantity="length" />
        </div>
        <OfferedChainRadius />
      </fieldset>
    </>
  );
}
