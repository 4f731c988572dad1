import { randomLcg } from 'd3-random';
import type { Interval } from './interval.js';
import { groupRows } from './group-rows.js';
import { percentileIntervals } from './percentile-intervals.js';
import { badLevel } from './messages.js';

/** A statistic over the rows idx[0..len) of the caller's data; returns one or more numbers (NaN = failed replicate). */
export type GroupStatistic = (idx: Int32Array, len: number) => ArrayLike<number>;

/** Options of `bootstrapByGroup`. */
export interface BootstrapOptions {
  /** Number of bootstrap replicates. */
  replicates: number;
  /** Seed of the d3-random LCG. */
  seed: number;
  /** Level of the percentile intervals; default 0.95. */
  level?: number;
}

/** Replicate estimates and percentile intervals of a group (cluster) bootstrap. */
export interface BootstrapResult {
  /** Number of replicates drawn. */
  replicates: number;
  /** Seed used. */
  seed: number;
  /** Level of the intervals. */
  level: number;
  /** Number of groups resampled. */
  groups: number;
  /** Statistic on the full data. */
  estimate: number[];
  /** Replicate values, one array per statistic component, in draw order (NaN kept). */
  values: number[][];
  /** Replicates whose value was not finite, per component (left out of the interval). */
  failed: number[];
  /** Percentile interval per component (R quantile type 7 of the finite values). */
  intervals: Interval[];
}

/** Seeded case bootstrap resampling whole groups (e.g. stations) with replacement, percentile intervals (Davison & Hinkley 1997, Bootstrap Methods, §3.8 and eq. 5.18). */
export function bootstrapByGroup(
  group: Int32Array,
  statistic: GroupStatistic,
  options: BootstrapOptions,
): BootstrapResult {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const n = group.length;
  // Rows of each group, contiguous (CSR), so a drawn group is one block copy; groups with no rows are not drawn.
  const { start, rows, present } = groupRows(group);
  const groups = present.length;

  const all = new Int32Array(n);
  for (let i = 0; i < n; i++) all[i] = i;
  const estimate = Array.from(statistic(all, n));
  const m = estimate.length;
  const b = options.replicates;
  const values = Array.from({ length: m }, () => new Float64Array(b));
  let idx = new Int32Array(Math.max(n, 1));
  const rng = randomLcg(options.seed);
  for (let r = 0; r < b; r++) {
    let len = 0;
    for (let d = 0; d < groups; d++) {
      const j = present[Math.floor(rng() * groups)];
      const s = start[j];
      const e = start[j + 1];
      if (len + (e - s) > idx.length) {
        const grown = new Int32Array(Math.max(idx.length * 2, len + (e - s)));
        grown.set(idx.subarray(0, len));
        idx = grown;
      }
      // A plain loop: subarray views would allocate once per drawn group.
      for (let t = s; t < e; t++) idx[len++] = rows[t];
    }
    const v = statistic(idx, len);
    for (let c = 0; c < m; c++) values[c][r] = v[c];
  }
  const { failed, intervals } = percentileIntervals(values, level);
  return {
    replicates: b,
    seed: options.seed,
    level,
    groups,
    estimate,
    values: values.map((v) => Array.from(v)),
    failed,
    intervals,
  };
}
