import { describe, expect, it } from 'vitest';
import { ratioWithSigma } from '../../lib/quotas/index.js';

describe('ratioWithSigma(a, σa, b, σb, scale)', () => {
  it('adds relative errors in quadrature', () => {
    // 3 ± 0.3 (10 %) over 4 ± 0.4 (10 %): 0.75 ± 0.75·√0.02 = 0.106066… (first-order propagation, Taylor 1997 eq. 3.18).
    const r = ratioWithSigma(3, 0.3, 4, 0.4);
    expect(r.value).toBeCloseTo(0.75, 14);
    expect(r.sigma).toBeCloseTo(0.10606601717798213, 14);
  });
  it('stays finite at a = 0 and is NaN for b ≤ 0 or missing sigma', () => {
    // 0 ± 1 over 2: σ = 1/2.
    expect(ratioWithSigma(0, 1, 2, 0.1).sigma).toBeCloseTo(0.5, 14);
    expect(ratioWithSigma(1, 0.1, 0, 0.1).value).toBeNaN();
    expect(ratioWithSigma(1, Number.NaN, 2, 0.1).sigma).toBeNaN();
  });
});
