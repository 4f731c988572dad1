import { randomLcg, randomNormal } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { bootstrapByGroup } from '../../lib/stats/bootstrap-by-group.js';
import { ols } from '../../lib/stats/ols.js';
import { olsOnIndices } from '../../lib/stats/ols-on-indices.js';

// Seeded coverage simulation: log10 y = log10 A + b·log10 x + ε, ε ~ N(0, 0.15), i.e. a power law with log-normal
// scatter. 2000 simulated data sets keep the Monte-Carlo standard error of a 95 % coverage near 0.5 %, so the
// 93–97 % window is about ±4 standard errors wide (common practice for calibration checks).
const SIMULATIONS = 2000;
const BOOTSTRAP = 199;
const GROUPS = 200;
const PER_GROUP = 1;
const TRUE_SLOPE = 0.6;
// The percentile bootstrap undercovers with few groups (its spread is too narrow by about √((G−1)/G) and it uses
// normal rather than t tails; Davison & Hinkley 1997, §5.3): this simulation with 30 cells in 15 groups gave 90.9 %. 200 groups
// (one cell each) gave 94.4 %, so the window tests calibration, not small-G bias.

describe('coverage of slope intervals', () => {
  it('ols 95 % slope interval and the station bootstrap percentile interval each cover the true exponent 93–97 % of the time', () => {
    const rng = randomLcg(20240611);
    const normal = randomNormal.source(rng)(0, 0.15);
    const n = GROUPS * PER_GROUP;
    const lx = new Float64Array(n);
    const ly = new Float64Array(n);
    const group = Int32Array.from({ length: n }, (_, i) => Math.floor(i / PER_GROUP));
    const stat = (idx: Int32Array, len: number) => [olsOnIndices(lx, ly, idx, len).slope];
    let olsHits = 0;
    let bootHits = 0;
    for (let s = 0; s < SIMULATIONS; s++) {
      for (let i = 0; i < n; i++) {
        // dFe spread over 0.05–2 nmol/kg, log-uniform
        lx[i] = Math.log10(0.05) + rng() * Math.log10(40);
        ly[i] = 1 + TRUE_SLOPE * lx[i] + normal();
      }
      const f = ols(lx, ly);
      if (f.slopeCI.lower <= TRUE_SLOPE && TRUE_SLOPE <= f.slopeCI.upper) olsHits++;
      const b = bootstrapByGroup(group, stat, { replicates: BOOTSTRAP, seed: s + 1 });
      if (b.intervals[0].lower <= TRUE_SLOPE && TRUE_SLOPE <= b.intervals[0].upper) bootHits++;
    }
    const olsCoverage = olsHits / SIMULATIONS;
    const bootCoverage = bootHits / SIMULATIONS;
    expect(olsCoverage).toBeGreaterThanOrEqual(0.93);
    expect(olsCoverage).toBeLessThanOrEqual(0.97);
    expect(bootCoverage).toBeGreaterThanOrEqual(0.93);
    expect(bootCoverage).toBeLessThanOrEqual(0.97);
  });
});
