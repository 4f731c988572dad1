import { lengthMismatch, tooFewPoints } from './messages.js';

/** Options of `york`. */
export interface YorkOptions {
  /** Stop when the relative change of the slope falls below this; default 1e-15. */
  tolerance?: number;
  /** Iteration limit; default 100. */
  maxIterations?: number;
}

/** A straight line fitted with errors in both variables. */
export interface YorkFit {
  /** Number of points. */
  n: number;
  /** Degrees of freedom of S, n − 2. */
  df: number;
  /** Fitted intercept (units of y). */
  intercept: number;
  /** Fitted slope. */
  slope: number;
  /** σ of the intercept as York et al. (2004) define it (from the stated errors alone). */
  interceptSE: number;
  /** σ of the slope as York et al. (2004) define it. */
  slopeSE: number;
  /** σ of the intercept scaled by √MSWD (absorbs scatter beyond the stated errors). */
  interceptSEScaled: number;
  /** σ of the slope scaled by √MSWD. */
  slopeSEScaled: number;
  /** Covariance of (intercept, slope), −x̄·σ²_slope (York et al. 2004, unscaled). */
  covInterceptSlope: number;
  /** Weighted sum of squared residuals S. */
  s: number;
  /** Mean square weighted deviation S/(n − 2). */
  mswd: number;
  /** Weighted mean of the adjusted x values, x̄. */
  meanX: number;
  /** Iterations used. */
  iterations: number;
  /** Whether the slope met the tolerance before the limit. */
  converged: boolean;
}

/** Best straight line with (correlated) errors σx, σy in both variables (York et al. 2004, Am. J. Phys. 72:367, Section III steps 1–8, eqs. 13–15). */
export function york(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  sx: ArrayLike<number>,
  sy: ArrayLike<number>,
  r: number | ArrayLike<number> = 0,
  options: YorkOptions = {},
): YorkFit {
  const n = x.length;
  if (y.length !== n) throw new RangeError(lengthMismatch('x', n, 'y', y.length));
  if (sx.length !== n) throw new RangeError(lengthMismatch('x', n, 'sx', sx.length));
  if (sy.length !== n) throw new RangeError(lengthMismatch('x', n, 'sy', sy.length));
  if (typeof r !== 'number' && r.length !== n) throw new RangeError(lengthMismatch('x', n, 'r', r.length));
  if (n < 3) throw new RangeError(tooFewPoints('york', 3, n));
  const tol = options.tolerance ?? 1e-15;
  const maxIt = options.maxIterations ?? 100;
  const wx = new Float64Array(n);
  const wy = new Float64Array(n);
  const alpha = new Float64Array(n);
  const ri = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    wx[i] = 1 / (sx[i] * sx[i]);
    wy[i] = 1 / (sy[i] * sy[i]);
    alpha[i] = Math.sqrt(wx[i] * wy[i]);
    ri[i] = typeof r === 'number' ? r : r[i];
  }
  // Step 1: start from the ordinary least-squares slope.
  let mx0 = 0;
  let my0 = 0;
  for (let i = 0; i < n; i++) {
    mx0 += x[i];
    my0 += y[i];
  }
  mx0 /= n;
  my0 /= n;
  let num = 0;
  let den = 0;
  for (let i = 0; i < n; i++) {
    num += (x[i] - mx0) * (y[i] - my0);
    den += (x[i] - mx0) * (x[i] - mx0);
  }
  let b = num / den;
  const W = new Float64Array(n);
  const beta = new Float64Array(n);
  let X = 0;
  let Y = 0;
  let sumW = 0;
  let iterations = 0;
  let converged = false;
  const weigh = (slope: number): void => {
    sumW = 0;
    X = 0;
    Y = 0;
    for (let i = 0; i < n; i++) {
      W[i] = (wx[i] * wy[i]) / (wx[i] + slope * slope * wy[i] - 2 * slope * ri[i] * alpha[i]);
      sumW += W[i];
      X += W[i] * x[i];
      Y += W[i] * y[i];
    }
    X /= sumW;
    Y /= sumW;
    for (let i = 0; i < n; i++) {
      const U = x[i] - X;
      const V = y[i] - Y;
      beta[i] = W[i] * (U / wy[i] + (slope * V) / wx[i] - ((slope * U + V) * ri[i]) / alpha[i]);
    }
  };
  while (iterations < maxIt) {
    iterations++;
    weigh(b);
    let sn = 0;
    let sd = 0;
    for (let i = 0; i < n; i++) {
      sn += W[i] * beta[i] * (y[i] - Y);
      sd += W[i] * beta[i] * (x[i] - X);
    }
    const bNew = sn / sd;
    const change = Math.abs(bNew - b);
    b = bNew;
    if (change <= tol * Math.abs(b) || change === 0) {
      converged = true;
      break;
    }
  }
  // Steps 6–8 use W, X̄, β at the final slope.
  weigh(b);
  const a = Y - b * X;
  let xbar = 0;
  for (let i = 0; i < n; i++) xbar += W[i] * (X + beta[i]);
  xbar /= sumW;
  let swu2 = 0;
  let s = 0;
  for (let i = 0; i < n; i++) {
    const u = X + beta[i] - xbar;
    swu2 += W[i] * u * u;
    const e = y[i] - b * x[i] - a;
    s += W[i] * e * e;
  }
  const varB = 1 / swu2;
  const varA = 1 / sumW + xbar * xbar * varB;
  const df = n - 2;
  const mswd = s / df;
  const root = Math.sqrt(mswd);
  return {
    n,
    df,
    intercept: a,
    slope: b,
    interceptSE: Math.sqrt(varA),
    slopeSE: Math.sqrt(varB),
    interceptSEScaled: Math.sqrt(varA) * root,
    slopeSEScaled: Math.sqrt(varB) * root,
    covInterceptSlope: -xbar * varB,
    s,
    mswd,
    meanX: xbar,
    iterations,
    converged,
  };
}
