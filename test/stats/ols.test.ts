import { describe, expect, it } from 'vitest';
import { ols } from '../../lib/stats/ols.js';
import { dist, speed } from './cars.js';
import { expectRel } from './close.js';

describe('ols', () => {
  it('ols(speed, dist) reproduces R lm(dist ~ speed) on the cars data', () => {
    const f = ols(speed, dist);
    // R 4.2 lm(dist ~ speed, datasets::cars) (Ezekiel 1930 data), via REFERENCE_VALUES
    expectRel(f.intercept, -17.57909489051089, 1e-12);
    expectRel(f.slope, 3.93240875912409, 1e-12);
    expectRel(f.interceptSE, 6.758440169379234, 1e-11);
    expectRel(f.slopeSE, 0.415512776657122, 1e-11);
    expectRel(f.rSquared, 0.651079380758251, 1e-12);
    expectRel(f.residualSE, 15.3795867488199, 1e-12);
    expect(f.df).toBe(48);
    expect(f.n).toBe(50);
    // R confint(lm(dist ~ speed)), 95 %; 1e-7 because jstat's t quantile is good to about 2e-8 relative
    expectRel(f.slopeCI.lower, 3.09696432814032, 1e-7);
    expectRel(f.slopeCI.upper, 4.76785319010785, 1e-7);
    expectRel(f.interceptCI.lower, -31.16784960238858, 1e-7);
    expectRel(f.interceptCI.upper, -3.99034017863321, 1e-7);
    // summary(lm) reports p < 1.49e-12 for speed (R, from memory): only the order of magnitude is checked
    expect(f.slopeP).toBeLessThan(1e-11);
    expect(f.slopeP).toBeGreaterThan(1e-13);
  });

  it('ols(x, y, {weights}) with equal weights equals the unweighted fit, and weights change it otherwise', () => {
    const a = ols(speed, dist);
    const b = ols(speed, dist, { weights: speed.map(() => 4) });
    expectRel(b.slope, a.slope, 1e-13);
    expectRel(b.slopeSE, a.slopeSE, 1e-12);
    expectRel(b.interceptSE, a.interceptSE, 1e-12);
    const c = ols(speed, dist, { weights: speed.map((s) => 1 / s) });
    expect(Math.abs(c.slope - a.slope)).toBeGreaterThan(1e-3);
  });

  it('ols(x, y, {weights}) equals unweighted ols on rows repeated by integer weights (point estimates)', () => {
    const x = [1, 2, 3, 4, 5];
    const y = [1.1, 2.3, 2.8, 4.4, 4.9];
    const w = [1, 2, 1, 3, 1];
    const xr: number[] = [];
    const yr: number[] = [];
    w.forEach((k, i) => {
      for (let j = 0; j < k; j++) {
        xr.push(x[i]);
        yr.push(y[i]);
      }
    });
    const a = ols(x, y, { weights: w });
    const b = ols(xr, yr);
    expectRel(a.slope, b.slope, 1e-13);
    expectRel(a.intercept, b.intercept, 1e-13);
  });

  it('ols(x, y, {level: 0.9}) narrows the interval', () => {
    const f95 = ols(speed, dist);
    const f90 = ols(speed, dist, { level: 0.9 });
    expect(f90.slopeCI.upper - f90.slopeCI.lower).toBeLessThan(f95.slopeCI.upper - f95.slopeCI.lower);
  });

  it('ols rejects mismatched lengths, too few points and bad levels', () => {
    expect(() => ols([1, 2, 3], [1, 2])).toThrow('x has 3 values but y has 2; they must pair up');
    expect(() => ols([1, 2], [1, 2])).toThrow('ols needs at least 3 points, got 2');
    expect(() => ols([1, 2, 3], [1, 2, 4], { level: 95 })).toThrow(
      'confidence level must lie strictly between 0 and 1, got 95',
    );
  });
});
