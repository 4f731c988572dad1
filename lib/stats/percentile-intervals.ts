import { quantileSorted } from 'd3-array';
import type { Interval } from './interval.js';

/** Failed-replicate counts and percentile intervals of bootstrap replicate values, one array per component (R quantile type 7 of the finite values; Davison & Hinkley 1997, eq. 5.18). */
export function percentileIntervals(values: Float64Array[], level: number): { failed: number[]; intervals: Interval[] } {
  const alpha = 1 - level;
  const failed: number[] = [];
  const intervals: Interval[] = [];
  for (const v of values) {
    const finite = Array.from(v.filter(Number.isFinite).sort());
    failed.push(v.length - finite.length);
    intervals.push(
      finite.length > 0
        ? { lower: quantileSorted(finite, alpha / 2) as number, upper: quantileSorted(finite, 1 - alpha / 2) as number }
        : { lower: NaN, upper: NaN },
    );
  }
  return { failed, intervals };
}
