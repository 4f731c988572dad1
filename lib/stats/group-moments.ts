/** Centred sums of one group of (x, y) points. */
export interface GroupMoments {
  /** Number of points. */
  n: number;
  /** Mean of x. */
  meanX: number;
  /** Mean of y. */
  meanY: number;
  /** Σ(x − x̄)². */
  sxx: number;
  /** Σ(x − x̄)(y − ȳ). */
  sxy: number;
  /** Σ(y − ȳ)². */
  syy: number;
}

/** Means and centred sums of squares and products of one group (two passes, for accuracy). */
export function groupMoments(x: ArrayLike<number>, y: ArrayLike<number>): GroupMoments {
  const n = x.length;
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i];
    sy += y[i];
  }
  const meanX = sx / n;
  const meanY = sy / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - meanX;
    const dy = y[i] - meanY;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  return { n, meanX, meanY, sxx, sxy, syy };
}
