import { z } from 'zod';
import { outsideBench, pushWarnings, type BenchRange } from './bench-range';
import type { Calculator, CalcStep } from './types';

// Bounds keep every product finite; anything outside them is a slip of the keyboard, not a clock wheel.
export const WheelPinionInput = z
  .object({
    moduleMm: z.number().positive().max(20),
    wheelTeeth: z.number().int().min(3).max(1000),
    pinionLeaves: z.number().int().min(3).max(200),
    pinionKind: z.enum(['leaf', 'lantern']).default('leaf'),
    /** Lantern pinions only: no published trundle ratio exists, so the maker measures or chooses it. */
    trundleDiameterMm: z.number().positive().max(50).optional(),
  })
  .refine((v) => v.pinionKind === 'leaf' || v.trundleDiameterMm !== undefined, {
    message: 'A lantern pinion needs the trundle diameter.',
    path: ['trundleDiameterMm'],
  });
export type WheelPinionInput = z.input<typeof WheelPinionInput>;

export interface WheelPinionResults {
  wheelPitchDiameterMm: number;
  pinionPitchDiameterMm: number;
  centreDistanceMm: number;
  ratio: number;
  circularPitchMm: number;
  wheelBlankDiameterMm: number;
  /** Leaf pinion: the turned blank. Lantern pinion: the outside diameter over the trundles. */
  pinionBlankDiameterMm: number;
  /** From a forum post's blank rule (1.38 m), not a published standard. */
  wheelAddendumMm: number;
  pinionAddendumMm: number;
  /** Goodrich's 7/20 rule, stated for eight-leaf pinions only: null for any other count. */
  goodrichWheelAddendumMm: number | null;
  toothSpaceMm: number;
  /** Lantern pinions only: tooth space less the trundle, the play the teeth have between the trundles. */
  trundleBacklashMm?: number;
  /** Lantern pinions only: whether that play is at least the working minimum, not merely above zero. */
  trundleFits?: boolean;
}

// Forum blank rule (A. Wolff): total allowances added to the tooth count, in modules.
const WHEEL_BLANK_ALLOWANCE = 2.76;
const PINION_ALLOWANCE_UNDER_10 = 1.71;
const PINION_ALLOWANCE_10_TO_16 = 1.61;
// Goodrich: wheel addendum 7/20 of the pinion pitch radius, given for the 8-leaf pinion.
const GOODRICH_FRACTION = 7 / 20;
const GOODRICH_LEAVES = 8;
// Common practice, no source: the module range of domestic and turret clock wheels.
const USUAL_MODULE_MM = { min: 0.1, max: 3 };
// Common practice, no source: a wheel tooth needs play between two trundles, or it binds as soon as anything is a
// hair out; at least a tenth of the tooth space is asked for before the trundle is said to fit.
const LEAST_BACKLASH_SHARE = 0.1;
// Common practice, no source: tooth counts clock wheels and pinions are cut with.
const BENCH_WHEEL_TEETH: BenchRange = { min: 12, max: 400 };
const BENCH_PINION_LEAVES: BenchRange = { min: 5, max: 40 };

const num = (n: number) => String(Number(n.toPrecision(5)));
const mm = (n: number) => `${num(n)} mm`;

function pinionAllowance(leaves: number): number {
  return leaves < 10 ? PINION_ALLOWANCE_UNDER_10 : PINION_ALLOWANCE_10_TO_16;
}

export const wheelPinion: Calculator<typeof WheelPinionInput, WheelPinionResults> = {
  name: 'wheel-pinion',
  title: 'Wheel and pinion',
  summary:
    'Pitch and blank diameters, addenda, centre distance and tooth space for a cycloidal clock wheel and its leaf or lantern pinion.',
  inputSchema: WheelPinionInput,
  compute(raw) {
    const input = WheelPinionInput.parse(raw);
    const { moduleMm: m, wheelTeeth: zw, pinionLeaves: zp, pinionKind } = input;
    const warnings: string[] = [];
    const steps: CalcStep[] = [];

    const wheelPitchDiameterMm = m * zw;
    const pinionPitchDiameterMm = m * zp;
    const centreDistanceMm = (m * (zw + zp)) / 2;
    const ratio = zw / zp;
    const circularPitchMm = Math.PI * m;
    const toothSpaceMm = circularPitchMm / 2;
    const wheelAddendumMm = (WHEEL_BLANK_ALLOWANCE / 2) * m;
    const wheelBlankDiameterMm = m * (zw + WHEEL_BLANK_ALLOWANCE);
    const goodrichWheelAddendumMm =
      zp === GOODRICH_LEAVES && pinionKind === 'leaf' ? GOODRICH_FRACTION * (pinionPitchDiameterMm / 2) : null;

    steps.push(
      { label: 'Wheel pitch diameter', formula: `d = m·z = ${num(m)} × ${zw}`, result: mm(wheelPitchDiameterMm) },
      { label: 'Pinion pitch diameter', formula: `d = m·z = ${num(m)} × ${zp}`, result: mm(pinionPitchDiameterMm) },
      {
        label: 'Centre distance',
        formula: `a = m(z₁ + z₂)/2 = ${num(m)} × (${zw} + ${zp}) / 2`,
        result: mm(centreDistanceMm),
      },
      { label: 'Ratio', formula: `${zw} / ${zp}`, result: num(ratio) },
      { label: 'Circular pitch', formula: `p = π·m = π × ${num(m)}`, result: mm(circularPitchMm) },
      {
        label: 'Wheel blank (forum rule)',
        formula: `dₐ = m(z + 2.76) = ${num(m)} × (${zw} + 2.76)`,
        result: mm(wheelBlankDiameterMm),
      },
      {
        label: 'Wheel addendum (forum post: A. Wolff, NAWCC "Cycloidal Gears Blanks"; not a published standard)',
        formula: `1.38·m = 1.38 × ${num(m)}`,
        result: mm(wheelAddendumMm),
      },
      { label: 'Tooth space at the pitch circle', formula: `πm/2 = π × ${num(m)} / 2`, result: mm(toothSpaceMm) },
      goodrichWheelAddendumMm === null
        ? {
            label: "Goodrich's wheel addendum",
            formula: `stated for 8-leaf pinions only; for ${zp} ${pinionKind === 'lantern' ? 'trundles' : 'leaves'} the forum blank rule above governs`,
            result: 'not applied',
          }
        : {
            label: "Goodrich's wheel addendum (8-leaf pinion), for comparison",
            formula: `7/20 × pinion pitch radius = 0.35 × ${mm(pinionPitchDiameterMm / 2)}`,
            result: mm(goodrichWheelAddendumMm),
          },
    );

    let pinionAddendumMm: number;
    let pinionBlankDiameterMm: number;
    let trundleFits: boolean | undefined;
    let trundleBacklashMm: number | undefined;
    if (pinionKind === 'lantern') {
      // The refinement guarantees the trundle is present for lantern pinions.
      const trundle = input.trundleDiameterMm as number;
      // Trundle centres sit on the pitch circle, so each trundle stands half its diameter proud of it.
      pinionAddendumMm = trundle / 2;
      pinionBlankDiameterMm = pinionPitchDiameterMm + trundle;
      trundleBacklashMm = toothSpaceMm - trundle;
      const leastBacklash = LEAST_BACKLASH_SHARE * toothSpaceMm;
      trundleFits = trundleBacklashMm >= leastBacklash;
      steps.push(
        {
          label: 'Outside over the trundles',
          formula: `d + trundle = ${mm(pinionPitchDiameterMm)} + ${mm(trundle)}`,
          result: mm(pinionBlankDiameterMm),
        },
        {
          label: 'Play of a tooth between the trundles',
          formula: `tooth space − trundle = ${mm(toothSpaceMm)} − ${mm(trundle)}, at least ${mm(leastBacklash)}?`,
          result: `${mm(trundleBacklashMm)}: ${trundleFits ? 'fits' : 'too tight'}`,
        },
      );
      if (trundleBacklashMm <= 0) {
        warnings.push(
          `The trundle (${mm(trundle)}) is not narrower than the wheel's tooth space (${mm(toothSpaceMm)}), so the wheel teeth cannot enter between the trundles. Use thinner trundle wire or a larger module.`,
        );
      } else if (!trundleFits) {
        warnings.push(
          `The trundle leaves the teeth only ${mm(trundleBacklashMm)} of play, under a tenth of the tooth space (${mm(leastBacklash)}; common practice, no source): the mesh binds at the first error in depth or division. Use thinner trundle wire.`,
        );
      }
    } else {
      const allowance = pinionAllowance(zp);
      pinionAddendumMm = (allowance / 2) * m;
      pinionBlankDiameterMm = m * (zp + allowance);
      steps.push(
        {
          label: 'Pinion blank (forum rule)',
          formula: `dₐ = m(z + ${allowance}) = ${num(m)} × (${zp} + ${allowance})`,
          result: mm(pinionBlankDiameterMm),
        },
        {
          label: 'Pinion addendum',
          formula: `${allowance / 2}·m = ${allowance / 2} × ${num(m)}`,
          result: mm(pinionAddendumMm),
        },
      );
      if (zp > 16) {
        warnings.push(
          `The pinion blank rule covers pinions of up to 16 leaves; ${zp} leaves is outside it, so the 10–16 leaf allowance was used.`,
        );
      }
      if (zp < 6) {
        warnings.push(
          `A leaf pinion of ${zp} leaves is below the 6 leaves usual in clocks; expect heavy engaging friction.`,
        );
      }
    }

    if (zw < 17) {
      warnings.push(`The wheel blank rule is stated for wheels of 17 teeth or more; ${zw} teeth is outside it.`);
    }
    if (zw < zp) {
      warnings.push(
        'The wheel has fewer teeth than the pinion has leaves; clock trains gear up from wheel to pinion and these proportions assume it.',
      );
    }
    if (m < USUAL_MODULE_MM.min || m > USUAL_MODULE_MM.max) {
      warnings.push(
        `A module of ${mm(m)} is outside the usual range for clock wheels (about ${USUAL_MODULE_MM.min}–${USUAL_MODULE_MM.max} mm).`,
      );
    }
    pushWarnings(
      warnings,
      outsideBench('A wheel', zw, BENCH_WHEEL_TEETH, 'teeth'),
      outsideBench('A pinion', zp, BENCH_PINION_LEAVES, 'leaves'),
    );

    const results: WheelPinionResults = {
      wheelPitchDiameterMm,
      pinionPitchDiameterMm,
      centreDistanceMm,
      ratio,
      circularPitchMm,
      wheelBlankDiameterMm,
      pinionBlankDiameterMm,
      wheelAddendumMm,
      pinionAddendumMm,
      goodrichWheelAddendumMm,
      toothSpaceMm,
      ...(trundleFits === undefined ? {} : { trundleFits, trundleBacklashMm }),
    };
    return { results, warnings, steps };
  },
  assumptions: [
    'Wheel and pinion run at the standard centre distance, the sum of the pitch radii, with no depthing allowance.',
    'Blank diameters follow a forum rule quoted as the BS-type rule: wheel m(z + 2.76) for 17 teeth or more, pinion m(z + 1.71) below 10 leaves and m(z + 1.61) for 10–16 leaves. BS 978-2 itself was not consulted; its tables (addendum by ratio, leaf thickness, clearances) are unverified and not used here.',
    "Goodrich's wheel addendum of 7/20 of the pinion pitch radius is stated for an 8-leaf pinion and is shown only there; for other counts the forum blank rule governs the wheel addendum.",
    'The wheel addendum of 1.38 m comes from a forum post (A. Wolff, NAWCC), quoted there as the BS-type rule; it is not a published standard.',
    'A trundle is said to fit only when the teeth keep at least a tenth of the tooth space as play between the trundles (common practice, no source): a trundle that only just passes binds.',
    'The tooth space is taken as half the circular pitch (πm/2) at the pitch circle.',
    'Lantern pinion: the trundle centres lie on the pinion pitch circle and the outside diameter is the pitch diameter plus one trundle diameter. No published trundle-to-module ratio was found, so the trundle diameter is an input.',
    'Wheels driving lantern pinions are said to want a rounder addendum (Goodrich, reported second-hand); the forum wheel rule is still used here.',
    'The usual module range used for warnings (about 0.1–3 mm) is common practice, not a published figure.',
  ],
  sources: [
    'NAWCC forum "Cycloidal Gears Blanks", post by A. Wolff (forum; quoted as the BS-type rule)',
    'W. L. Goodrich, The Modern Clock (1905), pinion chapter',
    'AWCI "Clockmaking standard: Lantern pinion depthing"',
    'Goodrich, as reported in beallclocks.com forum (secondary)',
  ],
  cautions: [
    'Cycloidal gearing is sensitive to centre distance. Set depth with a depthing tool before drilling.',
    'Cutter and blank sizes must match the same system.',
  ],
};

interface MeshDrawing {
  wheel: { cx: number; cy: number; pitchRadiusMm: number; blankRadiusMm: number };
  pinion: { cx: number; cy: number; pitchRadiusMm: number; blankRadiusMm: number };
  /** Where the pitch circles touch, on the line of centres. */
  pitchPoint: { x: number; y: number };
  /** The box that holds both blanks, in mm, y upwards, wheel centre at the origin. */
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
}

/** The geometry for drawing the mesh to scale: wheel centre at the origin, pinion on the positive x axis. */
export function meshDrawing(
  r: Pick<
    WheelPinionResults,
    | 'wheelPitchDiameterMm'
    | 'pinionPitchDiameterMm'
    | 'centreDistanceMm'
    | 'wheelBlankDiameterMm'
    | 'pinionBlankDiameterMm'
  >,
): MeshDrawing {
  const wheelBlank = r.wheelBlankDiameterMm / 2;
  const pinionBlank = r.pinionBlankDiameterMm / 2;
  const halfHeight = Math.max(wheelBlank, pinionBlank);
  return {
    wheel: { cx: 0, cy: 0, pitchRadiusMm: r.wheelPitchDiameterMm / 2, blankRadiusMm: wheelBlank },
    pinion: { cx: r.centreDistanceMm, cy: 0, pitchRadiusMm: r.pinionPitchDiameterMm / 2, blankRadiusMm: pinionBlank },
    pitchPoint: { x: r.wheelPitchDiameterMm / 2, y: 0 },
    bounds: {
      minX: Math.min(-wheelBlank, r.centreDistanceMm - pinionBlank),
      minY: -halfHeight,
      maxX: Math.max(wheelBlank, r.centreDistanceMm + pinionBlank),
      maxY: halfHeight,
    },
  };
}
