import { saturatingMoments, stationSums, type SaturatingMoments } from './saturating-moments.js';

/** Cells stored group by group: the rows of group j are start[j]..start[j+1] of every array. */
export interface SaturatingGroupedData {
  /** Row offsets per group id (length groups + 1). */
  start: Int32Array;
  /** x per row (> 0). */
  x: Float64Array;
  /** Observation per row on the fitted scale: y, or log10 y − log10 x on the log10 scale. */
  obs: Float64Array;
  /** Weight per row on the fitted scale. */
  w: Float64Array;
  /** Scale the residuals are taken on. */
  scale: 'linear' | 'log10';
}

/** Options of `michaelisMentenOnCounts`. */
export interface MichaelisMentenOnCountsOptions {
  /** qmax to start from (the whole-data optimum). */
  qmax: number;
  /** k to start from. */
  k: number;
  /** Stop when both parameters change by less than this relative amount; default 1e-8. */
  tolerance?: number;
  /** Gauss–Newton step limit; default 30. */
  maxSteps?: number;
}

/**
 * Saturating fit y = qmax·x/(k + x) of a group resample, each row weighted by its group's draw count, by undamped
 * Gauss–Newton steps from a warm start (Bates & Watts 1988, Nonlinear Regression Analysis, §2.2.1); NaN parameters when
 * the steps do not settle, leave qmax, k > 0, or the normal matrix is singular. On the log10 scale the residual is
 * (log10 y − log10 x) − log10 qmax + log10(k + x), whose qmax derivative is the same for every row. Builds the
 * per-group moments about the start k on each call: a bootstrap builds them once and calls `michaelisMentenOnMoments`.
 */
export function michaelisMentenOnCounts(
  d: SaturatingGroupedData,
  counts: Int32Array,
  o: MichaelisMentenOnCountsOptions,
): { qmax: number; k: number; steps: number } {
  return michaelisMentenOnMoments(d, saturatingMoments(d, o.k), counts, o);
}

/**
 * `michaelisMentenOnCounts` with prebuilt per-group moments: each group's sums come from its power series in k₀ − k
 * (`stationSums`) while k stays within a fifth of k₀ + min x of the moments' k₀, and from its rows otherwise.
 */
export function michaelisMentenOnMoments(
  d: SaturatingGroupedData,
  s: SaturatingMoments,
  counts: Int32Array,
  o: MichaelisMentenOnCountsOptions,
): { qmax: number; k: number; steps: number } {
  const tol = o.tolerance ?? 1e-8;
  const maxSteps = o.maxSteps ?? 30;
  const log = d.scale === 'log10';
  const g = new Float64Array(5);
  let q = o.qmax;
  let k = o.k;
  for (let step = 1; step <= maxSteps; step++) {
    // log10: Σw, Σw·h, Σw·h², Σw·e, Σw·h·e; linear: Σw x²h², Σw x²h³, Σw x²h⁴, Σw x·obs·h, Σw x·obs·h².
    let t0 = 0;
    let t1 = 0;
    let t2 = 0;
    let t3 = 0;
    let t4 = 0;
    for (let j = 0; j < counts.length; j++) {
      const c = counts[j];
      if (c === 0) continue;
      if (!stationSums(s, j, log, q, k, g)) rowSums(d, j, log, q, k, g);
      t0 += c * g[0];
      t1 += c * g[1];
      t2 += c * g[2];
      t3 += c * g[3];
      t4 += c * g[4];
    }
    let a11: number;
    let a12: number;
    let a22: number;
    let g1: number;
    let g2: number;
    if (log) {
      // J = (1/(q ln10), −1/((k + x) ln10)).
      const j0 = 1 / (q * Math.LN10);
      const j1 = -1 / Math.LN10;
      a11 = t0 * j0 * j0;
      a12 = t1 * j0 * j1;
      a22 = t2 * j1 * j1;
      g1 = t3 * j0;
      g2 = t4 * j1;
    } else {
      // J = (x·h, −q·x·h²), e = obs − q·x·h.
      a11 = t0;
      a12 = -q * t1;
      a22 = q * q * t2;
      g1 = t3 - q * t0;
      g2 = -q * (t4 - q * t1);
    }
    const det = a11 * a22 - a12 * a12;
    if (!(det > 1e-14 * a11 * a22)) break;
    const dq = (a22 * g1 - a12 * g2) / det;
    const dk = (a11 * g2 - a12 * g1) / det;
    q += dq;
    k += dk;
    if (!(q > 0 && k > 0 && Number.isFinite(q) && Number.isFinite(k))) break;
    if (Math.abs(dq) <= tol * q && Math.abs(dk) <= tol * k) return { qmax: q, k, steps: step };
  }
  return { qmax: NaN, k: NaN, steps: maxSteps };
}

/** Group j's sums of `stationSums` from its rows (h = 1/(k + x)). */
function rowSums(d: SaturatingGroupedData, j: number, log: boolean, q: number, k: number, out: Float64Array): void {
  const { start, x, obs, w } = d;
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  if (log) {
    const lq = Math.log10(q);
    for (let i = start[j]; i < start[j + 1]; i++) {
      const kx = k + x[i];
      const h = 1 / kx;
      const wi = w[i];
      const e = obs[i] - lq + Math.log10(kx);
      s0 += wi;
      s1 += wi * h;
      s2 += wi * h * h;
      s3 += wi * e;
      s4 += wi * h * e;
    }
  } else {
    for (let i = start[j]; i < start[j + 1]; i++) {
      const h = 1 / (k + x[i]);
      const a = w[i] * x[i] * x[i] * h * h;
      const b = w[i] * x[i] * obs[i] * h;
      s0 += a;
      s1 += a * h;
      s2 += a * h * h;
      s3 += b;
      s4 += b * h;
    }
  }
  out[0] = s0;
  out[1] = s1;
  out[2] = s2;
  out[3] = s3;
  out[4] = s4;
}
