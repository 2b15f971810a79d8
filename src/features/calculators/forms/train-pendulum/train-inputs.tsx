import { Button } from '@/components/ui/button';
import { useCalcForm } from '../../components/calculator-context';
import { ModeChoice } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { STANDARD_GRAVITY_TEXT } from './train-cells';
import { TrainRows } from './train-rows';

const PENDULUMS = [
  { value: 'none', label: 'None' },
  { value: 'rod', label: 'Uniform rod' },
  { value: 'rod-and-bob', label: 'Rod and bob' },
] as const;

/** The physical pendulum whose equivalent simple length is wanted; every error is keyed under "pendulum.". */
function PendulumInputs() {
  const { draft } = useCalcForm();
  const kind = draft.pendulumKind;
  if (kind !== 'rod' && kind !== 'rod-and-bob') return null;
  return (
    <div className="space-y-4 rounded-md border border-rule p-3">
      <NumberField
        name="rodLengthMm"
        issueKey="pendulum.rodLengthMm"
        label="Rod length, from the suspension point"
        quantity="length"
      />
      {kind === 'rod-and-bob' && (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <NumberField name="rodMassG" issueKey="pendulum.rodMassG" label="Rod mass" quantity="mass" />
            <NumberField name="bobMassG" issueKey="pendulum.bobMassG" label="Bob mass" quantity="mass" />
          </div>
          <NumberField
            name="bobCentreMm"
            issueKey="pendulum.bobCentreMm"
            label="Suspension point to the bob's centre"
            quantity="length"
          />
          <NumberField
            name="bobRadiusMm"
            issueKey="pendulum.bobRadiusMm"
            label="Bob radius (optional)"
            quantity="length"
            hint="Given: the bob is taken as a disc swinging in its own plane. Blank: a point mass."
          />
        </>
      )}
    </div>
  );
}

export function TrainInputs() {
  const { draft, setField } = useCalcForm();
  return (
    <>
      <TrainRows />
      <NumberField name="escapeTeeth" label="Escape wheel teeth" quantity="count" />
      <div className="space-y-2">
        <NumberField
          name="gravity"
          label="Local gravity"
          quantity="acceleration"
          hint="Standard gravity 9.80665 m/s² unless you know your local value."
        />
        {draft.gravity !== STANDARD_GRAVITY_TEXT && (
          <Button variant="quiet" className="no-print" onClick={() => setField('gravity', STANDARD_GRAVITY_TEXT)}>
            Use standard gravity
          </Button>
        )}
      </div>
      <NumberField
        name="targetBeatsPerHour"
        label="Find trains for this beat (optional)"
        quantity="count"
        unit="beats/h"
        hint="Suggests tooth counts with as many wheel and pinion rows as the train above."
      />
      <ModeChoice name="pendulumKind" legend="Physical pendulum to check" choices={PENDULUMS} />
      <PendulumInputs />
    </>
  );
}
