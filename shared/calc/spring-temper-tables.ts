/** Published tables behind the spring-temper calculator, each with the source it was read in. */
export const SHEFFIELD =
  'Sheffield Gauge Plate chart (https://sheffieldgaugeplate.co.uk/blog/steel-temper-colour-chart/)';
export const EASTERN = 'Eastern Tool Steel O-1 data sheet (easterntoolsteel.com/data/0-1_1.htm)';
export const NOONS = 'noonsknives.blogspot.com "AISI 1095" (maker\'s blog, weak)';
export const PRECISION = 'Precision Steel Warehouse, "Temper designations of wrought copper-base alloys"';
export const OLIN = 'olinbrass.com "C26000 (ASTM B36) Cartridge Brass"';
export const MEAD =
  'Mead Metals "Annealed Spring Steel Physical & Chemical Properties" (meadmetals.com), ASTM A684 suggested heat treatments';
export const MAKEITFROM_C38500 = 'makeitfrom.com "UNS C38500 (CW608N) Architectural Bronze" (M20, as hot rolled)';
export const ASM_1090 =
  'steel-heattreatment.com Table 2 (data from the ASM Metals Handbook): 1090 quenched and tempered, 388 HB';

export interface TemperBand {
  name: string;
  tempC: number;
  tempF: number;
  /** Swatch colour chosen to look like the oxide film, for display only. */
  hex: string;
  note: string | null;
}
const band = (name: string, tempC: number, tempF: number, hex: string, note: string | null = null): TemperBand => ({
  name,
  tempC,
  tempF,
  hex,
  note,
});
// One chart only: published charts disagree by up to about 20 °C.
export const TEMPER_COLOURS: readonly TemperBand[] = [
  band('Light yellow', 210, 410, '#eee0a4'),
  band('Straw', 220, 430, '#e2c473'),
  band('Yellow', 230, 450, '#d6ad4b'),
  band('Dark yellow', 240, 460, '#c49634'),
  band('Yellow brown', 250, 480, '#a97636'),
  band('Red brown', 260, 500, '#8c4c2f'),
  band('Purple', 270, 520, '#6b3a5d'),
  band('Violet', 280, 530, '#56397b'),
  band('Dark blue', 290, 550, '#253d79'),
  band('Wedgwood blue', 300, 570, '#4b6fa3'),
  band('Light blue', 310, 590, '#6f9bc2', 'springs'),
  band('Grey blue', 320, 610, '#7b8ea2'),
  band('Grey green', 330, 630, '#7e8e84'),
];

export interface HardnessPoint {
  tempC: number;
  hrc: number;
}
const points = (table: Record<number, number>): HardnessPoint[] =>
  Object.entries(table).map(([tempC, hrc]) => ({ tempC: Number(tempC), hrc }));
// The blog gives 1095 as one-point ranges (63–64 HRC); the midpoint of each range is stored.
export const CURVES = {
  O1: {
    source: EASTERN,
    points: points({ 150: 64, 175: 63, 205: 62, 230: 61, 260: 59, 315: 56, 370: 52, 425: 49, 480: 44, 540: 40 }),
  },
  '1095': {
    source: NOONS,
    points: points({ 149: 65, 177: 63.5, 204: 62.5, 232: 61.5, 260: 59.5, 288: 57.5, 316: 55.5, 343: 53.5 }),
  },
  silver: null,
} as const;

export const HARDENING = {
  O1: {
    temperatureC: { min: 790, max: 815 },
    quench: 'oil, down to about 65 °C (150 °F)',
    asQuenchedHrc: 65,
    source: EASTERN,
  },
  '1095': {
    temperatureC: { min: 790, max: 815 },
    quench: 'fast oil; water or brine only with care, on thick sections',
    asQuenchedHrc: null,
    source: `${NOONS}, 800 °C (1475 °F); range 790–815 °C from truekatana.com (weak)`,
  },
  silver: {
    temperatureC: { min: 770, max: 780 },
    quench: 'water; up to 8 mm (5/16 in) may be oil-hardened from 800–810 °C',
    asQuenchedHrc: null,
    source: 'glue-it.com "Heat treating silver steel"',
  },
} as const;
export type Hardening = (typeof HARDENING)[keyof typeof HARDENING];

export interface SpringTemperRange {
  temperatureC: { min: number; max: number };
  temperatureF: { min: number; max: number };
  hrc: { min: number; max: number };
  source: string;
}
/**
 * Where each steel's own table puts a flat spring's hardness. Flat springs are usually wanted at about 44–50 HRC
 * (common practice, no source), which O1 reaches only well above any temper colour; no table was found for silver
 * steel.
 */
export const SPRING_TEMPER: Record<keyof typeof HARDENING, SpringTemperRange | null> = {
  O1: {
    temperatureC: { min: 425, max: 480 },
    temperatureF: { min: 800, max: 900 },
    hrc: { min: 44, max: 49 },
    source: EASTERN,
  },
  '1095': {
    temperatureC: { min: 371, max: 427 },
    temperatureF: { min: 700, max: 800 },
    hrc: { min: 45, max: 49 },
    source: MEAD,
  },
  silver: null,
};

const temper = (
  name: string,
  numbersHard: number,
  published: number | null,
  [tMinKsi, tMaxKsi, tMinMPa, tMaxMPa, yKsi, yMPa]: [number, number, number, number, number, number],
  elongationPercent: number | null,
  note: string | null = null,
) => ({
  name,
  numbersHard,
  publishedReductionPercent: published,
  strength: {
    tensileKsi: { min: tMinKsi, max: tMaxKsi },
    tensileMPa: { min: tMinMPa, max: tMaxMPa },
    yieldKsi: yKsi,
    yieldMPa: yMPa,
    elongationPercent,
    note,
    source: OLIN,
  },
});
type BrassTemper = ReturnType<typeof temper>;
export type Strength = BrassTemper['strength'];
const EXTRA_SPRING_NOTE =
  "The page's 755 MPa upper limit does not match its 104 ksi (about 717 MPa); no elongation is given.";
// Reductions as published (rounded); strengths for C26000 strip as published, including the page's odd 755 MPa.
export const BRASS_TEMPERS: readonly BrassTemper[] = [
  temper('annealed', 0, null, [45, 61, 310, 420, 21, 145], 53),
  temper('¼ hard', 1, 10.9, [49, 59, 340, 405, 33, 230], 46),
  temper('½ hard', 2, 20.7, [57, 67, 395, 460, 51, 350], 30),
  temper('¾ hard', 3, 29.4, [64, 74, 440, 510, 62, 425], 16),
  temper('hard', 4, 37.1, [71, 81, 490, 560, 72, 495], 10),
  temper('extra hard', 6, 50.0, [83, 92, 570, 635, 83, 570], 3),
  temper('spring', 8, 60.5, [91, 100, 625, 690, 86, 595], 1, 'Elongation 1 % is a minimum.'),
  temper('extra spring', 10, 68.7, [95, 104, 655, 755, 89, 615], null, EXTRA_SPRING_NOTE),
];

export interface ClickSpringMaterial {
  id: string;
  label: string;
  youngsModulusGPa: number;
  /** Elastic limit (yield or proof strength); every preset has one, so the stress is always judged. */
  yieldStrengthMPa: number;
  source: string;
}
const material = (
  id: string,
  label: string,
  youngsModulusGPa: number,
  yieldStrengthMPa: number,
  source: string,
): ClickSpringMaterial => ({ id, label, youngsModulusGPa, yieldStrengthMPa, source });
const slug = (name: string) =>
  name.replace('¼', 'quarter').replace('½', 'half').replace('¾', 'three-quarter').replace(/ /g, '-');
/**
 * The spring-steel limit is the yield of quenched-and-tempered 1090 at 388 HB (about 41 HRC); a spring tempered harder
 * carries more, so the figure errs on the safe side.
 */
export const CLICK_SPRING_MATERIALS: readonly ClickSpringMaterial[] = [
  material(
    'spring-steel',
    'Carbon spring steel, hardened and tempered',
    206,
    895,
    `modulus: Tokai Bane "Flat springs formulas", Table 2; elastic limit: ${ASM_1090}`,
  ),
  ...BRASS_TEMPERS.map((t) =>
    material(
      `c26000-${slug(t.name)}`,
      `C26000 cartridge brass, ${t.name}`,
      110,
      t.strength.yieldMPa,
      `modulus: makeitfrom.com; elastic limit (yield): ${OLIN}`,
    ),
  ),
  material('leaded-brass', 'Leaded brass C38500', 100, 130, `modulus and elastic limit (yield): ${MAKEITFROM_C38500}`),
];
