import { randomLcg } from 'd3-random';
import type { BootstrapOptions, BootstrapResult } from './bootstrap-by-group.js';
import { groupRows, type GroupRows } from './group-rows.js';
import { badLevel } from './messages.js';
import { percentileIntervals } from './percentile-intervals.js';

/** A statistic of a resample given as how many times each group id was drawn (counts[j]; 0 = not drawn); NaN = failed replicate. */
export type CountStatistic = (counts: Int32Array) => ArrayLike<number>;

/**
 * Seeded group (cluster) bootstrap that hands the statistic the draw counts of the groups instead of a resampled row
 * list, so statistics built from per-group sums cost O(groups) per replicate (Davison & Hinkley 1997, Bootstrap
 * Methods, §3.8). Draws the same groups as `bootstrapByGroup` for the same seed; the full-data estimate uses count 1.
 */
export function bootstrapGroupCounts(
  group: Int32Array | GroupRows,
  statistic: CountStatistic,
  options: BootstrapOptions,
): BootstrapResult {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const index = group instanceof Int32Array ? groupRows(group) : group;
  const present = index.present;
  const groups = present.length;
  const counts = new Int32Array(index.groups);
  for (let d = 0; d < groups; d++) counts[present[d]] = 1;
  const estimate = Array.from(statistic(counts));
  const m = estimate.length;
  const b = options.replicates;
  const values = Array.from({ length: m }, () => new Float64Array(b));
  const rng = randomLcg(options.seed);
  for (let r = 0; r < b; r++) {
    counts.fill(0);
    for (let d = 0; d < groups; d++) counts[present[Math.floor(rng() * groups)]]++;
    const v = statistic(counts);
    for (let c = 0; c < m; c++) values[c][r] = v[c];
  }
  const { failed, intervals } = percentileIntervals(values, level);
  return { replicates: b, seed: options.seed, level, groups, estimate, values: values.map((v) => Array.from(v)), failed, intervals };
}
