import { describe, expect, it } from 'vitest';
import { york } from '../../lib/stats/york.js';
import { yorkOnCounts } from '../../lib/stats/york-on-counts.js';
import { smallResample } from './on-counts.js';

describe('yorkOnCounts', () => {
  it('yorkOnCounts(data, counts) equals york refitted on the resampled rows, from a warm start', () => {
    const { x, y, index, counts, rows } = smallResample();
    const lx = x.map(Math.log10);
    const ly = y.map(Math.log10);
    const sx = x.map(() => 0.1 / Math.LN10);
    const sy = x.map((_, i) => 0.03 + 0.01 * (i % 4));
    const pick = (v: number[]) => Float64Array.from(index.rows, (i) => v[i]);
    const data = { start: index.start, x: pick(lx), y: pick(ly), vx: pick(sx.map((s) => s * s)), vy: pick(sy.map((s) => s * s)) };
    const full = york(lx, ly, sx, sy);
    const f = yorkOnCounts(data, counts, { startSlope: full.slope });
    const g = york(rows.map((i) => lx[i]), rows.map((i) => ly[i]), rows.map((i) => sx[i]), rows.map((i) => sy[i]));
    expect(f.slope).toBeCloseTo(g.slope, 11);
    expect(f.intercept).toBeCloseTo(g.intercept, 11);
    expect(f.iterations).toBeLessThan(30);
  });
});
