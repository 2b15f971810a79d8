import { CLICK_SPRING_MATERIALS } from '@shared/calc/spring-temper';
import { TEMPER_COLOURS } from '@shared/calc/spring-temper-tables';
import { useCalcForm } from '../../components/calculator-context';
import { ChoiceField, ModeChoice } from '../../components/choice-fields';
import { NumberField } from '../../components/number-field';
import { formatNumber, toDisplay, unitLabel, withUnit } from '../../lib/units';
import { TYPED_MATERIAL } from './material';

const MODES = [
  { value: 'steel', label: 'Steel: harden and temper' },
  { value: 'brass', label: 'Brass: hammer-hardened' },
  { value: 'click-spring', label: 'Click spring' },
];

const STEELS = [
  { value: 'O1', label: 'O1 oil-hardening tool steel' },
  { value: '1095', label: '1095 plain carbon steel' },
  { value: 'silver', label: 'Silver steel' },
];

const MATERIALS = [
  ...CLICK_SPRING_MATERIALS.map((m) => ({
    value: m.id,
    label: `${m.label} (E ${m.youngsModulusGPa} GPa, elastic limit ${m.yieldStrengthMPa} MPa)`,
  })),
  { value: TYPED_MATERIAL, label: 'My own figures' },
];

function SteelInputs() {
  const { unitSystem } = useCalcForm();
  const unit = unitLabel('temperature', unitSystem);
  const colours = [
    { value: '', label: 'No colour chosen' },
    ...TEMPER_COLOURS.map((b) => ({
      value: b.name,
      label: `${b.name}: ${withUnit(formatNumber(toDisplay(b.tempC, 'temperature', unitSystem)), unit)}`,
    })),
  ];
  return (
    <>
      <ChoiceField name="steel" label="Steel" choices={STEELS} />
      <NumberField
        name="temperatureC"
        label="Tempering temperature"
        quantity="temperature"
        hint="Leave empty to look a colour up only."
      />
      <ChoiceField
        name="colour"
        label="Temperature for a temper colour"
        choices={colours}
        hint="Colours from the Sheffield Gauge Plate chart; other charts differ by up to about 20 °C."
      />
    </>
  );
}

function ClickSpringInputs() {
  const { draft } = useCalcForm();
  return (
    <>
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField name="widthMm" label="Width" quantity="length" />
        <NumberField name="thicknessMm" label="Thickness" quantity="length" />
        <NumberField name="lengthMm" label="Free length" quantity="length" />
        <NumberField name="deflectionMm" label="Deflection at the tip" quantity="length" />
      </div>
      <ChoiceField name="material" label="Material" choices={MATERIALS} />
      {draft.material === TYPED_MATERIAL && (
        <div className="grid gap-4 sm:grid-cols-2">
          <NumberField name="youngsModulusGPa" label="Young’s modulus" quantity="modulus" />
          <NumberField
            name="yieldStrengthMPa"
            label="Elastic limit (yield strength)"
            quantity="stress"
            hint="The stress is judged against it; without it only impossible stresses are caught."
          />
        </div>
      )}
    </>
  );
}

export function SpringInputs() {
  const { draft } = useCalcForm();
  return (
    <>
      <ModeChoice name="mode" legend="Work out" choices={MODES} />
      {draft.mode === 'brass' && (
        <NumberField
          name="numbersHard"
          label="Numbers hard (B&S gauge numbers of cold reduction)"
          quantity="count"
          hint="Each gauge number of hammering or rolling down adds a quarter-hard."
        />
      )}
      {draft.mode === 'click-spring' && <ClickSpringInputs />}
      {draft.mode !== 'brass' && draft.mode !== 'click-spring' && <SteelInputs />}
    </>
  );
}
