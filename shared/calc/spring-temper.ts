import { z } from 'zod';
import { clickSpring, ClickSpringInput, type ClickSpringResults } from './click-spring';
import type { Calculator, CalcOutput, CalcStep } from './types';
import {
  BRASS_TEMPERS,
  CURVES,
  EASTERN,
  HARDENING,
  NOONS,
  OLIN,
  PRECISION,
  MAKEITFROM_C38500,
  MEAD,
  SHEFFIELD,
  SPRING_TEMPER,
  TEMPER_COLOURS,
  ASM_1090,
  type SpringTemperRange,
  type Hardening,
  type HardnessPoint,
  type Strength,
  type TemperBand,
} from './spring-temper-tables';

export { CLICK_SPRING_MATERIALS } from './spring-temper-tables';

// Each B&S gauge number is this ratio in thickness: 40 sizes span a 92:1 range.
const BS_GAUGE_RATIO = Math.pow(92, 1 / 39);
// Half the 10 °C band spacing: beyond this past either end of the chart no colour is claimed.
const CHART_MARGIN_C = 5;
const SteelInput = z.object({
  mode: z.literal('steel'),
  steel: z.enum(['O1', '1095', 'silver']).default('O1'),
  temperatureC: z.number().min(0).max(1200).optional(),
  colour: z.string().max(60).optional(),
});
const BrassInput = z.object({
  mode: z.literal('brass'),
  numbersHard: z.number().int().min(0).max(20),
});
export const SpringTemperInput = z.discriminatedUnion('mode', [SteelInput, BrassInput, ClickSpringInput]);
export type SpringTemperInput = z.input<typeof SpringTemperInput>;

interface SteelResults {
  mode: 'steel';
  steel: 'O1' | '1095' | 'silver';
  hardening: Hardening;
  colourForTemperature: TemperBand | null;
  temperatureForColour: TemperBand | null;
  temperColours: TemperBand[];
  hardnessCurve: HardnessPoint[];
  hardnessCurveSource: string | null;
  hardnessAtTemperatureHrc: number | null;
  /** Where this steel's own table puts a flat spring (about 44–50 HRC); null where no table was found. */
  springTemper: SpringTemperRange | null;
}
interface BrassResults {
  mode: 'brass';
  reductionPercent: number;
  temperName: string;
  publishedReductionPercent: number | null;
  strength: Strength;
}
export type SpringTemperResults = SteelResults | BrassResults | ClickSpringResults;
type Output = CalcOutput<SpringTemperResults>;

const show = (n: number, unit: string) => `${String(Number(n.toPrecision(4)))} ${unit}`.trim();
const normalise = (s: string) =>
  s
    .toLowerCase()
    .replace(/\(.*?\)/g, ' ')
    .replace(/-/g, ' ')
    .replace(/gray/g, 'grey')
    .replace(/\s+/g, ' ')
    .trim();

function nearestBand(tempC: number): TemperBand | null {
  const first = TEMPER_COLOURS[0]!;
  const last = TEMPER_COLOURS[TEMPER_COLOURS.length - 1]!;
  if (tempC < first.tempC - CHART_MARGIN_C || tempC > last.tempC + CHART_MARGIN_C) return null;
  // Ties go to the cooler band, the colour that shows first as the steel heats.
  return TEMPER_COLOURS.reduce((best, b) => (Math.abs(b.tempC - tempC) < Math.abs(best.tempC - tempC) ? b : best));
}

function interpolate(curve: readonly HardnessPoint[], tempC: number): number | null {
  for (let i = 0; i + 1 < curve.length; i++) {
    const lo = curve[i]!;
    const hi = curve[i + 1]!;
    if (tempC >= lo.tempC && tempC <= hi.tempC) {
      return lo.hrc + ((tempC - lo.tempC) * (hi.hrc - lo.hrc)) / (hi.tempC - lo.tempC);
    }
  }
  return null;
}

function steel(input: z.output<typeof SteelInput>): Output {
  const warnings: string[] = [];
  const h = HARDENING[input.steel];
  const curve = CURVES[input.steel];
  const t = input.temperatureC;
  const colourForTemperature = t === undefined ? null : nearestBand(t);
  const temperatureForColour =
    input.colour === undefined
      ? null
      : (TEMPER_COLOURS.find((b) => normalise(b.name) === normalise(input.colour!)) ?? null);
  const hardnessAtTemperatureHrc = t === undefined || curve === null ? null : interpolate(curve.points, t);
  const steps: CalcStep[] = [
    {
      label: 'Hardening heat',
      formula: `then quench in ${h.quench}`,
      result: `${h.temperatureC.min}–${h.temperatureC.max} °C`,
    },
  ];

  if (t !== undefined) {
    if (colourForTemperature === null) {
      warnings.push(
        `${show(t, '°C')} is outside the Sheffield Gauge Plate chart (210–330 °C): no temper colour is shown.`,
      );
    } else {
      steps.push({
        label: 'Nearest temper colour',
        formula: 'band with the closest °C',
        result: `${colourForTemperature.name}, ${colourForTemperature.tempC} °C`,
      });
    }
    if (t >= h.temperatureC.min)
      warnings.push(`${show(t, '°C')} is a hardening heat for this steel, not a tempering one.`);
    if (curve === null) {
      warnings.push('No tempering-hardness table was found for silver steel, so no hardness is given.');
    } else if (hardnessAtTemperatureHrc === null) {
      const lo = curve.points[0]!.tempC;
      const hi = curve.points[curve.points.length - 1]!.tempC;
      warnings.push(
        `The hardness table runs from ${lo} to ${hi} °C; ${show(t, '°C')} is outside it, so no hardness is given.`,
      );
    } else {
      steps.push({
        label: `Hardness after tempering (straight line between table points${input.steel === '1095' ? "; maker's blog, weak" : ''})`,
        formula: 'HRC = H₁ + (T − T₁)(H₂ − H₁)/(T₂ − T₁)',
        result: show(hardnessAtTemperatureHrc, 'HRC'),
      });
    }
  }
  const spring = SPRING_TEMPER[input.steel];
  const judgedByColour = colourForTemperature !== null || temperatureForColour !== null;
  if (input.steel === 'O1' && judgedByColour && spring !== null) {
    warnings.push(
      `Temper colours are for plain carbon steel judged by eye. O1 at the light-blue heat (310 °C) is still about 56 HRC by its data sheet, far harder than a flat spring wants; for a spring temper the same sheet gives ${spring.hrc.max}–${spring.hrc.min} HRC at ${spring.temperatureC.min}–${spring.temperatureC.max} °C (${spring.temperatureF.min}–${spring.temperatureF.max} °F). Temper O1 springs by thermometer, not by colour.`,
    );
  }
  if (spring !== null) {
    steps.push({
      label: 'Tempering heat for a flat spring (about 44–50 HRC), from the steel’s own table',
      formula: spring.source,
      result: `${spring.temperatureC.min}–${spring.temperatureC.max} °C, ${spring.hrc.max}–${spring.hrc.min} HRC`,
    });
  }
  if (input.colour !== undefined) {
    if (temperatureForColour === null) {
      warnings.push(`"${input.colour}" is not a colour on the Sheffield Gauge Plate chart; pick one of its names.`);
    } else {
      steps.push({
        label: 'Temperature for the colour',
        formula: 'chart lookup',
        result: `${temperatureForColour.tempC} °C (${temperatureForColour.tempF} °F)`,
      });
    }
  }

  return {
    results: {
      mode: 'steel',
      steel: input.steel,
      hardening: h,
      colourForTemperature,
      temperatureForColour,
      temperColours: [...TEMPER_COLOURS],
      hardnessCurve: curve === null ? [] : [...curve.points],
      hardnessCurveSource: curve === null ? null : curve.source,
      hardnessAtTemperatureHrc,
      springTemper: spring,
    },
    warnings,
    steps,
  };
}

function brass(input: z.output<typeof BrassInput>): Output {
  const n = input.numbersHard;
  const reductionPercent = (1 - Math.pow(BS_GAUGE_RATIO, -n)) * 100;
  const named = BRASS_TEMPERS.filter((t) => t.numbersHard <= n).at(-1)!;
  const warnings =
    n > 10 ? ['No named temper lies beyond extra spring (10 numbers hard); the strength shown is extra spring’s.'] : [];
  return {
    results: {
      mode: 'brass',
      reductionPercent,
      temperName: named.name,
      publishedReductionPercent: named.numbersHard === n ? named.publishedReductionPercent : null,
      strength: named.strength,
    },
    warnings,
    steps: [
      { label: 'B&S gauge ratio', formula: 'r = 92^(1/39)', result: BS_GAUGE_RATIO.toFixed(5) },
      { label: 'Thickness reduction', formula: '1 − r^(−n)', result: show(reductionPercent, '%') },
      { label: 'Temper', formula: 'each number hard adds a quarter-hard', result: named.name },
    ],
  };
}

export const springTemper: Calculator<typeof SpringTemperInput, SpringTemperResults> = {
  name: 'spring-temper',
  title: 'Spring temper',
  summary:
    'Steel: hardening heat, temper colours and the hardness they leave. Brass: the temper gained by hammering or rolling. Click springs: force and stress for a given deflection.',
  inputSchema: SpringTemperInput,
  compute(raw) {
    const input = SpringTemperInput.parse(raw);
    if (input.mode === 'steel') return steel(input);
    if (input.mode === 'brass') return brass(input);
    return clickSpring(input);
  },
  assumptions: [
    'Temper colours are for bright carbon steel and depend on time, surface finish and oil film; holding longer at a lower heat gives the same colour. One chart is used throughout.',
    'Hardness between two table points is read off a straight line; outside the table none is given.',
    'Brass reduction follows the B&S gauge: each gauge number of cold reduction adds a quarter-hard. Strengths are for C26000 cartridge brass strip; leaded clock brass hammer-hardens less well.',
    'The click spring is a narrow rectangular cantilever with a small deflection; for a wide plate use E/(1−ν²).',
    'Every click-spring material carries an elastic limit. Past 60 % of it the calculator warns: a click spring flexes at every click, and guidance for repeated bending keeps the peak stress to about half the tensile strength. Past the limit itself no force is given, because the spring sets or breaks first.',
    'Flat springs are usually wanted at about 44–50 HRC (common practice, no source); the spring tempering heat comes from each steel’s own table, not from the colours.',
  ],
  sources: [
    SHEFFIELD,
    EASTERN,
    `${NOONS}; truekatana.com (weak)`,
    'glue-it.com "Heat treating silver steel"',
    `${PRECISION} (precisionsteel.com/technical-data/tempers/copper-base-alloys)`,
    OLIN,
    MEAD,
    'makeitfrom.com (C26000 modulus)',
    MAKEITFROM_C38500,
    ASM_1090,
    "amesweb.info, citing Shigley's Mechanical Engineering Design, p. 532 (allowable bending stress for repeated loads)",
    'Tokai Bane "Torsion springs stress" (JIS B 2704)',
    'brass-copper-castings.com (C38500 cold-working capacity "poor")',
    'Tokai Bane "Flat springs formulas"',
  ],
  cautions: [
    'Quench oil is a fire risk: use a metal lidded container and never water near hot oil. Hot scale and spatter burn; tongs, face shield, ventilation.',
    'Water quenching cracks thin or sharp-cornered parts.',
    'Temper immediately after hardening.',
    'Colours depend on time, surface finish and oil film. Use an oven or thermometer for repeatable springs.',
    'Leaded brass: wash hands, no food at the bench, no dry sweeping of filings.',
    'Heat treatment follows local fire and safety codes and licensed practice; these figures do not replace them.',
  ],
};
