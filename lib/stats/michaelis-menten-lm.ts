/** Levenberg–Marquardt iterations of y = qmax·x/(k + x) on typed arrays, before Gauss–Newton polishing. */
export interface MichaelisMentenLmResult {
  /** qmax after the iterations. */
  qmax: number;
  /** k after the iterations. */
  k: number;
  /** Iterations used. */
  iterations: number;
}

/**
 * Levenberg–Marquardt for the two-parameter saturating curve with Marquardt's diagonal scaling (Marquardt 1963,
 * J. SIAM 11:431; Nocedal & Wright 2006, §10.3): solve (JᵀWJ + λ·diag JᵀWJ)δ = JᵀWe, accept δ when the weighted RSS
 * falls (λ/10), else λ·10. Parameters are kept ≥ Number.MIN_VALUE so the log10 model stays defined. Stops when the
 * step is below 1e-12 relative, λ overflows, or after maxIterations; the caller polishes and judges convergence.
 */
export function michaelisMentenLm(
  x: ArrayLike<number>,
  obs: Float64Array,
  wt: Float64Array,
  scale: 'linear' | 'log10',
  qmax: number,
  k: number,
  maxIterations: number,
): MichaelisMentenLmResult {
  const n = x.length;
  const log = scale === 'log10';
  const rssAt = (q: number, kk: number): number => {
    let s = 0;
    for (let i = 0; i < n; i++) {
      const f = log ? Math.log10((q * x[i]) / (kk + x[i])) : (q * x[i]) / (kk + x[i]);
      const e = obs[i] - f;
      s += wt[i] * e * e;
    }
    return s;
  };
  let q = qmax;
  let kk = k;
  let rss = rssAt(q, kk);
  let lambda = 1e-3;
  let it = 0;
  for (; it < maxIterations && Number.isFinite(rss); it++) {
    let a11 = 0;
    let a12 = 0;
    let a22 = 0;
    let g1 = 0;
    let g2 = 0;
    for (let i = 0; i < n; i++) {
      const h = 1 / (kk + x[i]);
      let j0: number;
      let j1: number;
      let f: number;
      if (log) {
        j0 = 1 / (q * Math.LN10);
        j1 = -h / Math.LN10;
        f = Math.log10(q * x[i] * h);
      } else {
        j0 = x[i] * h;
        j1 = -q * x[i] * h * h;
        f = q * x[i] * h;
      }
      const e = obs[i] - f;
      const w = wt[i];
      a11 += w * j0 * j0;
      a12 += w * j0 * j1;
      a22 += w * j1 * j1;
      g1 += w * j0 * e;
      g2 += w * j1 * e;
    }
    let moved = false;
    while (lambda < 1e16) {
      const b11 = a11 * (1 + lambda);
      const b22 = a22 * (1 + lambda);
      const det = b11 * b22 - a12 * a12;
      const d1 = (b22 * g1 - a12 * g2) / det;
      const d2 = (b11 * g2 - a12 * g1) / det;
      const qn = Math.max(q + d1, Number.MIN_VALUE);
      const kn = Math.max(kk + d2, Number.MIN_VALUE);
      const rn = rssAt(qn, kn);
      if (Number.isFinite(d1) && Number.isFinite(d2) && rn < rss) {
        moved = Math.abs(qn - q) > 1e-12 * q || Math.abs(kn - kk) > 1e-12 * kk;
        q = qn;
        kk = kn;
        rss = rn;
        lambda = Math.max(lambda / 10, 1e-12);
        break;
      }
      lambda *= 10;
    }
    if (!moved) break;
  }
  return { qmax: q, k: kk, iterations: it };
}
