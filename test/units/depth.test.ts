import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { depthFromPressure, pressureFromDepth } from '../../lib/units/depth.js';

describe('depthFromPressure(p, lat)', () => {
  it('depthFromPressure(10000, 30) is 9712.653 m', () => {
    // Fofonoff & Millard (1983) UNESCO Tech. Pap. Mar. Sci. 44, depth check value.
    expect(depthFromPressure(10000, 30)).toBeCloseTo(9712.653, 3);
  });

  it('depthFromPressure(0, lat) is 0 and depth grows toward the equator for one pressure', () => {
    expect(depthFromPressure(0, 45)).toBe(0);
    // Gravity is weaker at the equator, so the same pressure sits deeper (common practice).
    expect(depthFromPressure(4000, 0)).toBeGreaterThan(depthFromPressure(4000, 60));
  });
});

describe('pressureFromDepth(z, lat)', () => {
  it('pressureFromDepth(9712.653, 30) inverts the check value to 10000 dbar', () => {
    expect(pressureFromDepth(9712.653, 30)).toBeCloseTo(10000, 2);
  });

  it('pressureFromDepth(depthFromPressure(p, lat), lat) round-trips to 1e-8 dbar', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 11000, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }), (p, lat) => {
        expect(Math.abs(pressureFromDepth(depthFromPressure(p, lat), lat) - p)).toBeLessThan(1e-8);
      }),
      { numRuns: 200 },
    );
  });

  it('pressureFromDepth(NaN, lat) is NaN', () => {
    expect(pressureFromDepth(NaN, 10)).toBeNaN();
    expect(pressureFromDepth(100, NaN)).toBeNaN();
  });
});
