import { randomLcg, randomNormal } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { bootstrapByGroup } from '../../lib/stats/bootstrap-by-group.js';
import { olsOnIndices } from '../../lib/stats/ols-on-indices.js';

describe('bootstrapByGroup', () => {
  it('bootstrapByGroup resamples whole groups: every replicate holds complete groups only', () => {
    // 5 groups of sizes 1..5; the statistic records which rows it saw.
    const group = Int32Array.from([0, 1, 1, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 4]);
    const sizes = [1, 2, 3, 4, 5];
    let checked = 0;
    bootstrapByGroup(
      group,
      (idx, len) => {
        const counts = [0, 0, 0, 0, 0];
        for (let k = 0; k < len; k++) counts[group[idx[k]]]++;
        for (let g = 0; g < 5; g++) expect(counts[g] % sizes[g]).toBe(0);
        const drawn = counts.reduce((s, c, g) => s + c / sizes[g], 0);
        expect(drawn).toBe(5);
        checked++;
        return [len];
      },
      { replicates: 50, seed: 1 },
    );
    expect(checked).toBe(51);
  });

  it('bootstrapByGroup with the same seed gives identical results, and another seed different ones', () => {
    const x = Float64Array.from({ length: 40 }, (_, i) => i % 13);
    const y = Float64Array.from(x, (v, i) => 2 * v + ((i * 7) % 5));
    const group = Int32Array.from({ length: 40 }, (_, i) => Math.floor(i / 4));
    const stat = (idx: Int32Array, len: number) => {
      const f = olsOnIndices(x, y, idx, len);
      return [f.slope, f.intercept];
    };
    const a = bootstrapByGroup(group, stat, { replicates: 100, seed: 42 });
    const b = bootstrapByGroup(group, stat, { replicates: 100, seed: 42 });
    const c = bootstrapByGroup(group, stat, { replicates: 100, seed: 43 });
    expect(JSON.stringify(b)).toBe(JSON.stringify(a));
    expect(c.values[0]).not.toEqual(a.values[0]);
    expect(a.groups).toBe(10);
    expect(a.intervals[0].lower).toBeLessThan(a.estimate[0]);
    expect(a.intervals[0].upper).toBeGreaterThan(a.estimate[0]);
  });

  it('bootstrapByGroup leaves non-finite replicates out of the interval and counts them', () => {
    const group = Int32Array.from([0, 1, 2, 3]);
    let call = 0;
    const r = bootstrapByGroup(group, () => [call++ % 2 === 0 ? 1 : NaN], { replicates: 10, seed: 3 });
    // call 0 is the full-data estimate; replicates are calls 1..10, half of them NaN
    expect(r.failed).toEqual([5]);
    expect(r.intervals[0]).toEqual({ lower: 1, upper: 1 });
  });

  // Speed is measured by `npm run bench`, not by timed unit tests.
  it('bootstrapByGroup(group, olsOnIndices) returns one estimate per replicate on a large table', () => {
    const n = 20_000;
    const rng = randomLcg(7);
    const normal = randomNormal.source(rng)(0, 1);
    const x = Float64Array.from({ length: n }, () => rng() * 10);
    const y = Float64Array.from(x, (v) => 1 + 0.5 * v + normal());
    const group = Int32Array.from({ length: n }, (_, i) => Math.floor(i / 50));
    const r = bootstrapByGroup(
      group,
      (idx, len) => {
        const f = olsOnIndices(x, y, idx, len);
        return [f.slope];
      },
      { replicates: 200, seed: 11 },
    );
    expect(r.values[0]).toHaveLength(200);
    expect(r.failed).toEqual([0]);
    // The slope is 0.5 by construction; with 400 groups of 50 rows its bootstrap interval is narrow around it.
    expect(r.intervals[0].lower).toBeLessThan(0.5);
    expect(r.intervals[0].upper).toBeGreaterThan(0.5);
  });
});

describe('olsOnIndices', () => {
  it('olsOnIndices(x, y, idx, len) equals ols on the gathered rows, repeats included', async () => {
    const { ols } = await import('../../lib/stats/ols.js');
    const x = [3.1, 4.7, 5.2, 8.9, 10.4, 12.2, 15.5];
    const y = [1.2, 2.9, 2.2, 5.1, 5.0, 7.7, 8.1];
    const idx = Int32Array.from([6, 0, 0, 3, 5, 5, 2, 99]);
    const len = 7;
    const f = olsOnIndices(x, y, idx, len);
    const rows = Array.from(idx.subarray(0, len));
    const g = ols(
      rows.map((i) => x[i]),
      rows.map((i) => y[i]),
    );
    expect(f.slope).toBeCloseTo(g.slope, 12);
    expect(f.intercept).toBeCloseTo(g.intercept, 12);
  });
});
