import { fQuantile, tQuantile } from './distributions.js';
import type { Interval } from './interval.js';
import { badLevel, lengthMismatch, tooFewPoints } from './messages.js';

/** Options of `sma`. */
export interface SmaOptions {
  /** Confidence level of the intervals; default 0.95. */
  level?: number;
}

/** A standardised major axis line y = intercept + slope·x with its inference. */
export interface SmaFit {
  /** Number of points. */
  n: number;
  /** Degrees of freedom of the intervals, n − 2. */
  df: number;
  /** Confidence level. */
  level: number;
  /** Pearson correlation of x and y. */
  r: number;
  /** Fitted intercept (units of y). */
  intercept: number;
  /** Fitted slope sign(r)·s_y/s_x. */
  slope: number;
  /** Asymptotic standard error of the slope, |b|·√((1 − r²)/(n − 2)). */
  slopeSE: number;
  /** Standard error of the intercept, √(σ²_res/n + x̄²·SE²_slope). */
  interceptSE: number;
  /** Exact slope interval b·(√(B+1) ∓ √B). */
  slopeCI: Interval;
  /** t interval of the intercept on n − 2 df. */
  interceptCI: Interval;
  /** Covariance of (intercept, slope), −x̄·SE²_slope. */
  covInterceptSlope: number;
  /** Σ(y − a − b·x)²/(n − 2): vertical residual variance about the axis. */
  residualVariance: number;
  /** Mean of x. */
  meanX: number;
}

/** Standardised major axis (model II) regression (Warton et al. 2006, Biol. Rev. 81:259, Table 4 and eq. for the slope interval). */
export function sma(x: ArrayLike<number>, y: ArrayLike<number>, options: SmaOptions = {}): SmaFit {
  const n = x.length;
  if (y.length !== n) throw new RangeError(lengthMismatch('x', n, 'y', y.length));
  if (n < 3) throw new RangeError(tooFewPoints('sma', 3, n));
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i];
    sy += y[i];
  }
  const mx = sx / n;
  const my = sy / n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxx += dx * dx;
    syy += dy * dy;
    sxy += dx * dy;
  }
  const r = sxy / Math.sqrt(sxx * syy);
  // A zero correlation leaves the sign undefined; Warton et al. take it positive.
  const slope = (r < 0 ? -1 : 1) * Math.sqrt(syy / sxx);
  const intercept = my - slope * mx;
  const df = n - 2;
  const r2 = r * r;
  const B = ((1 - r2) * fQuantile(level, 1, df)) / df;
  const sqB = Math.sqrt(B);
  const sqB1 = Math.sqrt(B + 1);
  const ends = [slope * (sqB1 - sqB), slope * (sqB1 + sqB)];
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const e = y[i] - intercept - slope * x[i];
    rss += e * e;
  }
  const residualVariance = rss / df;
  const varSlope = (slope * slope * (1 - r2)) / df;
  const varIntercept = residualVariance / n + mx * mx * varSlope;
  const interceptSE = Math.sqrt(varIntercept);
  const t = tQuantile(1 - (1 - level) / 2, df);
  return {
    n,
    df,
    level,
    r,
    intercept,
    slope,
    slopeSE: Math.sqrt(varSlope),
    interceptSE,
    slopeCI: { lower: Math.min(ends[0], ends[1]), upper: Math.max(ends[0], ends[1]) },
    interceptCI: { lower: intercept - t * interceptSE, upper: intercept + t * interceptSE },
    covInterceptSlope: -mx * varSlope,
    residualVariance,
    meanX: mx,
  };
}
