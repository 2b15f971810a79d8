import { PLATE_SETS } from '@shared/calc/dividing';
import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField, TextInputField } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { describeIssue } from '../../lib/describe-issue';
import { OWN_CIRCLES, PLATE_CHOICES } from './plates';

/** The circles' own complaint: an item ("circles.3") says more than the list as a whole. */
function circlesError(issues: ReturnType<typeof useCalcForm>['issues'], unitSystem: 'metric' | 'imperial') {
  const item = Object.entries(issues).find(([k]) => /^circles\.\d+$/.test(k));
  if (item) return `Hole circle ${Number(item[0].split('.')[1]) + 1}: ${describeIssue(item[1], 'count', unitSystem)}`;
  const all = issues.circles;
  if (!all) return undefined;
  return all.code === 'too_small' ? 'Type at least one hole count.' : describeIssue(all, 'count', unitSystem);
}

export function DividingInputs() {
  const { draft, issues, unitSystem } = useCalcForm();
  const set = PLATE_SETS.find((p) => p.key === draft.plate);
  return (
    <>
      <NumberField name="teeth" label="Divisions (teeth to cut)" quantity="count" />
      <NumberField
        name="ratio"
        label="Dividing-head ratio"
        quantity="count"
        unit=": 1"
        hint="Crank turns for one turn of the spindle; most heads are 40 : 1."
      />
      <ChoiceField
        name="plate"
        label="Hole circles"
        choices={PLATE_CHOICES}
        hint={set ? `${set.circles.join(', ')}. ${set.source}` : undefined}
      />
      {draft.plate === OWN_CIRCLES && (
        <TextInputField
          name="ownCircles"
          label="Your hole circles"
          hint="Hole counts separated by commas or spaces, e.g. 24, 25, 28, 30."
          error={circlesError(issues, unitSystem)}
        />
      )}
    </>
  );
}
