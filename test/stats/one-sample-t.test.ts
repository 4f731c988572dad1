import { describe, expect, it } from 'vitest';
import { oneSampleT } from '../../lib/stats/one-sample-t.js';

// Student (1908) sleep data (R datasets::sleep), differences group 1 − group 2 per patient.
const SLEEP_DIFF = [-1.2, -2.4, -1.3, -1.3, 0.0, -1.0, -1.8, -0.8, -4.6, -1.4];

describe('oneSampleT', () => {
  it('oneSampleT(sleep differences) matches R t.test(extra ~ group, sleep, paired = TRUE)', () => {
    const r = oneSampleT(SLEEP_DIFF);
    // From memory: R t.test paired on sleep prints t = -4.0621, df = 9, p-value = 0.002833,
    // 95 percent CI -2.4598858 -0.7001142, mean difference -1.58.
    expect(r.mean).toBeCloseTo(-1.58, 12);
    expect(r.t).toBeCloseTo(-4.0621, 4);
    expect(r.df).toBe(9);
    expect(r.p).toBeCloseTo(0.002833, 6);
    expect(r.ciLow).toBeCloseTo(-2.4598858, 6);
    expect(r.ciHigh).toBeCloseTo(-0.7001142, 6);
  });

  it('oneSampleT([1..5]) has the hand-computed mean, SE and t', () => {
    // Hand computation: mean 3, s² = 10/4, se = √(2.5/5) = √0.5, t = 3/√0.5.
    const r = oneSampleT([1, 2, 3, 4, 5]);
    expect(r.sd).toBeCloseTo(Math.sqrt(2.5), 14);
    expect(r.se).toBeCloseTo(Math.sqrt(0.5), 14);
    expect(r.t).toBeCloseTo(3 / Math.sqrt(0.5), 12);
  });

  it('oneSampleT(x, mu0, level) centres on mu0 and uses the t quantile for the interval', () => {
    // Abramowitz & Stegun (1964) Table 26.10 via R qt: t(0.975, 10) = 2.22813885198627.
    const x = [0.1, 0.4, -0.3, 0.2, 0.5, 0.0, 0.3, -0.1, 0.6, 0.2, 0.4];
    const r = oneSampleT(x, 0.1);
    expect(r.df).toBe(10);
    // jstat's t quantile agrees with R to about 1e-9 relative.
    expect(r.ciHigh - r.mean).toBeCloseTo(2.22813885198627 * r.se, 8);
    expect(r.t).toBeCloseTo((r.mean - 0.1) / r.se, 12);
    const r90 = oneSampleT(x, 0.1, 0.9);
    expect(r90.ciHigh - r90.ciLow).toBeLessThan(r.ciHigh - r.ciLow);
  });

  it('oneSampleT(x) gives no test for n < 2 or constant values, and ignores NaN', () => {
    expect(oneSampleT([1]).p).toBeNaN();
    expect(oneSampleT([2, 2, 2]).t).toBeNaN();
    const r = oneSampleT([1, NaN, 2, 3]);
    expect(r.n).toBe(3);
    expect(r.nNonFinite).toBe(1);
  });

  it('oneSampleT(x, 0, 1.5) refuses a level outside (0, 1)', () => {
    expect(() => oneSampleT([1, 2], 0, 1.5)).toThrow('confidence level must lie strictly between 0 and 1, got 1.5');
  });
});
