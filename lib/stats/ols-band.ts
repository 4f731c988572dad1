import { tQuantile } from './distributions.js';
import type { OlsFit } from './ols.js';
import { badLevel } from './messages.js';

/** Options of `olsBand`. */
export interface OlsBandOptions {
  /** Confidence level; default 0.95. */
  level?: number;
  /** 'confidence' bounds the mean line; 'prediction' bounds a new unit-weight observation. */
  kind: 'confidence' | 'prediction';
}

/** Pointwise band of a straight-line fit. */
export interface OlsBand {
  /** Fitted mean at each x. */
  fit: number[];
  /** Lower bound at each x. */
  lower: number[];
  /** Upper bound at each x. */
  upper: number[];
}

/** Pointwise t-based confidence or prediction band of an `ols` fit at xs, units of y (Draper & Smith 1998, §1.4). */
export function olsBand(fit: OlsFit, xs: ArrayLike<number>, options: OlsBandOptions): OlsBand {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const t = tQuantile(1 - (1 - level) / 2, fit.df);
  const s2 = fit.residualSE * fit.residualSE;
  const extra = options.kind === 'prediction' ? s2 : 0;
  const out: OlsBand = { fit: [], lower: [], upper: [] };
  for (let i = 0; i < xs.length; i++) {
    const yhat = fit.intercept + fit.slope * xs[i];
    const d = xs[i] - fit.meanX;
    const half = t * Math.sqrt(s2 * (1 / fit.sumWeights + (d * d) / fit.sxx) + extra);
    out.fit.push(yhat);
    out.lower.push(yhat - half);
    out.upper.push(yhat + half);
  }
  return out;
}
