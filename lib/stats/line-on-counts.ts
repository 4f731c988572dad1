import type { GroupLineSums } from './group-line-sums.js';
import type { LineCoefficients } from './ols-on-indices.js';

/**
 * The OLS (weighted if the sums were) or SMA line of a group resample from per-group sums and draw counts, O(groups):
 * the same line as refitting the resampled rows. OLS slope Sxy/Sxx (Draper & Smith 1998, eq. 1.2.9); SMA slope
 * sign(Sxy)·√(Syy/Sxx) (Warton et al. 2006, Biol. Rev. 81:259, Table 4). NaN when x has no spread.
 */
export function lineOnCounts(s: GroupLineSums, counts: Int32Array, model: 'ols' | 'sma'): LineCoefficients {
  const sums = s.sums;
  let sw = 0;
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let j = 0; j < counts.length; j++) {
    const c = counts[j];
    if (c === 0) continue;
    const o = 6 * j;
    sw += c * sums[o];
    sx += c * sums[o + 1];
    sy += c * sums[o + 2];
    sxx += c * sums[o + 3];
    sxy += c * sums[o + 4];
    syy += c * sums[o + 5];
  }
  const mx = sx / sw;
  const my = sy / sw;
  const cxx = sxx - sx * mx;
  const cxy = sxy - sx * my;
  const cyy = syy - sy * my;
  let slope: number;
  if (!(cxx > 0)) slope = NaN;
  else if (model === 'ols') slope = cxy / cxx;
  else slope = (cxy < 0 ? -1 : 1) * Math.sqrt(cyy / cxx);
  return { slope, intercept: s.y0 + my - slope * (s.x0 + mx) };
}
