import { tQuantile, tTwoSidedP } from './distributions.js';
import { groupMoments } from './group-moments.js';
import type { Interval } from './interval.js';
import { ancovaGroups, badLevel } from './messages.js';

/** Options of `pairwiseSlopeDifferences`. */
export interface PairwiseSlopeOptions {
  /** Confidence level; default 0.95. */
  level?: number;
  /** 'none' gives per-comparison intervals; 'bonferroni' divides 1 − level by the number of pairs; default 'none'. */
  adjust?: 'none' | 'bonferroni';
}

/** Difference of the slopes of groups i and j (i < j). */
export interface SlopeDifference {
  /** Index of the first group. */
  i: number;
  /** Index of the second group. */
  j: number;
  /** slope_i − slope_j. */
  difference: number;
  /** Standard error from the pooled residual variance of the separate-lines model. */
  se: number;
  /** t interval of the difference on n − 2k df. */
  interval: Interval;
  /** Two-sided p of equal slopes (adjusted like the interval). */
  p: number;
}

/** All pairwise slope differences with t intervals on the pooled separate-lines variance (Zar 2010, Biostatistical Analysis, §18.4); unadjusted unless `adjust: 'bonferroni'`. */
export function pairwiseSlopeDifferences(
  groups: readonly { x: ArrayLike<number>; y: ArrayLike<number> }[],
  options: PairwiseSlopeOptions = {},
): { adjust: 'none' | 'bonferroni'; level: number; df: number; pairs: SlopeDifference[] } {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const adjust = options.adjust ?? 'none';
  const m = groups.map((g) => groupMoments(g.x, g.y));
  const k = m.length;
  if (k < 2 || m.some((g) => g.n < 3)) throw new RangeError(ancovaGroups(m.filter((g) => g.n >= 3).length));
  let n = 0;
  let rss = 0;
  for (const g of m) {
    n += g.n;
    rss += g.syy - (g.sxy * g.sxy) / g.sxx;
  }
  const df = n - 2 * k;
  const s2 = rss / df;
  const pairsCount = (k * (k - 1)) / 2;
  const alpha = adjust === 'bonferroni' ? (1 - level) / pairsCount : 1 - level;
  const t = tQuantile(1 - alpha / 2, df);
  const pairs: SlopeDifference[] = [];
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      const difference = m[i].sxy / m[i].sxx - m[j].sxy / m[j].sxx;
      const se = Math.sqrt(s2 * (1 / m[i].sxx + 1 / m[j].sxx));
      const raw = tTwoSidedP(difference / se, df);
      pairs.push({
        i,
        j,
        difference,
        se,
        interval: { lower: difference - t * se, upper: difference + t * se },
        p: adjust === 'bonferroni' ? Math.min(1, raw * pairsCount) : raw,
      });
    }
  }
  return { adjust, level, df, pairs };
}
