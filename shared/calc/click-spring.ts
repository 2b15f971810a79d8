import { z } from 'zod';
import { figure, outsideBench, pushWarnings, withUnit as show, type BenchRange } from './bench-range';
import type { CalcOutput, CalcStep } from './types';

/** The click-spring part of the spring-temper calculator: a flat cantilever, its force, stress and elastic limit. */

export const ClickSpringInput = z.object({
  mode: z.literal('click-spring'),
  widthMm: z.number().positive().min(0.01).max(100),
  thicknessMm: z.number().positive().min(0.01).max(10),
  lengthMm: z.number().positive().min(0.1).max(1000),
  deflectionMm: z.number().positive().max(1000),
  youngsModulusGPa: z.number().positive().min(1).max(500).default(206),
  /** The material's elastic limit (its yield or proof strength): past it the spring keeps part of the bend. */
  yieldStrengthMPa: z.number().positive().min(1).max(5000).optional(),
});

export interface ClickSpringResults {
  mode: 'click-spring';
  /** Null when the stress passes the elastic limit: the spring sets or breaks before it carries this force. */
  forceN: number | null;
  /** What the elastic formula gives, shown even past the limit so the user sees by how much. */
  stressMPa: number;
  stiffnessNPerMm: number;
  stressToYield: number | null;
  /** The deflection at which the stress reaches the working share of the elastic limit; null without a limit. */
  deflectionAtWorkingShareMm: number | null;
}

/**
 * A click spring flexes at every click, thousands of times a year, so it is worked well under its elastic limit.
 * Spring makers' guidance for repeated bending keeps the peak stress to about 45–51 % of the tensile strength for
 * 10⁵–10⁷ cycles (amesweb.info, citing Shigley's Mechanical Engineering Design, p. 532) and under 0.7 of it when set
 * must be avoided (Tokai Bane "Torsion springs stress", JIS B 2704). For brass at spring temper (yield 595, tensile
 * 625–690 MPa, Olin) 60 % of the elastic limit is about 52–57 % of the tensile strength (computed): the same ground.
 */
export const WORKING_SHARE = 0.6;
/**
 * The strongest figure in the trade reference for tempered carbon spring strip, 2340 MPa tensile (theworldmaterial.com
 * 1095 page): with no elastic limit given, a stress past it is impossible for any spring steel, not merely unwise.
 */
const STRONGEST_SPRING_STEEL_MPA = 2340;
// Common practice, no source: the sizes click springs are made in.
const BENCH_THICKNESS_MM: BenchRange = { min: 0.05, max: 3 };
const BENCH_LENGTH_MM: BenchRange = { min: 2, max: 200 };

type Output = CalcOutput<ClickSpringResults>;

export function clickSpring(input: z.output<typeof ClickSpringInput>): Output {
  const { widthMm: b, thicknessMm: t, lengthMm: L, deflectionMm: delta } = input;
  const E = input.youngsModulusGPa * 1000;
  const I = (b * t ** 3) / 12;
  const stiffnessNPerMm = (3 * E * I) / L ** 3;
  const elasticForceN = stiffnessNPerMm * delta;
  const stressMPa = (1.5 * E * t * delta) / L ** 2;
  const limit = input.yieldStrengthMPa;
  const stressToYield = limit === undefined ? null : stressMPa / limit;
  const deflectionAtWorkingShareMm = limit === undefined ? null : (WORKING_SHARE * limit * L ** 2) / (1.5 * E * t);
  const ceiling = limit ?? STRONGEST_SPRING_STEEL_MPA;
  const impossible = stressMPa > ceiling;
  const warnings: string[] = [];

  if (impossible) {
    warnings.push(
      limit === undefined
        ? `Root stress ${show(stressMPa, 'MPa')} is past the tensile strength of any spring steel in the reference (${STRONGEST_SPRING_STEEL_MPA} MPa): no spring can bend this far, so no force is given.`
        : `Root stress ${show(stressMPa, 'MPa')} is ${figure(stressMPa / limit)} × the elastic limit of ${show(limit, 'MPa')}: the spring takes a set or breaks before it bends this far, so no force is given.`,
    );
  } else if (limit !== undefined && stressMPa > WORKING_SHARE * limit) {
    warnings.push(
      `Root stress ${show(stressMPa, 'MPa')} is ${show(stressToYield! * 100, '%')} of the elastic limit (${show(limit, 'MPa')}). A click spring flexes at every click, so keep it under ${WORKING_SHARE * 100} %: make it thinner or longer, or bend it less.`,
    );
  }
  if (limit !== undefined && stressMPa > WORKING_SHARE * limit) {
    warnings.push(
      `At ${WORKING_SHARE * 100} % of the elastic limit this spring bends ${show(deflectionAtWorkingShareMm!, 'mm')} at the tip.`,
    );
  }
  if (limit === undefined) {
    warnings.push('No elastic limit is given, so the stress cannot be judged: choose a material or enter its limit.');
  }
  if (delta / L > 0.1) {
    warnings.push(
      'The deflection is more than a tenth of the length: the small-deflection formula stops holding, so treat the figures as rough.',
    );
  }
  pushWarnings(
    warnings,
    outsideBench('A spring thickness', t, BENCH_THICKNESS_MM, 'mm'),
    outsideBench('A spring length', L, BENCH_LENGTH_MM, 'mm'),
  );

  const steps: CalcStep[] = [
    { label: 'Second moment of area', formula: 'I = b·t³/12', result: show(I, 'mm⁴') },
    { label: 'Stiffness', formula: 'k = 3EI/L³', result: show(stiffnessNPerMm, 'N/mm') },
    {
      label: impossible ? 'Force at the tip, by the elastic formula (not reached)' : 'Force at the tip',
      formula: 'F = 3EIδ/L³',
      result: show(elasticForceN, 'N'),
    },
    { label: 'Root stress', formula: 'σ = 1.5·E·t·δ/L²', result: show(stressMPa, 'MPa') },
  ];
  if (stressToYield !== null) {
    steps.push(
      { label: 'Share of the elastic limit used', formula: 'σ / σ_e', result: show(stressToYield, '') },
      {
        label: `Deflection at ${WORKING_SHARE * 100} % of the elastic limit`,
        formula: `δ = ${WORKING_SHARE}·σ_e·L²/(1.5·E·t)`,
        result: show(deflectionAtWorkingShareMm!, 'mm'),
      },
    );
  }
  return {
    results: {
      mode: 'click-spring',
      forceN: impossible ? null : elasticForceN,
      stressMPa,
      stiffnessNPerMm,
      stressToYield,
      deflectionAtWorkingShareMm,
    },
    warnings,
    steps,
  };
}
