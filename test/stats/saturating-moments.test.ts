import { describe, expect, it } from 'vitest';
import { groupRows } from '../../lib/stats/group-rows.js';
import { michaelisMentenOnMoments } from '../../lib/stats/michaelis-menten-on-counts.js';
import { saturatingMoments, stationSums } from '../../lib/stats/saturating-moments.js';

/** 30 stations of 8 cells with dFe spread ±30 % around a station value, saturating Fe:C with deterministic scatter. */
function stations(scale: 'log10' | 'linear') {
  const x: number[] = [];
  const y: number[] = [];
  const group: number[] = [];
  for (let s = 0; s < 30; s++) {
    const base = 0.05 * 40 ** ((s * 0.618) % 1);
    for (let c = 0; c < 8; c++) {
      const v = base * (1 + 0.3 * Math.sin(5 * s + 7 * c));
      x.push(v);
      y.push(((12 * v) / (0.4 + v)) * (1 + 0.05 * Math.cos(3 * s + 11 * c)));
      group.push(s);
    }
  }
  const index = groupRows(Int32Array.from(group));
  const pick = (v: number[]) => Float64Array.from(index.rows, (i) => v[i]);
  const obs = scale === 'log10' ? x.map((v, i) => Math.log10(y[i]) - Math.log10(v)) : y;
  const w = x.map((_, i) => 1 + 0.1 * (i % 3));
  return { start: index.start, x: pick(x), obs: pick(obs), w: pick(w), scale };
}

/** The sums of `stationSums` straight from the rows. */
function direct(d: ReturnType<typeof stations>, j: number, q: number, k: number): number[] {
  const t = [0, 0, 0, 0, 0];
  for (let i = d.start[j]; i < d.start[j + 1]; i++) {
    const h = 1 / (k + d.x[i]);
    if (d.scale === 'log10') {
      const e = d.obs[i] - Math.log10(q) + Math.log10(k + d.x[i]);
      [1, h, h * h, e, h * e].forEach((v, s) => (t[s] += d.w[i] * v));
    } else {
      const a = d.w[i] * d.x[i] * d.x[i];
      const b = d.w[i] * d.x[i] * d.obs[i];
      [a * h * h, a * h ** 3, a * h ** 4, b * h, b * h * h].forEach((v, s) => (t[s] += v));
    }
  }
  return t;
}

describe('saturatingMoments', () => {
  for (const scale of ['log10', 'linear'] as const) {
    it(`stationSums(moments, j, q, k) on the ${scale} scale equals the row sums for k near k0, and declines far from it`, () => {
      const d = stations(scale);
      const k0 = 0.4;
      const s = saturatingMoments(d, k0);
      const out = new Float64Array(5);
      for (const k of [0.4, 0.41, 0.38, 0.45]) {
        for (let j = 0; j < 30; j++) {
          if (!stationSums(s, j, scale === 'log10', 11, k, out)) continue;
          const t = direct(d, j, 11, k);
          for (let c = 0; c < 5; c++) expect(Math.abs(out[c] - t[c])).toBeLessThan(1e-12 * (Math.abs(t[c]) + Math.abs(t[0])));
        }
      }
      expect(stationSums(s, 0, scale === 'log10', 11, 40, out)).toBe(false);
    });

    it(`michaelisMentenOnMoments on the ${scale} scale gives the row-summed Gauss–Newton fit to 1e-10`, () => {
      const d = stations(scale);
      const counts = Int32Array.from({ length: 30 }, (_, j) => [1, 0, 2, 1, 3, 0, 1][j % 7]);
      const start = { qmax: 12.5, k: 0.42 };
      const series = michaelisMentenOnMoments(d, saturatingMoments(d, start.k), counts, start);
      // Moments about a k far from every iterate: every station is summed from its rows.
      const rows = michaelisMentenOnMoments(d, saturatingMoments(d, 1e6), counts, start);
      expect(Number.isFinite(series.qmax)).toBe(true);
      expect(Math.abs(series.qmax / rows.qmax - 1)).toBeLessThan(1e-10);
      expect(Math.abs(series.k / rows.k - 1)).toBeLessThan(1e-10);
      expect(series.steps).toBe(rows.steps);
    });
  }
});
