import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ZodError } from 'zod';
import { springTemper, type SpringTemperInput, type SpringTemperResults } from '../../../shared/calc/spring-temper';
import { cToF, fToC, inchToMm, mmToInch } from '../../../shared/units/convert';
import { numericLeaves } from './numeric-leaves';

type Mode = SpringTemperResults['mode'];
function resultsOf<M extends Mode>(input: SpringTemperInput & { mode: M }) {
  return springTemper.compute(input).results as Extract<SpringTemperResults, { mode: M }>;
}
const steel = (over: Partial<Extract<SpringTemperInput, { mode: 'steel' }>> = {}) =>
  resultsOf({ mode: 'steel', ...over });
const brass = (numbersHard: number) => resultsOf({ mode: 'brass', numbersHard });

describe('spring-temper: steel', () => {
  it('when steel is tempered at 310 °C, then it shows light blue, the springs colour (Sheffield Gauge Plate chart)', () => {
    const band = steel({ temperatureC: 310 }).colourForTemperature;
    expect(band?.name).toBe('Light blue');
    expect(band?.note).toBe('springs');
  });

  it('when the colour is straw, then the temperature is 220 °C, 430 °F (Sheffield Gauge Plate chart)', () => {
    const band = steel({ colour: 'Straw' }).temperatureForColour;
    expect([band?.tempC, band?.tempF]).toEqual([220, 430]);
  });

  it('when the colour is typed as "dark-blue", then the temperature is 290 °C, 550 °F (Sheffield Gauge Plate chart)', () => {
    const band = steel({ colour: 'dark-blue' }).temperatureForColour;
    expect([band?.tempC, band?.tempF]).toEqual([290, 550]);
  });

  it.each([
    { tempC: 205, hrc: 62 },
    { tempC: 260, hrc: 59 },
    { tempC: 540, hrc: 40 },
  ])(
    'when O1 is tempered at $tempC °C, then it holds $hrc HRC (Eastern Tool Steel O-1 data sheet)',
    ({ tempC, hrc }) => {
      expect(steel({ temperatureC: tempC }).hardnessAtTemperatureHrc).toBe(hrc);
    },
  );

  it('when O1 is hardened, then the heat is 790–815 °C with an oil quench and 65 HRC as quenched (Eastern Tool Steel O-1 data sheet)', () => {
    const { hardening } = steel();
    expect(hardening.temperatureC).toEqual({ min: 790, max: 815 });
    expect(hardening.quench).toMatch(/oil/);
    expect(hardening.asQuenchedHrc).toBe(65);
  });

  it('when O1 is tempered at 300 °C, between the 260 and 315 °C points, then it holds 56.82 HRC (computed)', () => {
    expect(steel({ temperatureC: 300 }).hardnessAtTemperatureHrc).toBeCloseTo(56.818, 3);
  });

  it('when 1095 is tempered at 260 °C, then it holds 59.5 HRC, the middle of 59–60 (noonsknives.blogspot.com "AISI 1095" (maker\'s blog, weak))', () => {
    const out = steel({ steel: '1095', temperatureC: 260 });
    expect(out.hardnessAtTemperatureHrc).toBe(59.5);
    expect(out.hardnessCurveSource).toMatch(/weak/);
  });

  it('when silver steel is chosen, then it hardens at 770–780 °C in water and no hardness is claimed (glue-it.com "Heat treating silver steel")', () => {
    const out = springTemper.compute({ mode: 'steel', steel: 'silver', temperatureC: 300 });
    const results = out.results as Extract<SpringTemperResults, { mode: 'steel' }>;
    expect(results.hardening.temperatureC).toEqual({ min: 770, max: 780 });
    expect(results.hardening.quench).toMatch(/^water/);
    expect(results.hardnessAtTemperatureHrc).toBeNull();
    expect(results.hardnessCurve).toEqual([]);
    expect(out.warnings.join(' ')).toMatch(/silver steel/);
  });

  it('when O1 is wanted as a flat spring, then it is tempered at 425–480 °C (800–900 °F) for 49–44 HRC (Eastern Tool Steel O-1 data sheet)', () => {
    expect(steel().springTemper).toMatchObject({
      temperatureC: { min: 425, max: 480 },
      temperatureF: { min: 800, max: 900 },
      hrc: { min: 44, max: 49 },
    });
    expect(steel({ temperatureC: 425 }).hardnessAtTemperatureHrc).toBe(49);
    expect(steel({ temperatureC: 480 }).hardnessAtTemperatureHrc).toBe(44);
  });

  it('when O1 is tempered at the light-blue heat, then it is still 56 HRC and a warning says to temper springs by thermometer (Eastern Tool Steel O-1 data sheet: 600 °F/315 °C, 56 HRC)', () => {
    const out = springTemper.compute({ mode: 'steel', steel: 'O1', colour: 'Light blue' });
    expect(out.warnings.join(' ')).toMatch(/about 56 HRC.*425–480 °C.*by thermometer, not by colour/);
    expect(steel({ temperatureC: 315 }).hardnessAtTemperatureHrc).toBe(56);
  });

  it('when 1095 is wanted as a flat spring, then it is drawn at 700–800 °F for RC 49–45 (Mead Metals, ASTM A684 suggested heat treatments)', () => {
    expect(steel({ steel: '1095' }).springTemper).toMatchObject({
      temperatureF: { min: 700, max: 800 },
      hrc: { min: 45, max: 49 },
    });
    // 700 °F = 371 °C and 800 °F = 427 °C (computed)
    expect(steel({ steel: '1095' }).springTemper?.temperatureC).toEqual({
      min: Math.round(fToC(700)),
      max: Math.round(fToC(800)),
    });
    expect(springTemper.compute({ mode: 'steel', steel: '1095', temperatureC: 310 }).warnings).toEqual([]);
  });

  it('when silver steel is chosen, then no spring temper is claimed, for want of a table', () => {
    expect(steel({ steel: 'silver' }).springTemper).toBeNull();
  });

  it('when the temperature is a hardening heat, then no colour or hardness is given and warnings say why', () => {
    const out = springTemper.compute({ mode: 'steel', temperatureC: 800 });
    const results = out.results as Extract<SpringTemperResults, { mode: 'steel' }>;
    expect(results.colourForTemperature).toBeNull();
    expect(results.hardnessAtTemperatureHrc).toBeNull();
    expect(out.warnings.join(' ')).toMatch(/outside the Sheffield Gauge Plate chart/);
    expect(out.warnings.join(' ')).toMatch(/hardening heat/);
  });

  it('when the colour is not on the chart, then no temperature is given and a warning names the chart', () => {
    const out = springTemper.compute({ mode: 'steel', colour: 'tartan' });
    expect((out.results as Extract<SpringTemperResults, { mode: 'steel' }>).temperatureForColour).toBeNull();
    expect(out.warnings.join(' ')).toMatch(/not a colour on the Sheffield Gauge Plate chart/);
  });

  it('when only the mode is given, then O1 and the whole 13-band chart come back with no warnings', () => {
    const out = springTemper.compute({ mode: 'steel' });
    const results = out.results as Extract<SpringTemperResults, { mode: 'steel' }>;
    expect(results.steel).toBe('O1');
    expect(results.temperColours).toHaveLength(13);
    expect(results.hardnessCurve).toHaveLength(10);
    expect(out.warnings).toEqual([]);
  });
});

describe('spring-temper: brass', () => {
  it.each([
    { n: 1, name: '¼ hard', published: 10.9 },
    { n: 2, name: '½ hard', published: 20.7 },
    { n: 3, name: '¾ hard', published: 29.4 },
    { n: 4, name: 'hard', published: 37.1 },
    { n: 6, name: 'extra hard', published: 50.0 },
    { n: 8, name: 'spring', published: 60.5 },
    { n: 10, name: 'extra spring', published: 68.7 },
  ])(
    'when brass is $n numbers hard, then it is $name with $published % reduction ±0.2 (Precision Steel Warehouse, "Temper designations of wrought copper-base alloys")',
    ({ n, name, published }) => {
      const out = brass(n);
      expect(out.temperName).toBe(name);
      expect(out.publishedReductionPercent).toBe(published);
      expect(Math.abs(out.reductionPercent - published)).toBeLessThanOrEqual(0.2);
    },
  );

  it.each([
    { n: 1, pct: 10.95 },
    { n: 2, pct: 20.7 },
    { n: 3, pct: 29.38 },
    { n: 4, pct: 37.11 },
    { n: 6, pct: 50.13 },
    { n: 8, pct: 60.45 },
    { n: 10, pct: 68.63 },
  ])('when brass is $n numbers hard, then 1 − 1.12293^(−n) gives $pct % (computed)', ({ n, pct }) => {
    expect(brass(n).reductionPercent).toBeCloseTo(pct, 2);
  });

  it('when brass is half hard, then it has 395–460 MPa tensile and 350 MPa yield (olinbrass.com "C26000 (ASTM B36) Cartridge Brass")', () => {
    const { strength } = brass(2);
    expect(strength.tensileMPa).toEqual({ min: 395, max: 460 });
    expect(strength.yieldMPa).toBe(350);
    expect(strength.elongationPercent).toBe(30);
  });

  it('when brass is 5 or 7 numbers hard, then the nearest lower named temper is given and no published figure', () => {
    expect([brass(5).temperName, brass(5).publishedReductionPercent]).toEqual(['hard', null]);
    expect([brass(7).temperName, brass(7).publishedReductionPercent]).toEqual(['extra hard', null]);
  });

  it('when brass is hammered past 10 numbers, then it stays extra spring and a warning says no temper lies beyond', () => {
    const out = springTemper.compute({ mode: 'brass', numbersHard: 12 });
    expect((out.results as Extract<SpringTemperResults, { mode: 'brass' }>).temperName).toBe('extra spring');
    expect(out.warnings.join(' ')).toMatch(/beyond extra spring/);
  });

  it('when the numbers hard are fractional or negative, then compute throws a ZodError', () => {
    expect(() => springTemper.compute({ mode: 'brass', numbersHard: 2.5 })).toThrow(ZodError);
    expect(() => springTemper.compute({ mode: 'brass', numbersHard: -1 })).toThrow(ZodError);
  });
});

const steelInput = fc.record(
  {
    mode: fc.constant('steel' as const),
    steel: fc.constantFrom('O1' as const, '1095' as const, 'silver' as const),
    temperatureC: fc.double({ min: 0, max: 1200, noNaN: true }),
    colour: fc.string({ maxLength: 60 }),
  },
  { requiredKeys: ['mode'] },
);
const brassInput = fc.record({ mode: fc.constant('brass' as const), numbersHard: fc.integer({ min: 0, max: 20 }) });
const clickInput = fc.record(
  {
    mode: fc.constant('click-spring' as const),
    widthMm: fc.double({ min: 0.01, max: 100, noNaN: true }),
    thicknessMm: fc.double({ min: 0.01, max: 10, noNaN: true }),
    lengthMm: fc.double({ min: 0.1, max: 1000, noNaN: true }),
    deflectionMm: fc.double({ min: Number.MIN_VALUE, max: 1000, noNaN: true }),
    youngsModulusGPa: fc.double({ min: 1, max: 500, noNaN: true }),
    yieldStrengthMPa: fc.double({ min: 1, max: 5000, noNaN: true }),
  },
  { requiredKeys: ['mode', 'widthMm', 'thicknessMm', 'lengthMm', 'deflectionMm'] },
);

describe('spring-temper properties', () => {
  it('when any valid input in any mode is given, then every number in the results is finite', () => {
    fc.assert(
      fc.property(fc.oneof(steelInput, brassInput, clickInput), (input) => {
        expect(numericLeaves(springTemper.compute(input).results).every(Number.isFinite)).toBe(true);
      }),
    );
  });

  it('when O1 is tempered hotter within its table, then it is never harder (Eastern Tool Steel O-1 data sheet, interpolated)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 150, max: 540, noNaN: true }),
        fc.double({ min: 0, max: 390, noNaN: true }),
        (t, more) => {
          const hotter = Math.min(540, t + more);
          const a = steel({ temperatureC: t }).hardnessAtTemperatureHrc;
          const b = steel({ temperatureC: hotter }).hardnessAtTemperatureHrc;
          expect(b).not.toBeNull();
          expect(b!).toBeLessThanOrEqual(a!);
        },
      ),
    );
  });

  it('when any chart colour is looked up both ways, then each direction returns the same band', () => {
    for (const band of steel().temperColours) {
      expect(steel({ colour: band.name.toUpperCase() }).temperatureForColour).toEqual(band);
      expect(steel({ temperatureC: band.tempC }).colourForTemperature).toEqual(band);
    }
  });

  it('when the chart’s °C are converted, then they land within 6 °F of its °F column, which the page rounds unevenly (Sheffield Gauge Plate chart)', () => {
    for (const band of steel().temperColours) expect(Math.abs(cToF(band.tempC) - band.tempF)).toBeLessThanOrEqual(6);
  });

  it('when a temperature goes to °F and back, then it is the same to 1e-9 °C', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 1200, noNaN: true }), (c) => {
        expect(Math.abs(fToC(cToF(c)) - c)).toBeLessThanOrEqual(1e-9);
      }),
    );
  });

  it('when a spring dimension goes to inches and back, then it is the same to 1e-9 mm', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (mm) => {
        expect(Math.abs(inchToMm(mmToInch(mm)) - mm)).toBeLessThanOrEqual(1e-9);
      }),
    );
  });
});
