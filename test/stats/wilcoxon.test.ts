import { describe, expect, it } from 'vitest';
import { wilcoxonSignedRank } from '../../lib/stats/wilcoxon.js';

// Independent reference: enumerate all 2ⁿ sign patterns of ranks 1..n (no ties, no zeros).
function bruteForceP(values: number[]): number {
  const n = values.length;
  const order = values.map((v, i) => [Math.abs(v), i]).sort((a, b) => a[0] - b[0]);
  const rank = new Array<number>(n);
  order.forEach(([, i], k) => (rank[i] = k + 1));
  const v = values.reduce((s, x, i) => s + (x > 0 ? rank[i] : 0), 0);
  let le = 0;
  let ge = 0;
  for (let mask = 0; mask < 1 << n; mask++) {
    let s = 0;
    for (let r = 1; r <= n; r++) if (mask & (1 << (r - 1))) s += r;
    if (s <= v) le++;
    if (s >= v) ge++;
  }
  return Math.min(1, (2 * Math.min(le, ge)) / 2 ** n);
}

describe('wilcoxonSignedRank', () => {
  it('wilcoxonSignedRank([1..5]) is exact: V = 15, p = 2/32', () => {
    // Hand enumeration: only the all-positive pattern reaches V = 15, so p = 2·(1/32) = 0.0625.
    const r = wilcoxonSignedRank([1, 2, 3, 4, 5]);
    expect(r).toEqual({ n: 5, nZero: 0, statistic: 15, p: 0.0625, method: 'exact', ties: false });
  });

  it('wilcoxonSignedRank(x) matches the enumeration of all sign patterns for n ≤ 6', () => {
    // Hand enumeration of the 2ⁿ equally likely sign patterns (the exact null distribution).
    const cases = [
      [-1, 2, 3, 4, 5, 6],
      [0.3, -0.1, 0.25, -0.7, 0.9, 0.05],
      [-0.2, -0.5, 0.1],
      [1.5, -2.5, 3.5, -4.5],
    ];
    for (const x of cases) expect(wilcoxonSignedRank(x).p).toBeCloseTo(bruteForceP(x), 14);
    expect(wilcoxonSignedRank([-1, 2, 3, 4, 5, 6]).p).toBeCloseTo(4 / 64, 14);
  });

  it('wilcoxonSignedRank(sleep differences) uses the normal approximation with ties and a zero', () => {
    // From memory: R wilcox.test(extra ~ group, data = sleep, paired = TRUE) gives V = 0, p-value = 0.009091
    // (with the warning that it cannot compute an exact p-value with ties and zeroes). Student (1908) data.
    const r = wilcoxonSignedRank([-1.2, -2.4, -1.3, -1.3, 0.0, -1.0, -1.8, -0.8, -4.6, -1.4]);
    expect(r.method).toBe('normal-approx');
    expect(r.nZero).toBe(1);
    expect(r.n).toBe(9);
    expect(r.ties).toBe(true);
    expect(r.statistic).toBe(0);
    expect(r.p).toBeCloseTo(0.009091, 6);
  });

  it('wilcoxonSignedRank(x) switches to the normal approximation at n = 50', () => {
    const x = Array.from({ length: 50 }, (_, i) => (i % 3 === 0 ? -1 : 1) * (i + 1));
    const r = wilcoxonSignedRank(x);
    expect(r.method).toBe('normal-approx');
    expect(wilcoxonSignedRank(x.slice(0, 49)).method).toBe('exact');
    // At n = 49 the exact and the approximate p should be close.
    expect(Math.abs(r.p - wilcoxonSignedRank(x.slice(0, 49)).p)).toBeLessThan(0.05);
  });

  it('wilcoxonSignedRank([]) gives no p-value', () => {
    expect(wilcoxonSignedRank([0, 0]).p).toBeNaN();
  });
});
