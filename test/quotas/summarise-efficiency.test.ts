import * as aq from 'arquero';
import { describe, expect, it } from 'vitest';
import { summariseEfficiency } from '../../lib/quotas/index.js';

describe('summariseEfficiency(table, by)', () => {
  it('gives n, median, geometric mean and the t interval on log10 values per group', () => {
    const table = aq.table({
      class: ['b', 'a', 'a', 'a', 'b'],
      c_fe: [1e5, 1e4, 1e5, 1e6, Number.NaN],
    });
    const out = summariseEfficiency(table, ['class']);
    expect(out.array('class')).toEqual(['a', 'b']);
    expect(out.array('n')).toEqual([3, 1]);
    // log10 values 4, 5, 6: mean 5, sd 1, t(0.975, 2) = 4.30265272974946 (Abramowitz & Stegun 1964, Table 26.10).
    const half = 4.30265272974946 / Math.sqrt(3);
    expect(out.get('median', 0)).toBeCloseTo(1e5, 6);
    expect(out.get('geometric_mean', 0)).toBeCloseTo(1e5, 6);
    // Relative comparison: the interval ends span orders of magnitude; jstat's t quantile agrees to ~1e-9.
    expect((out.get('geometric_mean_lower', 0) as number) / 10 ** (5 - half)).toBeCloseTo(1, 8);
    expect((out.get('geometric_mean_upper', 0) as number) / 10 ** (5 + half)).toBeCloseTo(1, 8);
    expect(out.get('geometric_mean_lower', 1)).toBeNaN();
    expect(out.columnNames()).toEqual(['class', 'n', 'median', 'geometric_mean', 'geometric_mean_lower', 'geometric_mean_upper']);
  });
});
