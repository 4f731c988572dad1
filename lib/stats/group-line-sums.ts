import type { GroupRows } from './group-rows.js';

/** Per-group sufficient statistics of a straight-line fit, taken about the whole-data weighted means (x₀, y₀). */
export interface GroupLineSums {
  /** Whole-data weighted mean of x the sums are centred on. */
  x0: number;
  /** Whole-data weighted mean of y. */
  y0: number;
  /** Six sums per group id j at 6j..6j+5: Σw, Σw·dx, Σw·dy, Σw·dx², Σw·dx·dy, Σw·dy², with dx = x − x₀, dy = y − y₀. */
  sums: Float64Array;
}

/** Sums each group's weighted moments once, so a resample's OLS or SMA line is a count-weighted sum of them (Draper & Smith 1998, §1.2, normal equations in sums of squares and products). */
export function groupLineSums(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  weights: ArrayLike<number> | undefined,
  index: GroupRows,
): GroupLineSums {
  const n = x.length;
  let sw = 0;
  let swx = 0;
  let swy = 0;
  for (let i = 0; i < n; i++) {
    const w = weights === undefined ? 1 : weights[i];
    sw += w;
    swx += w * x[i];
    swy += w * y[i];
  }
  // Centring on the overall means keeps the resample's Σdx² − (Σdx)²/Σw free of cancellation.
  const x0 = swx / sw;
  const y0 = swy / sw;
  const sums = new Float64Array(6 * index.groups);
  for (let j = 0; j < index.groups; j++) {
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    let s4 = 0;
    let s5 = 0;
    for (let t = index.start[j]; t < index.start[j + 1]; t++) {
      const i = index.rows[t];
      const w = weights === undefined ? 1 : weights[i];
      const dx = x[i] - x0;
      const dy = y[i] - y0;
      s0 += w;
      s1 += w * dx;
      s2 += w * dy;
      s3 += w * dx * dx;
      s4 += w * dx * dy;
      s5 += w * dy * dy;
    }
    sums.set([s0, s1, s2, s3, s4, s5], 6 * j);
  }
  return { x0, y0, sums };
}
