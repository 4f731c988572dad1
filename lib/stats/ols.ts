import { tQuantile, tTwoSidedP } from './distributions.js';
import type { Interval } from './interval.js';
import { badLevel, lengthMismatch, tooFewPoints } from './messages.js';

/** Options of `ols`. */
export interface OlsOptions {
  /** Per-point weights (w = 1/σ² up to a common factor); default: all 1. */
  weights?: ArrayLike<number>;
  /** Confidence level of the intervals; default 0.95. */
  level?: number;
}

/** A straight-line least-squares fit y = intercept + slope·x, with its inference. */
export interface OlsFit {
  /** Number of points. */
  n: number;
  /** Residual degrees of freedom, n − 2. */
  df: number;
  /** Confidence level of the intervals. */
  level: number;
  /** Whether weights were used. */
  weighted: boolean;
  /** Fitted intercept (units of y). */
  intercept: number;
  /** Fitted slope (units of y per unit of x). */
  slope: number;
  /** Standard error of the intercept. */
  interceptSE: number;
  /** Standard error of the slope. */
  slopeSE: number;
  /** Student-t interval of the intercept at `level`. */
  interceptCI: Interval;
  /** Student-t interval of the slope at `level`. */
  slopeCI: Interval;
  /** Covariance of (intercept, slope). */
  covInterceptSlope: number;
  /** Two-sided p of H0: slope = 0. */
  slopeP: number;
  /** Coefficient of determination. */
  rSquared: number;
  /** Residual standard error √(RSS/df) (for unit weight when weighted). */
  residualSE: number;
  /** (Weighted) residual sum of squares. */
  rss: number;
  /** (Weighted) mean of x. */
  meanX: number;
  /** (Weighted) Σ w(x − x̄)². */
  sxx: number;
  /** Σ w (n when unweighted): the effective count the intercept variance uses. */
  sumWeights: number;
}

/** Ordinary (or weighted) least squares of y on x with t-based intervals (Draper & Smith 1998, Applied Regression Analysis, ch. 1 and 9). */
export function ols(x: ArrayLike<number>, y: ArrayLike<number>, options: OlsOptions = {}): OlsFit {
  const n = x.length;
  if (y.length !== n) throw new RangeError(lengthMismatch('x', n, 'y', y.length));
  if (n < 3) throw new RangeError(tooFewPoints('ols', 3, n));
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const w = options.weights;
  if (w !== undefined && w.length !== n) throw new RangeError(lengthMismatch('x', n, 'weights', w.length));

  let sw = 0;
  let swx = 0;
  let swy = 0;
  for (let i = 0; i < n; i++) {
    const wi = w === undefined ? 1 : w[i];
    sw += wi;
    swx += wi * x[i];
    swy += wi * y[i];
  }
  const mx = swx / sw;
  const my = swy / sw;
  // Centred sums avoid the cancellation of the textbook Σx² − n·x̄² form.
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const wi = w === undefined ? 1 : w[i];
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxx += wi * dx * dx;
    sxy += wi * dx * dy;
    syy += wi * dy * dy;
  }
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const wi = w === undefined ? 1 : w[i];
    const e = y[i] - intercept - slope * x[i];
    rss += wi * e * e;
  }
  const df = n - 2;
  const s2 = rss / df;
  const varSlope = s2 / sxx;
  const varIntercept = s2 * (1 / sw + (mx * mx) / sxx);
  const slopeSE = Math.sqrt(varSlope);
  const interceptSE = Math.sqrt(varIntercept);
  const t = tQuantile(1 - (1 - level) / 2, df);
  return {
    n,
    df,
    level,
    weighted: w !== undefined,
    intercept,
    slope,
    interceptSE,
    slopeSE,
    interceptCI: { lower: intercept - t * interceptSE, upper: intercept + t * interceptSE },
    slopeCI: { lower: slope - t * slopeSE, upper: slope + t * slopeSE },
    covInterceptSlope: -mx * varSlope,
    slopeP: tTwoSidedP(slope / slopeSE, df),
    rSquared: 1 - rss / syy,
    residualSE: Math.sqrt(s2),
    rss,
    meanX: mx,
    sxx,
    sumWeights: sw,
  };
}
