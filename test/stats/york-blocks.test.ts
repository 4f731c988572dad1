import { describe, expect, it } from 'vitest';
import { groupRows } from '../../lib/stats/group-rows.js';
import { york } from '../../lib/stats/york.js';
import { yorkBlocks } from '../../lib/stats/york-blocks.js';
import { yorkOnBlocks, yorkOnCounts } from '../../lib/stats/york-on-counts.js';

/** 40 stations of 6 cells; σy² per cell a relative ±`spread` around a per-station value, so cells share blocks. */
function stations(spread: number) {
  const lx: number[] = [];
  const ly: number[] = [];
  const sx: number[] = [];
  const sy: number[] = [];
  const group: number[] = [];
  for (let s = 0; s < 40; s++) {
    const t = -1.3 + 1.6 * ((s * 0.618) % 1);
    for (let c = 0; c < 6; c++) {
      lx.push(t + 0.04 * Math.sin(7 * s + 3 * c));
      ly.push(0.9 + 0.6 * t + 0.03 * Math.cos(5 * s + 11 * c));
      sx.push(0.1 / Math.LN10);
      sy.push((0.02 + 0.002 * (s % 3)) * Math.sqrt(1 + spread * Math.sin(13 * c + s)));
      group.push(s);
    }
  }
  const index = groupRows(Int32Array.from(group));
  const pick = (v: number[]) => Float64Array.from(index.rows, (i) => v[i]);
  const data = { start: index.start, x: pick(lx), y: pick(ly), vx: pick(sx.map((v) => v * v)), vy: pick(sy.map((v) => v * v)) };
  // A fixed draw of 40 stations with repeats.
  const counts = Int32Array.from({ length: 40 }, (_, j) => [0, 1, 2, 1, 0, 3, 1, 1][j % 8]);
  const rows: number[] = [];
  for (let j = 0; j < 40; j++) for (let c = 0; c < counts[j]; c++) for (let t = index.start[j]; t < index.start[j + 1]; t++) rows.push(index.rows[t]);
  return { lx, ly, sx, sy, data, counts, rows };
}

describe('yorkBlocks', () => {
  for (const spread of [0, 1e-9, 1e-4, 1e-3, 0.5]) {
    it(`yorkOnCounts(data, counts) equals york on the resampled rows when σy² within a station spreads by ${spread}`, () => {
      const { lx, ly, sx, sy, data, counts, rows } = stations(spread);
      const full = york(lx, ly, sx, sy);
      const f = yorkOnCounts(data, counts, { startSlope: full.slope });
      const g = york(rows.map((i) => lx[i]), rows.map((i) => ly[i]), rows.map((i) => sx[i]), rows.map((i) => sy[i]));
      expect(Math.abs(f.slope - g.slope)).toBeLessThan(1e-10 * Math.abs(g.slope));
      expect(Math.abs(f.intercept - g.intercept)).toBeLessThan(1e-10 * Math.abs(g.intercept));
    });
  }

  it('yorkBlocks(data) keeps one block per station when σy² differ by rounding only', () => {
    const { data } = stations(1e-15);
    const b = yorkBlocks(data);
    expect(b.vx.length).toBe(40);
    expect(Math.max(...b.terms)).toBeLessThanOrEqual(2);
  });

  it('yorkOnBlocks converges from the whole-data slope in at most 5 evaluations of the York update', () => {
    const { lx, ly, sx, sy, data, counts } = stations(1e-4);
    const full = york(lx, ly, sx, sy);
    const f = yorkOnBlocks(yorkBlocks(data), counts, { startSlope: full.slope });
    expect(f.iterations).toBeLessThanOrEqual(5);
    // From a cold start (slope 0) Steffensen still converges, to the same slope.
    const cold = yorkOnBlocks(yorkBlocks(data), counts, { startSlope: 0 });
    expect(cold.iterations).toBeLessThanOrEqual(12);
    expect(Math.abs(cold.slope - f.slope)).toBeLessThan(1e-11);
  });
});
