import { tQuantile, tTwoSidedP } from './distributions.js';
import { badLevel } from './messages.js';

/** One-sample Student t test of a mean against mu0, with its confidence interval. */
export interface OneSampleTResult {
  /** Number of finite values used. */
  n: number;
  /** Non-finite values ignored (the caller ledgers them). */
  nNonFinite: number;
  /** Sample mean. */
  mean: number;
  /** Sample standard deviation (n − 1 denominator). */
  sd: number;
  /** Standard error of the mean, sd/√n. */
  se: number;
  /** t = (mean − mu0)/se; NaN when n < 2 or the values are constant. */
  t: number;
  /** Degrees of freedom, n − 1. */
  df: number;
  /** Two-sided p-value; NaN when t is NaN. */
  p: number;
  /** Lower end of the level confidence interval of the mean. */
  ciLow: number;
  /** Upper end of the level confidence interval of the mean. */
  ciHigh: number;
  /** Confidence level of the interval. */
  level: number;
  /** Hypothesised mean. */
  mu0: number;
}

/** One-sample two-sided t test, mean ± t₍₁₋α/₂, n−1₎·s/√n (Student 1908; as R `t.test(x, mu = mu0)`). */
export function oneSampleT(values: readonly number[], mu0 = 0, level = 0.95): OneSampleTResult {
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const xs = values.filter((v) => Number.isFinite(v));
  const n = xs.length;
  const mean = n > 0 ? xs.reduce((s, v) => s + v, 0) / n : NaN;
  let ss = 0;
  for (const v of xs) ss += (v - mean) * (v - mean);
  const df = n - 1;
  const sd = n > 1 ? Math.sqrt(ss / df) : NaN;
  const se = sd / Math.sqrt(n);
  // Constant data carry no information on the spread, so no test is possible (R refuses too).
  const t = n > 1 && se > 0 ? (mean - mu0) / se : NaN;
  const p = Number.isNaN(t) ? NaN : tTwoSidedP(t, df);
  const half = n > 1 ? tQuantile(1 - (1 - level) / 2, df) * se : NaN;
  return { n, nNonFinite: values.length - n, mean, sd, se, t, df, p, ciLow: mean - half, ciHigh: mean + half, level, mu0 };
}
