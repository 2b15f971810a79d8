import { taperFromDiameters, taperFromRatio } from '@shared/calc/broach-taper';
import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField, ModeChoice, TextInputField } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { describeIssue } from '../../lib/describe-issue';
import { num } from '../../lib/draft';
import { formatNumber } from '../../lib/units';

const SIDES = [
  { value: '5', label: 'Five sides (read corner to flat)' },
  { value: '3', label: 'Three sides (read corner to flat)' },
  { value: '7', label: 'Seven sides (read corner to flat)' },
  { value: '4', label: 'Four sides (read corner to corner)' },
  { value: '6', label: 'Six sides (read corner to corner)' },
  { value: '0', label: 'Round, or readings already cutting diameters' },
] as const;

const OPENED_FROM = [
  { value: 'both', label: 'Both faces' },
  { value: 'one', label: 'One face' },
] as const;

const TAPER_FROM = [
  { value: 'taper', label: 'Taper' },
  { value: 'diameters', label: 'Two readings' },
  { value: 'ratio', label: 'Ratio' },
] as const;

/** The taper the readings or ratio give, shown back so the user sees what the calculator will use. */
function DerivedTaper({ k, unit }: { k: number | null; unit: string }) {
  if (k === null) return null;
  return (
    <p className="text-sm text-muted" role="status">
      Taper used:{' '}
      <span className="num text-ink">
        {formatNumber(k, 4)} {unit}
      </span>{' '}
      (about <span className="num text-ink">1:{formatNumber(1 / k, 3)}</span>)
    </p>
  );
}

export function BroachInputs() {
  const { draft, issues, unitSystem } = useCalcForm();
  const ratioUnit = unitSystem === 'metric' ? 'mm/mm' : 'in/in';
  const taperIssue = issues.taperPerMm;
  const from = draft.taperFrom ?? 'taper';
  const fromReadings = taperFromDiameters(num(draft.d1Mm) ?? NaN, num(draft.d2Mm) ?? NaN, num(draft.spanMm) ?? NaN);
  return (
    <>
      <ChoiceField
        name="broachSides"
        label="Section of the cutting broach"
        choices={SIDES}
        hint="Across an odd number of sides the micrometer reads less than the corners cut; the calculator allows for it."
      />
      <ModeChoice name="taperFrom" legend="Broach taper from" choices={TAPER_FROM} />
      {from === 'taper' && (
        <NumberField
          name="taperPerMm"
          label="Taper of the broach (diameter per length)"
          quantity="ratio"
          unit={ratioUnit}
          hint="No published taper for clock broaches was found: measure your own."
        />
      )}
      {from === 'diameters' && (
        <fieldset className="space-y-3 rounded-md border border-rule p-3">
          <legend className="px-1 text-sm font-semibold">Micrometer readings on the broach</legend>
          <div className="grid gap-3 sm:grid-cols-2">
            <NumberField name="d1Mm" label="Diameter, first station" quantity="length" />
            <NumberField name="d2Mm" label="Diameter, second station" quantity="length" />
          </div>
          <NumberField
            name="spanMm"
            label="Distance between the stations"
            quantity="length"
            hint="20–30 mm apart reads the taper well."
          />
          {taperIssue && (
            <p className="text-sm font-medium text-error" role="alert">
              {taperIssue.code === 'invalid_type'
                ? 'Enter both diameters and the distance between them; the diameters must differ.'
                : `These readings give a taper the calculator cannot use: ${describeIssue(taperIssue, 'ratio', unitSystem)}`}
            </p>
          )}
          <DerivedTaper k={fromReadings} unit={ratioUnit} />
        </fieldset>
      )}
      {from === 'ratio' && (
        <>
          <TextInputField
            name="ratio"
            label="Taper as a ratio"
            hint="For example 1:50 or 1/130 (diameter to length)."
            error={
              taperIssue
                ? taperIssue.code === 'invalid_type'
                  ? 'Write the taper as 1:50, 1/50 or a plain number.'
                  : describeIssue(taperIssue, 'ratio', unitSystem)
                : undefined
            }
          />
          <DerivedTaper k={taperFromRatio(draft.ratio ?? '')} unit={ratioUnit} />
        </>
      )}
      <NumberField
        name="refDiameterMm"
        label="Broach diameter at your reference mark"
        quantity="length"
        hint="The micrometer reading there; the insertion depth is measured from this mark."
      />
      <ModeChoice name="openedFrom" legend="Hole opened from" choices={OPENED_FROM} />
      <NumberField
        name="targetDiameterMm"
        label="Target hole diameter at its narrowest"
        quantity="length"
        hint={
          draft.openedFrom === 'one'
            ? 'Opened from one face, the hole is narrowest at the far face.'
            : 'Opened from both faces to the same mark, the hole is narrowest at mid-plate.'
        }
      />
      <NumberField name="plateThicknessMm" label="Plate thickness" quantity="length" />
      <NumberField name="pivotDiameterMm" label="Pivot diameter" quantity="length" />
      <NumberField
        name="pivotLengthMm"
        label="Pivot length, shoulder to end (if shorter than the plate)"
        quantity="length"
        hint="Leave blank when the pivot passes right through the plate."
      />
    </>
  );
}
