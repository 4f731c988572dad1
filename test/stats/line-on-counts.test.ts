import { describe, expect, it } from 'vitest';
import { groupLineSums } from '../../lib/stats/group-line-sums.js';
import { lineOnCounts } from '../../lib/stats/line-on-counts.js';
import { ols } from '../../lib/stats/ols.js';
import { sma } from '../../lib/stats/sma.js';
import { smallResample } from './on-counts.js';

describe('lineOnCounts', () => {
  const { x, y, index, counts, rows } = smallResample();
  const lx = x.map(Math.log10);
  const ly = y.map(Math.log10);
  const w = x.map((_, i) => 1 + (i % 3));

  it('lineOnCounts(groupLineSums(x, y), counts, "ols") equals ols refitted on the resampled rows', () => {
    const f = lineOnCounts(groupLineSums(lx, ly, undefined, index), counts, 'ols');
    const g = ols(rows.map((i) => lx[i]), rows.map((i) => ly[i]));
    expect(f.slope).toBeCloseTo(g.slope, 13);
    expect(f.intercept).toBeCloseTo(g.intercept, 13);
  });

  it('lineOnCounts with weights equals weighted ols on the resampled rows', () => {
    const f = lineOnCounts(groupLineSums(lx, ly, w, index), counts, 'ols');
    const g = ols(rows.map((i) => lx[i]), rows.map((i) => ly[i]), { weights: rows.map((i) => w[i]) });
    expect(f.slope).toBeCloseTo(g.slope, 13);
    expect(f.intercept).toBeCloseTo(g.intercept, 13);
  });

  it('lineOnCounts(…, "sma") equals sma refitted on the resampled rows', () => {
    const f = lineOnCounts(groupLineSums(lx, ly, undefined, index), counts, 'sma');
    const g = sma(rows.map((i) => lx[i]), rows.map((i) => ly[i]));
    expect(f.slope).toBeCloseTo(g.slope, 13);
    expect(f.intercept).toBeCloseTo(g.intercept, 13);
  });

  it('lineOnCounts gives NaN when the drawn rows have no x spread', () => {
    const f = lineOnCounts(groupLineSums([1, 1, 2], [1, 2, 3], undefined, { groups: 2, start: Int32Array.from([0, 2, 3]), rows: Int32Array.from([0, 1, 2]), present: Int32Array.from([0, 1]) }), Int32Array.from([3, 0]), 'ols');
    expect(Number.isNaN(f.slope)).toBe(true);
  });
});
