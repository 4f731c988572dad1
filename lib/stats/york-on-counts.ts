/** Cells stored group by group: the rows of group j are start[j]..start[j+1] of every array. */
export interface YorkGroupedData {
  /** Row offsets per group id (length groups + 1). */
  start: Int32Array;
  /** x per row. */
  x: Float64Array;
  /** y per row. */
  y: Float64Array;
  /** σx² per row. */
  vx: Float64Array;
  /** σy² per row. */
  vy: Float64Array;
}

/** Options of `yorkOnCounts`. */
export interface YorkOnCountsOptions {
  /** Slope to start from (the whole-data York slope: a resample's optimum lies close to it). */
  startSlope: number;
  /** Stop when the relative change of the slope falls below this; default 1e-12. */
  tolerance?: number;
  /** Iteration limit; default 50. */
  maxIterations?: number;
}

/**
 * York slope and intercept of a group resample with uncorrelated errors, each row weighted by its group's draw count,
 * without copying rows; NaN when the iteration does not converge. Each iteration is the York et al. (2004, Am. J.
 * Phys. 72:367, Section III steps 3–6) update b = ΣWβV/ΣWβU with W = 1/(σy² + b²σx²), β = W(Uσy² + bVσx²), written in
 * raw sums so one pass over the rows suffices; sums are taken about the first row for conditioning.
 */
export function yorkOnCounts(d: YorkGroupedData, counts: Int32Array, o: YorkOnCountsOptions): { slope: number; intercept: number; iterations: number } {
  const tol = o.tolerance ?? 1e-12;
  const maxIt = o.maxIterations ?? 50;
  const { start, x, y, vx, vy } = d;
  const x0 = x.length > 0 ? x[0] : 0;
  const y0 = y.length > 0 ? y[0] : 0;
  let b = o.startSlope;
  for (let it = 1; it <= maxIt; it++) {
    const b2 = b * b;
    let sW = 0;
    let sWx = 0;
    let sWy = 0;
    let q = 0;
    let qx = 0;
    let qy = 0;
    let qxx = 0;
    let qxy = 0;
    let r = 0;
    let rx = 0;
    let ry = 0;
    let ryy = 0;
    let rxy = 0;
    for (let j = 0; j < counts.length; j++) {
      const c = counts[j];
      if (c === 0) continue;
      let gW = 0;
      let gWx = 0;
      let gWy = 0;
      let gq = 0;
      let gqx = 0;
      let gqy = 0;
      let gqxx = 0;
      let gqxy = 0;
      let gr = 0;
      let grx = 0;
      let gry = 0;
      let gryy = 0;
      let grxy = 0;
      for (let i = start[j]; i < start[j + 1]; i++) {
        const W = 1 / (vy[i] + b2 * vx[i]);
        const dx = x[i] - x0;
        const dy = y[i] - y0;
        gW += W;
        gWx += W * dx;
        gWy += W * dy;
        const W2 = W * W;
        const Q = W2 * vy[i];
        const R = W2 * vx[i];
        gq += Q;
        gqx += Q * dx;
        gqy += Q * dy;
        gqxx += Q * dx * dx;
        gqxy += Q * dx * dy;
        gr += R;
        grx += R * dx;
        gry += R * dy;
        gryy += R * dy * dy;
        grxy += R * dx * dy;
      }
      sW += c * gW;
      sWx += c * gWx;
      sWy += c * gWy;
      q += c * gq;
      qx += c * gqx;
      qy += c * gqy;
      qxx += c * gqxx;
      qxy += c * gqxy;
      r += c * gr;
      rx += c * grx;
      ry += c * gry;
      ryy += c * gryy;
      rxy += c * grxy;
    }
    const X = sWx / sW;
    const Y = sWy / sW;
    // ΣW²σy²UV, ΣW²σx²V², ΣW²σy²U², ΣW²σx²UV with U = dx − X, V = dy − Y.
    const qUV = qxy - Y * qx - X * qy + X * Y * q;
    const rVV = ryy - 2 * Y * ry + Y * Y * r;
    const qUU = qxx - 2 * X * qx + X * X * q;
    const rUV = rxy - Y * rx - X * ry + X * Y * r;
    const bNew = (qUV + b * rVV) / (qUU + b * rUV);
    if (!Number.isFinite(bNew)) break;
    const change = Math.abs(bNew - b);
    b = bNew;
    // The intercept uses the weighted means at the previous slope, which differ from the final ones below the tolerance.
    if (change <= tol * Math.abs(b)) return { slope: b, intercept: y0 + Y - b * (x0 + X), iterations: it };
  }
  return { slope: NaN, intercept: NaN, iterations: maxIt };
}
