import { FRICTION_TABLE, SURFACE_SPEED_TABLE } from '@shared/calc/pivot-burnish';
import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { formatNumber } from '../../lib/units';
import { TYPED } from './table-choice';

const FRICTION_CHOICES = [
  ...FRICTION_TABLE.map((r, i) => ({ value: String(i), label: `${r.pair}, ${r.lubrication}: μ ${r.mu}` })),
  { value: TYPED, label: 'My own figure' },
];

const SPEED_CHOICES = [
  ...SURFACE_SPEED_TABLE.map((r, i) => ({
    value: String(i),
    label: `${r.material} (${r.tool}): ${r.sfm} ft/min, ${formatNumber(r.mPerMin, 3)} m/min`,
  })),
  { value: TYPED, label: 'My own figure' },
];

export function PivotInputs() {
  const { draft, issues } = useCalcForm();
  const frictionRow = FRICTION_TABLE[Number(draft.friction)];
  const speedRow = SURFACE_SPEED_TABLE[Number(draft.speed)];
  return (
    <>
      <NumberField
        name="loadN"
        label="Load on the pivot"
        quantity="force"
        hint="Work it from the driving weight or spring and the train: in a weight-driven regulator it is about a newton or less."
      />
      <NumberField
        name="leverArmMm"
        label="Lever arm from the shoulder"
        quantity="length"
        hint="To the centre of the load: about half the length in the hole."
      />
      <NumberField name="pivotDiameterMm" label="Pivot diameter" quantity="length" />
      <NumberField
        name="bearingLengthMm"
        label="Bearing length"
        quantity="length"
        hint="The part of the pivot in the hole. Leave empty to take 1.5 × the pivot diameter."
      />
      <NumberField
        name="pivotLengthMm"
        label="Pivot length, shoulder to end (optional)"
        quantity="length"
        hint="Checked against the usual 1.5–2 × its diameter."
      />
      <NumberField
        name="allowableStressMPa"
        label="Allowable bending stress"
        quantity="stress"
        hint="200 MPa is a cautious figure for hardened and tempered arbor steel (common practice, no source)."
      />
      <ChoiceField
        name="friction"
        label="Friction coefficient"
        choices={FRICTION_CHOICES}
        hint={
          frictionRow ? `Static value from ${frictionRow.source}; real values depend on the whole system.` : undefined
        }
      />
      {draft.friction === TYPED && (
        <NumberField name="frictionCoefficient" label="Friction coefficient μ" quantity="ratio" />
      )}
      <ChoiceField
        name="speed"
        label="Surface speed for turning"
        choices={SPEED_CHOICES}
        hint={speedRow ? `HSS tool; ${speedRow.source}. Carbide runs about double.` : undefined}
      />
      {draft.speed === TYPED && <NumberField name="surfaceSpeedMPerMin" label="Surface speed" quantity="speed" />}
      {draft.speed !== TYPED && issues.surfaceSpeedMPerMin && (
        <p role="alert" className="text-sm text-error">
          Choose a surface speed.
        </p>
      )}
    </>
  );
}
