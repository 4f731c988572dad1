import {
  bootstrapGroupCounts,
  groupLineSums,
  groupRows,
  lineOnCounts,
  michaelisMentenOnMoments,
  saturatingMoments,
  yorkBlocks,
  yorkOnBlocks,
  type GroupRows,
  type Interval,
  type MichaelisMentenFit,
} from '../stats/index.js';
import type { ClassData } from './class-data.js';
import type { PowerLawCore } from './power-law-core.js';
import type { ModelName, ResolvedFitOptions } from './types.js';

/** Per-cell inputs of the fitters that the bootstrap reuses. */
export interface BootstrapInputs {
  /** OLS (and log10 saturating) weights 1/σ²(log10 Fe:C); undefined when unweighted. */
  weights: Float64Array | undefined;
  /** σ(log10 dFe) per cell. */
  sigmaLx: Float64Array;
  /** σ(log10 Fe:C) per cell with missing values imputed; null when none is known. */
  sigmaLy: Float64Array | null;
}

/**
 * Station bootstrap of every fitted model of one class from one draw of station counts, so all models see the same
 * resampled stations (Davison & Hinkley 1997, §3.8). OLS and SMA come from per-station sums in O(stations) per
 * replicate; York and the saturating fit iterate over the cells of the drawn stations, warm-started from the
 * whole-data fit. Returns two intervals and failure counts per model: (exponent, log10 coefficient) or (qmax, k).
 */
export function bootstrapClass(
  d: ClassData,
  p: BootstrapInputs,
  fitted: readonly ModelName[],
  cores: ReadonlyMap<ModelName, PowerLawCore | MichaelisMentenFit>,
  o: ResolvedFitOptions,
): { intervals: Interval[]; failed: number[] } {
  const index = groupRows(d.group);
  // Cells in station order, so a drawn station's cells are one contiguous run.
  const byStation = (v: ArrayLike<number>): Float64Array => Float64Array.from(index.rows, (i) => v[i]);
  const kernels: ((counts: Int32Array, out: Float64Array, at: number) => void)[] = [];
  for (const m of fitted) {
    const core = cores.get(m) as PowerLawCore | MichaelisMentenFit;
    if (m === 'ols' || m === 'sma') {
      const sums = groupLineSums(d.lx, d.ly, m === 'ols' ? p.weights : undefined, index);
      kernels.push((counts, out, at) => {
        const f = lineOnCounts(sums, counts, m);
        out[at] = f.slope;
        out[at + 1] = f.intercept;
      });
    } else if (m === 'york') {
      const sx = p.sigmaLx;
      const sy = p.sigmaLy as Float64Array;
      const data = yorkBlocks({
        start: index.start,
        x: byStation(d.lx),
        y: byStation(d.ly),
        vx: Float64Array.from(index.rows, (i) => sx[i] * sx[i]),
        vy: Float64Array.from(index.rows, (i) => sy[i] * sy[i]),
      });
      const startSlope = (core as PowerLawCore).b;
      kernels.push((counts, out, at) => {
        const f = yorkOnBlocks(data, counts, { startSlope });
        out[at] = f.slope;
        out[at + 1] = f.intercept;
      });
    } else {
      const mm = core as MichaelisMentenFit;
      const log = o.saturatingScale === 'log10';
      const sy = p.sigmaLy;
      const w = Float64Array.from(d.dFe, (_, i) =>
        p.weights === undefined || sy === null ? 1 : log ? p.weights[i] : 1 / (sy[i] * d.feC[i] * Math.LN10) ** 2,
      );
      const obs = Float64Array.from(d.ly, (v, i) => (log ? v - d.lx[i] : d.feC[i]));
      const data = { ...mergeEqualX(index, d.dFe, obs, w), scale: o.saturatingScale };
      const moments = saturatingMoments(data, mm.k);
      kernels.push((counts, out, at) => {
        const f = michaelisMentenOnMoments(data, moments, counts, { qmax: mm.qmax, k: mm.k });
        out[at] = f.qmax;
        out[at + 1] = f.k;
      });
    }
  }
  const out = new Float64Array(2 * kernels.length);
  const boot = bootstrapGroupCounts(
    index,
    (counts) => {
      for (let j = 0; j < kernels.length; j++) kernels[j](counts, out, 2 * j);
      return out;
    },
    { replicates: o.bootstrap.n, seed: o.bootstrap.seed, level: o.level },
  );
  return { intervals: boot.intervals, failed: boot.failed };
}

/**
 * Cells of one station with equal dFe merged into one row of weight Σw and observation Σw·obs/Σw. The Gauss–Newton
 * sums are linear in w and w·obs at a given x, so the merged rows give the same step as the cells (cells matched to the
 * same bottle share their dFe, so this shrinks the per-replicate work to one row per bottle).
 */
function mergeEqualX(index: GroupRows, x: Float64Array, obs: Float64Array, w: Float64Array): { start: Int32Array; x: Float64Array; obs: Float64Array; w: Float64Array } {
  const n = index.rows.length;
  const start = new Int32Array(index.groups + 1);
  const mx = new Float64Array(n);
  const mo = new Float64Array(n);
  const mw = new Float64Array(n);
  let m = 0;
  for (let j = 0; j < index.groups; j++) {
    const cells = Array.from(index.rows.subarray(index.start[j], index.start[j + 1])).sort((a, b) => x[a] - x[b] || a - b);
    for (let t = 0; t < cells.length; t++) {
      const i = cells[t];
      if (t > 0 && x[i] === mx[m - 1]) {
        mo[m - 1] += w[i] * obs[i];
        mw[m - 1] += w[i];
      } else {
        mx[m] = x[i];
        mo[m] = w[i] * obs[i];
        mw[m] = w[i];
        m++;
      }
    }
    start[j + 1] = m;
  }
  for (let r = 0; r < m; r++) mo[r] /= mw[r];
  return { start, x: mx.slice(0, m), obs: mo.slice(0, m), w: mw.slice(0, m) };
}
