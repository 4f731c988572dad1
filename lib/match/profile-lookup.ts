/** Depth look-ups in a depth-sorted profile: nearest bottle and the two bottles bracketing a depth. */
import type { Profile } from './bottle-index.js';

/** Index of the first depth ≥ d (binary search); depth.length when none. */
function lowerBound(depth: Float64Array, d: number): number {
  let lo = 0;
  let hi = depth.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (depth[mid] < d) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the bottle nearest in depth to d (m); on an exact tie the shallower one; -1 for an empty profile. */
export function nearestBottle(profile: Profile, d: number): number {
  const { depth } = profile;
  if (depth.length === 0) return -1;
  const i = lowerBound(depth, d);
  if (i === 0) return 0;
  if (i === depth.length) return depth.length - 1;
  // The first bottle at depth[i-1] keeps ties with the shallower one deterministic.
  let above = i - 1;
  while (above > 0 && depth[above - 1] === depth[above]) above--;
  return d - depth[above] <= depth[i] - d ? above : i;
}

/** Linear interpolation at d (m) between the bottles just above and below within `maxGapM`; null when d is not bracketed. */
export function bracketingValue(profile: Profile, d: number, maxGapM: number): { value: number; upper: number; lower: number } | null {
  const { depth, value } = profile;
  const below = lowerBound(depth, d);
  if (below === 0 || below === depth.length) return null;
  const above = below - 1;
  const gap = depth[below] - depth[above];
  if (!(gap > 0) || gap > maxGapM) return null;
  const w = (d - depth[above]) / gap;
  return { value: value[above] + w * (value[below] - value[above]), upper: above, lower: below };
}
