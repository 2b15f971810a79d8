import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { MATERIALS, TYPED_MODULUS } from './material';
import { ReadingsTable } from './readings-table';

export function FuseeInputs() {
  const { draft } = useCalcForm();
  return (
    <>
      <fieldset className="space-y-4">
        <legend className="font-serif text-lg font-semibold">Barrel and spring</legend>
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
          label="Largest fusee radius (optional)"
          quantity="length"
          hint="At the first turn, where the spring is weakest. Blank: the chain radius on the barrel."
        />
        <NumberField
          name="barrelRadiusMm"
          label="Chain radius on the barrel (optional)"
          quantity="length"
          hint="To the centre line of the chain. Blank: half the barrel diameter."
        />
      </fieldset>
    </>
  );
}
