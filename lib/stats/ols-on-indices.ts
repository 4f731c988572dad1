/** Slope and intercept only, for resampling kernels. */
export interface LineCoefficients {
  /** Intercept (units of y). */
  intercept: number;
  /** Slope (units of y per unit x). */
  slope: number;
}

/** Unweighted least-squares line over the rows idx[0..len) of x and y, without copying (two centred passes; NaN if x has no spread). */
export function olsOnIndices(x: ArrayLike<number>, y: ArrayLike<number>, idx: Int32Array, len: number): LineCoefficients {
  let sx = 0;
  let sy = 0;
  for (let k = 0; k < len; k++) {
    const i = idx[k];
    sx += x[i];
    sy += y[i];
  }
  const mx = sx / len;
  const my = sy / len;
  let sxx = 0;
  let sxy = 0;
  for (let k = 0; k < len; k++) {
    const i = idx[k];
    const dx = x[i] - mx;
    sxx += dx * dx;
    sxy += dx * (y[i] - my);
  }
  const slope = sxx > 0 ? sxy / sxx : NaN;
  return { intercept: my - slope * mx, slope };
}
