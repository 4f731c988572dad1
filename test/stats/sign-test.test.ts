import { describe, expect, it } from 'vitest';
import { signTest } from '../../lib/stats/sign-test.js';

describe('signTest', () => {
  it('signTest(sleep differences) gives 2·½⁹', () => {
    // Student (1908) sleep differences: 9 negative, 1 zero; exact binomial p = 2·(1/2)^9 = 0.00390625
    // (R binom.test(0, 9) prints 0.003906).
    const r = signTest([-1.2, -2.4, -1.3, -1.3, 0.0, -1.0, -1.8, -0.8, -4.6, -1.4]);
    expect(r).toEqual({ n: 9, nPositive: 0, nNegative: 9, nZero: 1, p: 0.00390625 });
  });

  it('signTest(x) is the two-sided binomial tail', () => {
    // Hand computation: n = 10, k = 2: P(X ≤ 2) = (1 + 10 + 45)/1024, p = 2·56/1024 = 0.109375.
    const x = [1, 2, -3, 4, 5, 6, -7, 8, 9, 10];
    expect(signTest(x).p).toBeCloseTo(0.109375, 14);
    // A balanced sample cannot reject: p = 1.
    expect(signTest([1, -1, 2, -2]).p).toBe(1);
  });

  it('signTest(x) stays finite for large n', () => {
    // Normal approximation (common practice): 600 of 1000 positive is z ≈ 6.3, so p is tiny but positive.
    const x = Array.from({ length: 1000 }, (_, i) => (i < 600 ? 1 : -1));
    const p = signTest(x).p;
    expect(p).toBeGreaterThan(0);
    expect(p).toBeLessThan(1e-8);
  });
});
