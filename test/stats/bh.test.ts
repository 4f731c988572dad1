import { describe, expect, it } from 'vitest';
import { benjaminiHochberg } from '../../lib/stats/bh.js';

// Benjamini & Hochberg (1995) JRSS B 57:289, §4 example: the 15 p-values.
const BH1995 = [0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1.0];

describe('benjaminiHochberg', () => {
  it('benjaminiHochberg(BH 1995 §4 p, 0.05) rejects 4 hypotheses', () => {
    // Benjamini & Hochberg (1995) §4: 4 rejections at q = 0.05.
    const r = benjaminiHochberg(BH1995, 0.05);
    expect(r.nRejected).toBe(4);
    expect(r.rejected.slice(0, 5)).toEqual([true, true, true, true, false]);
    expect(r.nTested).toBe(15);
  });

  it('benjaminiHochberg(BH 1995 §4 p) gives the R p.adjust "BH" values', () => {
    // R 4.2 p.adjust(p, "BH") on the Benjamini & Hochberg (1995) §4 p-values.
    const expected = [
      0.0015, 0.003, 0.0095, 0.035625, 0.0603, 0.0638571428571429, 0.0638571428571429, 0.0645, 0.0765, 0.486,
      0.5811818181818181, 0.714875, 0.7532307692307693, 0.8132142857142857, 1,
    ];
    const r = benjaminiHochberg(BH1995, 0.05);
    r.adjusted.forEach((a, i) => expect(a).toBeCloseTo(expected[i], 12));
  });

  it('benjaminiHochberg(p) is more lenient than Bonferroni on the BH 1995 example (3 rejections)', () => {
    // Benjamini & Hochberg (1995) §4: Bonferroni at 0.05 rejects 3.
    const bonferroni = BH1995.filter((p) => p * BH1995.length <= 0.05).length;
    expect(bonferroni).toBe(3);
    expect(benjaminiHochberg(BH1995, 0.05).nRejected).toBeGreaterThan(bonferroni);
  });

  it('benjaminiHochberg(p) keeps input order and NaN out of the family', () => {
    const shuffled = [BH1995[9], NaN, BH1995[0], ...BH1995.slice(1, 9), ...BH1995.slice(10)];
    const r = benjaminiHochberg(shuffled, 0.05);
    expect(r.nTested).toBe(15);
    expect(r.adjusted[0]).toBeCloseTo(0.486, 12);
    expect(r.adjusted[1]).toBeNaN();
    expect(r.rejected[1]).toBe(false);
    expect(r.adjusted[2]).toBeCloseTo(0.0015, 12);
  });

  it('benjaminiHochberg([]) rejects nothing', () => {
    expect(benjaminiHochberg([], 0.1)).toEqual({ adjusted: [], rejected: [], nTested: 0, nRejected: 0, q: 0.1 });
  });

  it('benjaminiHochberg(p, q) refuses p outside [0, 1] and q outside (0, 1)', () => {
    expect(() => benjaminiHochberg([0.5, 1.2])).toThrow('p-value 1 is 1.2; p-values must lie in [0, 1]');
    expect(() => benjaminiHochberg([0.5], 0)).toThrow('false discovery rate q must lie strictly between 0 and 1, got 0');
  });

  it('benjaminiHochberg(p) does not mutate its input', () => {
    const p = BH1995.slice().reverse();
    const copy = p.slice();
    benjaminiHochberg(p);
    expect(p).toEqual(copy);
  });
});
