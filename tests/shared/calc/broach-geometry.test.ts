import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  cuttingFactor,
  holeDiameterAt,
  pivotTilt,
  taperFromDiameters,
  taperFromRatio,
  tiltLongPivotRad,
  tiltShortPivotRad,
  type HoleProfile,
} from '../../../shared/calc/broach-geometry';

const DEG = 180 / Math.PI;

/**
 * Plane geometry, worked here without the calculator's formula: put the corners of a regular n-gon of circumradius 1
 * on a circle and measure its width across the direction of one corner, where a micrometer's anvils close on it.
 */
function polygonReading(sides: number): { reading: number; cuttingDiameter: number } {
  const xs = Array.from({ length: sides }, (_, i) => Math.cos((2 * Math.PI * i) / sides));
  return { reading: Math.max(...xs) - Math.min(...xs), cuttingDiameter: 2 };
}

/** Largest θ for which `fits(θ)` holds, by bisection: an independent way to find a tilt. */
function largestAngle(fits: (theta: number) => boolean): number {
  let lo = 0;
  let hi = Math.PI / 2 - 1e-9;
  for (let i = 0; i < 80; i++) {
    const mid = (lo + hi) / 2;
    if (fits(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * A long pivot fits the hole at tilt θ when some sideways offset c keeps both its sides inside the wall at every depth
 * (checked at 2001 depths): c + s·tan θ ± d/(2 cos θ) within ±D(s)/2.
 */
function longPivotFits(hole: HoleProfile, d: number, theta: number): boolean {
  let lowest = -Infinity;
  let highest = Infinity;
  for (let i = 0; i <= 2000; i++) {
    const s = (hole.thicknessMm * i) / 2000;
    const half = holeDiameterAt(hole, s) / 2;
    const shift = s * Math.tan(theta);
    lowest = Math.max(lowest, -half - shift + d / (2 * Math.cos(theta)));
    highest = Math.min(highest, half - shift - d / (2 * Math.cos(theta)));
  }
  return lowest <= highest;
}

/** Width across a d × ℓ rectangle turned by θ, from its four corners. */
function rectangleWidth(d: number, l: number, theta: number): number {
  const corners = [
    [0, 0],
    [d, 0],
    [0, l],
    [d, l],
  ].map(([x, y]) => x * Math.cos(theta) + y * Math.sin(theta));
  return Math.max(...corners) - Math.min(...corners);
}

describe('odd-sided broaches read corner to flat', () => {
  it.each([
    { sides: 3, factor: 1.3333 },
    { sides: 5, factor: 1.1056 },
    { sides: 7, factor: 1.0521 },
  ])(
    'when a $sides-sided broach is measured, then the cutting diameter is the reading × $factor (plane geometry, computed)',
    ({ sides, factor }) => {
      const { reading, cuttingDiameter } = polygonReading(sides);
      expect(cuttingDiameter / reading).toBeCloseTo(factor, 4);
      expect(cuttingFactor(sides)).toBeCloseTo(cuttingDiameter / reading, 12);
    },
  );

  it('when a 4- or 6-sided broach is measured, then the anvils close corner to corner on the cutting diameter (plane geometry, computed)', () => {
    for (const sides of [4, 6, 8]) {
      const { reading, cuttingDiameter } = polygonReading(sides);
      expect(reading).toBeCloseTo(cuttingDiameter, 12);
      expect(cuttingFactor(sides)).toBe(1);
    }
    expect(cuttingFactor(0)).toBe(1);
  });
});

describe('tilt of a pivot', () => {
  it('when a 1.00 mm pivot stands in a straight 1.05 mm hole 2.0 mm long, then it tilts 1.423° (TRADE.md §1, computed)', () => {
    expect(tiltLongPivotRad(1, 1.05, 2) * DEG).toBeCloseTo(1.423, 3);
  });

  it.each([
    { d: 1, D: 1.02, h: 2, tilt: 0.572 },
    { d: 2, D: 2.1, h: 3, tilt: 1.888 },
    { d: 1, D: 1.05, h: 1, tilt: 2.794 },
  ])(
    'when pivot $d mm stands in a straight hole $D mm, $h mm long, then it tilts $tilt° (TRADE.md §1, computed)',
    ({ d, D, h, tilt }) => {
      expect(tiltLongPivotRad(d, D, h) * DEG).toBeCloseTo(tilt, 3);
    },
  );

  it('when a pivot engages only 1.0 mm of a 1.05 mm hole, then d·cos θ + ℓ·sin θ = D gives the angle at which the turned pivot spans the hole (independent bisection, computed)', () => {
    const expected = largestAngle((theta) => rectangleWidth(1, 1, theta) <= 1.05);
    expect(tiltShortPivotRad(1, 1.05, 1)).toBeCloseTo(expected, 9);
    // Worked once by hand: θ = atan2(1, 1) − acos(1.05/√2) = 45° − 42.058° = 2.942° (computed).
    expect(tiltShortPivotRad(1, 1.05, 1) * DEG).toBeCloseTo(2.942, 3);
  });

  it('when a pivot is short and the hole wide, then nothing holds it up and a right angle comes back', () => {
    expect(tiltShortPivotRad(1, 1.5, 1)).toBeCloseTo(Math.PI / 2, 12);
  });

  it.each(['both', 'one'] as const)(
    'when a long pivot stands in a hole opened from %s face(s), then the tilt matches a brute-force search of the tapered wall (computed)',
    (openedFrom) => {
      const hole: HoleProfile = { narrowestMm: 1.03, cuttingTaper: 0.04, thicknessMm: 2, openedFrom };
      const expected = largestAngle((theta) => longPivotFits(hole, 1, theta));
      expect(pivotTilt(hole, 1).rad).toBeCloseTo(expected, 4);
    },
  );

  it('when the clearance is tiny and the taper steep, then the narrowest point limits the tilt, as the brute-force search finds (computed)', () => {
    const hole: HoleProfile = { narrowestMm: 1.0005, cuttingTaper: 0.3, thicknessMm: 2, openedFrom: 'both' };
    const tilt = pivotTilt(hole, 1);
    expect(tilt.waistLimited).toBe(true);
    expect(tilt.rad).toBeCloseTo(
      largestAngle((theta) => longPivotFits(hole, 1, theta)),
      4,
    );
  });

  it('when any hole and pivot are given, then the tilt is finite, not negative and never past a right angle', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0.3, max: 12, noNaN: true }),
        fc.constantFrom('both' as const, 'one' as const),
        fc.option(fc.double({ min: 0.05, max: 20, noNaN: true }), { nil: undefined }),
        (d, extra, k, t, openedFrom, length) => {
          const tilt = pivotTilt({ narrowestMm: d + extra, cuttingTaper: k, thicknessMm: t, openedFrom }, d, length);
          expect(Number.isFinite(tilt.rad)).toBe(true);
          expect(tilt.rad).toBeGreaterThanOrEqual(0);
          expect(tilt.rad).toBeLessThanOrEqual(Math.PI / 2 + 1e-12);
        },
      ),
    );
  });
});

describe('taper from readings', () => {
  it('when a smoothing broach reads 8.6 mm and 7.6 mm 130 mm apart, then k = 0.0077, about 1:130 (a maker’s workshop blog (weak source))', () => {
    expect(taperFromDiameters(8.6, 7.6, 130)).toBeCloseTo(0.0077, 4);
    expect(taperFromRatio('1:130')).toBeCloseTo(0.0077, 4);
  });

  it('when a ratio is typed as "1:50", "1 / 50" or "0.02", then each gives k = 0.02 (computed)', () => {
    expect(taperFromRatio('1:50')).toBeCloseTo(0.02, 12);
    expect(taperFromRatio(' 1 / 50 ')).toBeCloseTo(0.02, 12);
    expect(taperFromRatio('0.02')).toBeCloseTo(0.02, 12);
  });

  it('when the text is not a taper, then taperFromRatio gives null', () => {
    for (const text of ['', 'abc', '1:0', '0:50', '0', '-1:50', '1:50:2']) expect(taperFromRatio(text)).toBeNull();
  });

  it('when two readings are equal or the distance is not positive, then taperFromDiameters gives null', () => {
    expect(taperFromDiameters(1, 1, 25)).toBeNull();
    expect(taperFromDiameters(1, 1.2, 0)).toBeNull();
    expect(taperFromDiameters(1, 1.2, -10)).toBeNull();
  });

  it('when the readings are given in either order, then the taper is the same', () => {
    expect(taperFromDiameters(1.2, 1.0, 25)).toBeCloseTo(0.008, 12);
    expect(taperFromDiameters(1.0, 1.2, 25)).toBeCloseTo(0.008, 12);
  });
});
