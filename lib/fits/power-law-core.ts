import { ols, sma, york } from '../stats/index.js';

/** A power-law line in log10 space with what the stage reports and the bands need. */
export interface PowerLawCore {
  /** log10 coefficient a. */
  a: number;
  /** Exponent b. */
  b: number;
  /** SE of a (York: scaled by √MSWD). */
  seA: number;
  /** SE of b (York: scaled by √MSWD). */
  seB: number;
  /** Covariance of (a, b), on the same footing as the SEs. */
  cov: number;
  /** Σ(ly − a − b·lx)²/(n − 2), unweighted. */
  residualVariance: number;
  /** Unweighted Σ(ly − a − b·lx)². */
  rss: number;
  /** York MSWD, else null. */
  mswd: number | null;
  /** York unscaled SEs, else null. */
  yorkSE: { a: number; b: number } | null;
  /** Whether an iterative fit converged (always true for closed forms). */
  converged: boolean;
}

/** Fits one power-law model to log10 data: OLS (optionally weighted), SMA (Warton et al. 2006) or York (York et al. 2004) with scaled errors. */
export function powerLawCore(
  model: 'ols' | 'sma' | 'york',
  lx: ArrayLike<number>,
  ly: ArrayLike<number>,
  extra: { weights?: ArrayLike<number>; sigmaLx?: ArrayLike<number>; sigmaLy?: ArrayLike<number>; level: number },
): PowerLawCore {
  let core: Omit<PowerLawCore, 'residualVariance' | 'rss'>;
  if (model === 'ols') {
    const f = ols(lx, ly, { weights: extra.weights, level: extra.level });
    core = { a: f.intercept, b: f.slope, seA: f.interceptSE, seB: f.slopeSE, cov: f.covInterceptSlope, mswd: null, yorkSE: null, converged: true };
  } else if (model === 'sma') {
    const f = sma(lx, ly, { level: extra.level });
    core = { a: f.intercept, b: f.slope, seA: f.interceptSE, seB: f.slopeSE, cov: f.covInterceptSlope, mswd: null, yorkSE: null, converged: true };
  } else {
    const f = york(lx, ly, extra.sigmaLx as ArrayLike<number>, extra.sigmaLy as ArrayLike<number>);
    core = {
      a: f.intercept,
      b: f.slope,
      seA: f.interceptSEScaled,
      seB: f.slopeSEScaled,
      cov: f.covInterceptSlope * f.mswd,
      mswd: f.mswd,
      yorkSE: { a: f.interceptSE, b: f.slopeSE },
      converged: f.converged,
    };
  }
  let rss = 0;
  for (let i = 0; i < lx.length; i++) {
    const e = ly[i] - core.a - core.b * lx[i];
    rss += e * e;
  }
  return { ...core, residualVariance: rss / (lx.length - 2), rss };
}
