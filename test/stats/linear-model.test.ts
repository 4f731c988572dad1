import { describe, expect, it } from 'vitest';
import { linearModel } from '../../lib/stats/linear-model.js';
import { ols } from '../../lib/stats/ols.js';
import { dist, speed } from './cars.js';
import { expectRel } from './close.js';

describe('linearModel', () => {
  it('linearModel([1, speed], dist) reproduces R lm(dist ~ speed)', () => {
    const f = linearModel([speed.map(() => 1), speed], dist);
    // R 4.2 lm(dist ~ speed, datasets::cars) (Ezekiel 1930 data), via REFERENCE_VALUES
    expectRel(f.coefficients[0], -17.57909489051089, 1e-12);
    expectRel(f.coefficients[1], 3.93240875912409, 1e-12);
    expectRel(Math.sqrt(f.covariance[0]), 6.758440169379234, 1e-11);
    expectRel(Math.sqrt(f.covariance[3]), 0.415512776657122, 1e-11);
    expectRel(f.residualSE, 15.3795867488199, 1e-12);
    expect(f.df).toBe(48);
    expectRel(f.covariance[1], ols(speed, dist).covInterceptSlope, 1e-10);
  });

  it('linearModel fits an exact quadratic exactly', () => {
    const x = [0, 1, 2, 3, 4, 5];
    const y = x.map((v) => 2 - 3 * v + 0.5 * v * v);
    const f = linearModel([x.map(() => 1), x, x.map((v) => v * v)], y);
    expectRel(f.coefficients[0], 2, 1e-12);
    expectRel(f.coefficients[1], -3, 1e-12);
    expectRel(f.coefficients[2], 0.5, 1e-12);
    expect(f.rss).toBeLessThan(1e-20);
  });

  it('linearModel rejects a singular design', () => {
    const x = [1, 2, 3, 4];
    expect(() => linearModel([x, x.map((v) => 2 * v)], [1, 2, 3, 5])).toThrow(
      'linearModel: the design is singular (parameters not identifiable from these data)',
    );
  });
});
