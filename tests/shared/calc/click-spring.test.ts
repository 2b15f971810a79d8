import { describe, expect, it } from 'vitest';
import {
  CLICK_SPRING_MATERIALS,
  springTemper,
  type SpringTemperInput,
  type SpringTemperResults,
} from '../../../shared/calc/spring-temper';

type Mode = SpringTemperResults['mode'];
function resultsOf<M extends Mode>(input: SpringTemperInput & { mode: M }) {
  return springTemper.compute(input).results as Extract<SpringTemperResults, { mode: M }>;
}
const click = { mode: 'click-spring', widthMm: 2, thicknessMm: 0.3, lengthMm: 20, deflectionMm: 1 } as const;
const modulus = (id: string) => CLICK_SPRING_MATERIALS.find((m) => m.id === id)?.youngsModulusGPa;
const limit = (id: string) => CLICK_SPRING_MATERIALS.find((m) => m.id === id)!.yieldStrengthMPa;

describe('spring-temper: click spring', () => {
  it.each([
    { E: 206, force: 0.348, stress: 231.8 },
    { E: 110, force: 0.186, stress: 123.8 },
    { E: 97, force: 0.164, stress: 109.1 },
  ])('when b 2, t 0.3, L 20, δ 1 mm with E = $E GPa, then F = $force N and σ = $stress MPa (computed)', (row) => {
    const out = resultsOf({ ...click, youngsModulusGPa: row.E });
    expect(out.forceN).toBeCloseTo(row.force, 3);
    // The table rounds to 0.1 MPa (231.75 prints as 231.8), so allow half a step.
    expect(Math.abs(out.stressMPa - row.stress)).toBeLessThanOrEqual(0.05 + 1e-9);
    expect(out.stiffnessNPerMm).toBeCloseTo(out.forceN!, 12);
  });

  it('when no modulus is given, then spring steel’s 206 GPa is used (Tokai Bane "Flat springs formulas", Table 2)', () => {
    expect(modulus('spring-steel')).toBe(206);
    expect(resultsOf(click).forceN).toBeCloseTo(0.348, 3);
  });

  it('when the presets are read, then C26000 is 110 GPa and leaded brass 100 GPa (makeitfrom.com)', () => {
    expect(modulus('c26000-half-hard')).toBe(110);
    expect(modulus('leaded-brass')).toBe(100);
  });

  it('when leaded brass is chosen, then its elastic limit is the 130 MPa proof strength (makeitfrom.com "UNS C38500 (CW608N) Architectural Bronze", M20)', () => {
    expect(limit('leaded-brass')).toBe(130);
  });

  it('when spring steel is chosen, then its elastic limit is 895 MPa, quenched-and-tempered 1090 at 388 HB (steel-heattreatment.com Table 2, from the ASM Metals Handbook)', () => {
    expect(limit('spring-steel')).toBe(895);
  });

  it('when any preset is chosen, then it has an elastic limit and names where it comes from', () => {
    for (const m of CLICK_SPRING_MATERIALS) {
      expect(m.yieldStrengthMPa).toBeGreaterThan(0);
      expect(m.source).toMatch(/elastic limit/);
    }
  });

  it('when spring-temper C26000 is chosen, then its yield is 595 MPa (olinbrass.com "C26000 (ASTM B36) Cartridge Brass")', () => {
    expect(CLICK_SPRING_MATERIALS.find((m) => m.id === 'c26000-spring')?.yieldStrengthMPa).toBe(595);
  });

  it('when the stress passes the elastic limit, then the ratio is over 1, no force is given and a warning says the spring sets', () => {
    const out = springTemper.compute({ ...click, youngsModulusGPa: 110, deflectionMm: 3, yieldStrengthMPa: 350 });
    const r = out.results as Extract<SpringTemperResults, { mode: 'click-spring' }>;
    expect(r.stressToYield).toBeGreaterThan(1);
    expect(r.forceN).toBeNull();
    expect(out.warnings.join(' ')).toMatch(/takes a set or breaks/);
  });

  it('when a 2 × 1 mm steel spring 5 mm long is bent 0.5 mm, then the elastic formula gives 6180 MPa and 412 N, and neither is shown as a force the spring carries (computed)', () => {
    // σ = 1.5 × 206 000 × 1 × 0.5 / 5² = 6180 MPa; F = 3 × 206 000 × (2 × 1³/12) × 0.5 / 5³ = 412 N (computed).
    const steel = { mode: 'click-spring', widthMm: 2, thicknessMm: 1, lengthMm: 5, deflectionMm: 0.5 } as const;
    const withLimit = springTemper.compute({ ...steel, yieldStrengthMPa: limit('spring-steel') });
    const r = withLimit.results as Extract<SpringTemperResults, { mode: 'click-spring' }>;
    expect(r.stressMPa).toBeCloseTo(6180, 6);
    expect(r.forceN).toBeNull();
    expect(withLimit.steps.find((x) => x.label.startsWith('Force at the tip'))?.result).toBe('412 N');
    expect(withLimit.warnings.join(' ')).toMatch(/6180 MPa is 6\.905 × the elastic limit/);
    const noLimit = springTemper.compute(steel);
    expect((noLimit.results as typeof r).forceN).toBeNull();
    expect(noLimit.warnings.join(' ')).toMatch(/past the tensile strength of any spring steel/);
  });

  it('when spring-temper brass works at 95 % of its elastic limit, then a warning says to keep under 60 % and gives the deflection there (computed)', () => {
    // σ = 1.5 × 110 000 × 1 × 1.37 / 20² = 565.1 MPa = 95.0 % of 595 MPa; 60 % is reached at 1.37 × 0.6/0.9498 = 0.8655 mm.
    const brassSpring = { mode: 'click-spring', widthMm: 2, thicknessMm: 1, lengthMm: 20, deflectionMm: 1.37 } as const;
    const out = springTemper.compute({ ...brassSpring, youngsModulusGPa: 110, yieldStrengthMPa: 595 });
    const r = out.results as Extract<SpringTemperResults, { mode: 'click-spring' }>;
    expect(r.stressToYield).toBeCloseTo(0.95, 2);
    expect(r.forceN).not.toBeNull();
    expect(r.deflectionAtWorkingShareMm).toBeCloseTo(0.8655, 4);
    expect(out.warnings.join(' ')).toMatch(/94\.98 % of the elastic limit .* keep it under 60 %/);
  });

  it('when the stress is under 60 % of the limit, then no stress warning is given', () => {
    // TRADE.md §3d first row: 231.8 MPa in steel, 26 % of 895 MPa (computed).
    expect(springTemper.compute({ ...click, yieldStrengthMPa: 895 }).warnings).toEqual([]);
  });

  it('when no elastic limit is given, then a warning says the stress cannot be judged', () => {
    expect(springTemper.compute(click).warnings.join(' ')).toMatch(/cannot be judged/);
  });

  it('when the deflection is more than a tenth of the length, then a warning says the formula stops holding', () => {
    expect(springTemper.compute({ ...click, deflectionMm: 3 }).warnings.join(' ')).toMatch(/stops holding/);
  });
});
