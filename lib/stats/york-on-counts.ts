import { yorkBlocks, type YorkBlocks } from './york-blocks.js';

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
  /** Stop when the slope changes by at most tolerance·(1 + |b|); default 1e-12. */
  tolerance?: number;
  /** Limit on evaluations of the York update; default 50. */
  maxIterations?: number;
}

/**
 * York slope and intercept of a group resample with uncorrelated errors, each row weighted by its group's draw count,
 * without copying rows; NaN when the iteration does not converge. Builds the block moments of `yorkBlocks` on each
 * call: a bootstrap builds them once with `yorkBlocks` and calls `yorkOnBlocks`.
 */
export function yorkOnCounts(d: YorkGroupedData, counts: Int32Array, o: YorkOnCountsOptions): { slope: number; intercept: number; iterations: number } {
  return yorkOnBlocks(yorkBlocks(d), counts, o);
}

/**
 * `yorkOnCounts` on prebuilt block moments. The York et al. (2004, Am. J. Phys. 72:367, Section III steps 3–6) update
 * F(b) = ΣWβV/ΣWβU with W = 1/(σy² + b²σx²), β = W(Uσy² + bVσx²) is written in raw sums of Q = W²σy² and R = W²σx²
 * (ΣW = ΣQ + b²ΣR), and its fixed point is found by Steffensen's method: two updates b₁ = F(b₀), b₂ = F(b₁), then
 * the Aitken Δ² extrapolation b₀ − (b₁ − b₀)²/(b₂ − 2b₁ + b₀) (Burden & Faires, Numerical Analysis, §2.5).
 * `iterations` counts evaluations of F.
 */
export function yorkOnBlocks(d: YorkBlocks, counts: Int32Array, o: YorkOnCountsOptions): { slope: number; intercept: number; iterations: number } {
  const tol = o.tolerance ?? 1e-12;
  const maxIt = o.maxIterations ?? 50;
  const means = new Float64Array(2);
  let b0 = o.startSlope;
  let it = 0;
  const done = (b: number): { slope: number; intercept: number; iterations: number } => ({
    slope: b,
    // The intercept uses the weighted means at the previous slope, which differ from the final ones below the tolerance.
    intercept: d.y0 + means[1] - b * (d.x0 + means[0]),
    iterations: it,
  });
  while (it < maxIt) {
    const b1 = update(d, counts, b0, means);
    it++;
    if (!Number.isFinite(b1)) break;
    if (Math.abs(b1 - b0) <= tol * (1 + Math.abs(b1))) return done(b1);
    if (it >= maxIt) break;
    const b2 = update(d, counts, b1, means);
    it++;
    if (!Number.isFinite(b2)) break;
    if (Math.abs(b2 - b1) <= tol * (1 + Math.abs(b2))) return done(b2);
    const den = b2 - 2 * b1 + b0;
    const jump = b0 - ((b1 - b0) * (b1 - b0)) / den;
    b0 = den !== 0 && Number.isFinite(jump) ? jump : b2;
  }
  return { slope: NaN, intercept: NaN, iterations: it };
}

/** One York update F(b) from the block moments; writes the weighted means (X, Y) of dx, dy at b into `means`. */
function update(d: YorkBlocks, counts: Int32Array, b: number, means: Float64Array): number {
  const { blockStart, vx, vyRef, terms, offset, moments: S } = d;
  const b2 = b * b;
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
    for (let g = blockStart[j]; g < blockStart[j + 1]; g++) {
      const vr = vyRef[g];
      const T = vr + b2 * vx[g];
      const inv = 1 / T;
      // 1/(T + δ)² = Σ_k c_k δᵏ with c_k = (−1)ᵏ (k + 1) / T^(k+2); A_f = Σ c_k S_k[f], B_f = Σ c_k S_{k+1}[f].
      let ck = inv * inv;
      let a0 = 0;
      let a1 = 0;
      let a2 = 0;
      let a3 = 0;
      let a4 = 0;
      let a5 = 0;
      let e0 = 0;
      let e1 = 0;
      let e2 = 0;
      let e3 = 0;
      let e5 = 0;
      const K = terms[g];
      let p = offset[g];
      for (let k = 0; k < K; k++, p += 6) {
        a0 += ck * S[p];
        a1 += ck * S[p + 1];
        a2 += ck * S[p + 2];
        a3 += ck * S[p + 3];
        a4 += ck * S[p + 4];
        a5 += ck * S[p + 5];
        e0 += ck * S[p + 6];
        e1 += ck * S[p + 7];
        e2 += ck * S[p + 8];
        e3 += ck * S[p + 9];
        e5 += ck * S[p + 11];
        ck *= (-(k + 2) / (k + 1)) * inv;
      }
      // R = σx²/(T + δ)², Q = (σy²_ref + δ)/(T + δ)².
      const cv = c * vx[g];
      r += cv * a0;
      rx += cv * a1;
      ry += cv * a2;
      ryy += cv * a4;
      rxy += cv * a5;
      q += c * (vr * a0 + e0);
      qx += c * (vr * a1 + e1);
      qy += c * (vr * a2 + e2);
      qxx += c * (vr * a3 + e3);
      qxy += c * (vr * a5 + e5);
    }
  }
  const sW = q + b2 * r;
  const X = (qx + b2 * rx) / sW;
  const Y = (qy + b2 * ry) / sW;
  means[0] = X;
  means[1] = Y;
  // ΣW²σy²UV, ΣW²σx²V², ΣW²σy²U², ΣW²σx²UV with U = dx − X, V = dy − Y.
  const qUV = qxy - Y * qx - X * qy + X * Y * q;
  const rVV = ryy - 2 * Y * ry + Y * Y * r;
  const qUU = qxx - 2 * X * qx + X * X * q;
  const rUV = rxy - Y * rx - X * ry + X * Y * r;
  return (qUV + b * rVV) / (qUU + b * rUV);
}
