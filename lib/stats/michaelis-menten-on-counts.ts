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
 * (log10 y − log10 x) − log10 qmax + log10(k + x), whose qmax derivative is the same for every row.
 */
export function michaelisMentenOnCounts(
  d: SaturatingGroupedData,
  counts: Int32Array,
  o: MichaelisMentenOnCountsOptions,
): { qmax: number; k: number; steps: number } {
  const tol = o.tolerance ?? 1e-8;
  const maxSteps = o.maxSteps ?? 30;
  const { start, x, obs, w } = d;
  const log = d.scale === 'log10';
  let q = o.qmax;
  let k = o.k;
  for (let step = 1; step <= maxSteps; step++) {
    // a11, a12, a22: JᵀWJ; g1, g2: JᵀWe.
    let a11 = 0;
    let a12 = 0;
    let a22 = 0;
    let g1 = 0;
    let g2 = 0;
    if (log) {
      const lq = Math.log10(q);
      // J = (1/(q ln10), −1/((k + x) ln10)); sums of w, w·h, w·h², w·e, w·h·e with h = 1/(k + x).
      let sw = 0;
      let sh = 0;
      let shh = 0;
      let se = 0;
      let she = 0;
      for (let j = 0; j < counts.length; j++) {
        const c = counts[j];
        if (c === 0) continue;
        let gw = 0;
        let gh = 0;
        let ghh = 0;
        let ge = 0;
        let ghe = 0;
        for (let i = start[j]; i < start[j + 1]; i++) {
          const kx = k + x[i];
          const h = 1 / kx;
          const wi = w[i];
          const e = obs[i] - lq + Math.log10(kx);
          gw += wi;
          gh += wi * h;
          ghh += wi * h * h;
          ge += wi * e;
          ghe += wi * h * e;
        }
        sw += c * gw;
        sh += c * gh;
        shh += c * ghh;
        se += c * ge;
        she += c * ghe;
      }
      const j0 = 1 / (q * Math.LN10);
      const j1 = -1 / Math.LN10;
      a11 = sw * j0 * j0;
      a12 = sh * j0 * j1;
      a22 = shh * j1 * j1;
      g1 = se * j0;
      g2 = she * j1;
    } else {
      for (let j = 0; j < counts.length; j++) {
        const c = counts[j];
        if (c === 0) continue;
        let b11 = 0;
        let b12 = 0;
        let b22 = 0;
        let h1 = 0;
        let h2 = 0;
        for (let i = start[j]; i < start[j + 1]; i++) {
          const h = 1 / (k + x[i]);
          const u = x[i] * h;
          const d1 = u;
          const d2 = -q * u * h;
          const e = obs[i] - q * u;
          const wi = w[i];
          b11 += wi * d1 * d1;
          b12 += wi * d1 * d2;
          b22 += wi * d2 * d2;
          h1 += wi * d1 * e;
          h2 += wi * d2 * e;
        }
        a11 += c * b11;
        a12 += c * b12;
        a22 += c * b22;
        g1 += c * h1;
        g2 += c * h2;
      }
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
