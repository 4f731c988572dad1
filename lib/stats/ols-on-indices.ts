/** Slope and intercept only, for resampling kernels. */
export interface LineCoefficients {
  /** Intercept (units of y). */
  intercept: number;
  /** Slope (units of y per unit x). */
  slope: number;
}

/** Unweighted least-squares line over the rows idx[0..len) of x and y, without copying (NaN slope if x has no spread). */
export function olsOnIndices(x: ArrayLike<number>, y: ArrayLike<number>, idx: Int32Array, len: number): LineCoefficients {
  // One pass of sums shifted by the first point: the shift keeps the sums small, so the
  // Σx² − (Σx)²/n cancellation stays harmless, at half the memory traffic of two passes.
  const x0 = x[idx[0]];
  const y0 = y[idx[0]];
  let sx = 0;
  let sy = 0;
  let sxx = 0;
  let sxy = 0;
  for (let k = 0; k < len; k++) {
    const i = idx[k];
    const dx = x[i] - x0;
    const dy = y[i] - y0;
    sx += dx;
    sy += dy;
    sxx += dx * dx;
    sxy += dx * dy;
  }
  const cxx = sxx - (sx * sx) / len;
  const cxy = sxy - (sx * sy) / len;
  const slope = cxx > 0 ? cxy / cxx : NaN;
  return { intercept: y0 + sy / len - slope * (x0 + sx / len), slope };
}
