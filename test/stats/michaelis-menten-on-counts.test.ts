import { describe, expect, it } from 'vitest';
import { michaelisMenten } from '../../lib/stats/michaelis-menten.js';
import { michaelisMentenOnCounts } from '../../lib/stats/michaelis-menten-on-counts.js';
import { smallResample } from './on-counts.js';

describe('michaelisMentenOnCounts', () => {
  const { x, y, index, counts, rows } = smallResample();
  const pick = (v: number[]) => Float64Array.from(index.rows, (i) => v[i]);
  for (const scale of ['log10', 'linear'] as const) {
    it(`michaelisMentenOnCounts(data, counts) on the ${scale} scale equals michaelisMenten refitted on the resampled rows`, () => {
      const full = michaelisMenten(x, y, { scale });
      if (!full.converged) throw new Error(full.reason);
      const obs = scale === 'log10' ? x.map((v, i) => Math.log10(y[i]) - Math.log10(v)) : y;
      const data = { start: index.start, x: pick(x), obs: pick(obs), w: pick(x.map(() => 1)), scale };
      const f = michaelisMentenOnCounts(data, counts, { qmax: full.qmax, k: full.k });
      const g = michaelisMenten(rows.map((i) => x[i]), rows.map((i) => y[i]), { scale });
      if (!g.converged) throw new Error(g.reason);
      expect(f.qmax / g.qmax).toBeCloseTo(1, 7);
      expect(f.k / g.k).toBeCloseTo(1, 7);
    });
  }

  it('michaelisMentenOnCounts marks a replicate that does not settle as failed (NaN)', () => {
    const data = { start: Int32Array.from([0, 6]), x: Float64Array.from([1, 2, 3, 4, 5, 6]), obs: Float64Array.from([10, 8, 6, 5, 3, 1]), w: new Float64Array(6).fill(1), scale: 'linear' as const };
    const f = michaelisMentenOnCounts(data, Int32Array.from([1]), { qmax: 5, k: 1 });
    expect(Number.isNaN(f.qmax)).toBe(true);
  });
});
