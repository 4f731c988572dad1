// Thin typed wrappers over jstat's distribution functions (one place to swap the library).
import jstatModule from 'jstat';

const { jStat } = jstatModule;

/** Quantile of Student's t with `df` degrees of freedom (df = Infinity gives the normal quantile). */
export function tQuantile(p: number, df: number): number {
  if (!Number.isFinite(df)) return jStat.normal.inv(p, 0, 1);
  return jStat.studentt.inv(p, df);
}

/** Cumulative distribution of Student's t with `df` degrees of freedom. */
export function tCdf(t: number, df: number): number {
  if (!Number.isFinite(df)) return jStat.normal.cdf(t, 0, 1);
  return jStat.studentt.cdf(t, df);
}

/** Two-sided p-value of a t statistic: 2·(1 − F(|t|)). */
export function tTwoSidedP(t: number, df: number): number {
  return Math.min(1, 2 * (1 - tCdf(Math.abs(t), df)));
}

/** Quantile of the F distribution with (df1, df2) degrees of freedom. */
export function fQuantile(p: number, df1: number, df2: number): number {
  return jStat.centralF.inv(p, df1, df2);
}

/** Upper-tail probability P(F > f) of the F distribution with (df1, df2) degrees of freedom. */
export function fUpperP(f: number, df1: number, df2: number): number {
  return 1 - jStat.centralF.cdf(f, df1, df2);
}

/** Standard normal quantile. */
export function normalQuantile(p: number): number {
  return jStat.normal.inv(p, 0, 1);
}

/** Standard normal cumulative distribution. */
export function normalCdf(z: number): number {
  return jStat.normal.cdf(z, 0, 1);
}

/** Cumulative distribution of the non-central t (power calculations). */
export function noncentralTCdf(t: number, df: number, ncp: number): number {
  return jStat.noncentralt.cdf(t, df, ncp);
}
