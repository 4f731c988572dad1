import { fUpperP } from './distributions.js';
import { groupMoments } from './group-moments.js';
import { ancovaGroups } from './messages.js';

/** One F test of nested linear models. */
export interface NestedFTest {
  /** F statistic. */
  f: number;
  /** Numerator degrees of freedom. */
  df1: number;
  /** Denominator degrees of freedom. */
  df2: number;
  /** Upper-tail p. */
  p: number;
}

/** Analysis of covariance of straight lines across groups. */
export interface AncovaSlopes {
  /** Number of groups. */
  groups: number;
  /** Total number of points. */
  n: number;
  /** Slope of each group fitted alone. */
  slopes: number[];
  /** Common slope of the parallel-lines model, Σ Sxy / Σ Sxx. */
  commonSlope: number;
  /** Intercept of each group under the common slope. */
  commonSlopeIntercepts: number[];
  /** RSS of separate lines (the interaction model). */
  rssSeparate: number;
  /** RSS of parallel lines (common slope, separate intercepts). */
  rssCommonSlope: number;
  /** RSS of one line for all groups. */
  rssSingleLine: number;
  /** F test of equal slopes: parallel lines against separate lines. */
  equalSlopes: NestedFTest;
  /** F test of equal intercepts given equal slopes: one line against parallel lines. */
  equalIntercepts: NestedFTest;
}

/** F tests of equal slopes and, given them, equal intercepts across groups (Zar 2010, Biostatistical Analysis, ch. 18; Sokal & Rohlf 1995, §14.8), from closed-form group sums. */
export function ancovaSlopes(groups: readonly { x: ArrayLike<number>; y: ArrayLike<number> }[]): AncovaSlopes {
  const m = groups.map((g) => groupMoments(g.x, g.y));
  const k = m.length;
  if (k < 2 || m.some((g) => g.n < 3)) throw new RangeError(ancovaGroups(m.filter((g) => g.n >= 3).length));
  let n = 0;
  let rssSeparate = 0;
  let sxxW = 0;
  let sxyW = 0;
  let syyW = 0;
  let sx = 0;
  let sy = 0;
  for (const g of m) {
    n += g.n;
    rssSeparate += g.syy - (g.sxy * g.sxy) / g.sxx;
    sxxW += g.sxx;
    sxyW += g.sxy;
    syyW += g.syy;
    sx += g.n * g.meanX;
    sy += g.n * g.meanY;
  }
  const commonSlope = sxyW / sxxW;
  const rssCommonSlope = syyW - (sxyW * sxyW) / sxxW;
  // Total sums = within-group sums + between-group sums about the grand means.
  const mx = sx / n;
  const my = sy / n;
  let sxxT = sxxW;
  let sxyT = sxyW;
  let syyT = syyW;
  for (const g of m) {
    sxxT += g.n * (g.meanX - mx) ** 2;
    sxyT += g.n * (g.meanX - mx) * (g.meanY - my);
    syyT += g.n * (g.meanY - my) ** 2;
  }
  const rssSingleLine = syyT - (sxyT * sxyT) / sxxT;
  const dfSep = n - 2 * k;
  const dfCommon = n - k - 1;
  const fS = (rssCommonSlope - rssSeparate) / (k - 1) / (rssSeparate / dfSep);
  const fI = (rssSingleLine - rssCommonSlope) / (k - 1) / (rssCommonSlope / dfCommon);
  return {
    groups: k,
    n,
    slopes: m.map((g) => g.sxy / g.sxx),
    commonSlope,
    commonSlopeIntercepts: m.map((g) => g.meanY - commonSlope * g.meanX),
    rssSeparate,
    rssCommonSlope,
    rssSingleLine,
    equalSlopes: { f: fS, df1: k - 1, df2: dfSep, p: fUpperP(fS, k - 1, dfSep) },
    equalIntercepts: { f: fI, df1: k - 1, df2: dfCommon, p: fUpperP(fI, k - 1, dfCommon) },
  };
}
