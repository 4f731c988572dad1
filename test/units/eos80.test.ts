import { describe, expect, it } from 'vitest';
import { seawaterDensity, seawaterDensitySurface, t68FromT90 } from '../../lib/units/eos80.js';

// Fofonoff & Millard (1983) UNESCO Tech. Pap. Mar. Sci. 44, EOS-80 check values (S, T °C IPTS-68, p dbar, ρ kg m⁻³).
const CHECK: [number, number, number, number][] = [
  [0, 5, 0, 999.96675],
  [0, 5, 10000, 1044.12802],
  [0, 25, 0, 997.04796],
  [0, 25, 10000, 1037.90204],
  [35, 5, 0, 1027.67547],
  [35, 5, 10000, 1069.48914],
  [35, 25, 0, 1023.34306],
  [35, 25, 10000, 1062.53817],
];

describe('seawaterDensity(S, T, p)', () => {
  for (const [s, t, p, rho] of CHECK) {
    it(`seawaterDensity(${s}, ${t}, ${p}) matches the UNESCO check value ${rho}`, () => {
      // Fofonoff & Millard 1983, check values table; printed to 5 decimals.
      expect(Math.abs(seawaterDensity(s, t, p) - rho)).toBeLessThan(1e-5);
    });
  }

  it('seawaterDensity(S, T, 0) equals the one-atmosphere density', () => {
    expect(seawaterDensity(35, 10, 0)).toBe(seawaterDensitySurface(35, 10));
  });

  it('seawaterDensity rises with salinity and pressure and falls with temperature near 10 °C', () => {
    expect(seawaterDensity(35, 10, 100)).toBeGreaterThan(seawaterDensity(34, 10, 100));
    expect(seawaterDensity(35, 10, 1000)).toBeGreaterThan(seawaterDensity(35, 10, 100));
    expect(seawaterDensity(35, 12, 100)).toBeLessThan(seawaterDensity(35, 10, 100));
  });
});

describe('t68FromT90(t)', () => {
  it('t68FromT90(25) is 25.006 (Saunders 1990, T68 = 1.00024·T90)', () => {
    expect(t68FromT90(25)).toBeCloseTo(25.006, 12);
  });
});
