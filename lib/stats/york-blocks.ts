import type { YorkGroupedData } from './york-on-counts.js';

/**
 * The York sums of every group as a short series in b: cells of one group sharing σx² and with σy² within a relative
 * spread of 2·10⁻³ form a block, and each block keeps the moments S_k[f] = Σ δᵏ f of δ = σy² − σy²_ref against
 * f ∈ {1, dx, dy, dx², dy², dx·dy}, so the York sums at any slope cost O(blocks · terms) instead of O(cells).
 */
export interface YorkBlocks {
  /** Block offsets per group id (length groups + 1). */
  blockStart: Int32Array;
  /** σx² shared by the cells of each block. */
  vx: Float64Array;
  /** Reference σy² of each block (midpoint of its range). */
  vyRef: Float64Array;
  /** Series terms K of each block: moments S_0..S_K are stored. */
  terms: Int32Array;
  /** Offset of each block's moments in `moments` (length blocks + 1); S_k[f] sits at offset + 6k + f. */
  offset: Int32Array;
  /** Moments, f in the order 1, dx, dy, dx², dy², dx·dy. */
  moments: Float64Array;
  /** Origin the deviations dx = x − x0, dy = y − y0 are taken about (the first row, for conditioning). */
  x0: number;
  /** See `x0`. */
  y0: number;
}

/** Largest relative σy² spread within a block; with the midpoint reference the series ratio |δ|/T stays ≤ 10⁻³. */
const SPREAD = 2e-3;
/** Relative truncation error the series terms are chosen for. */
const EPS = 1e-16;

/**
 * Builds the block moments of `YorkBlocks` from cells stored group by group. Each term count K is the least with
 * ρᴷ ≤ 10⁻¹⁶, ρ = max|δ|/σy²_ref bounding |δ|/T since T = σy²_ref + b²σx² ≥ σy²_ref (geometric series of
 * 1/(T + δ)², Abramowitz & Stegun 1964, 3.6.8); a block whose σy² are all equal needs K = 1 and is exact.
 */
export function yorkBlocks(d: YorkGroupedData): YorkBlocks {
  const { start, x, y, vx, vy } = d;
  const groups = start.length - 1;
  const x0 = x.length > 0 ? x[0] : 0;
  const y0 = y.length > 0 ? y[0] : 0;
  const blockStart = new Int32Array(groups + 1);
  const bvx: number[] = [];
  const bvy: number[] = [];
  const bterms: number[] = [];
  const boffset: number[] = [0];
  const moments: number[] = [];
  for (let j = 0; j < groups; j++) {
    const cells: number[] = [];
    for (let i = start[j]; i < start[j + 1]; i++) cells.push(i);
    cells.sort((a, b) => vx[a] - vx[b] || vy[a] - vy[b] || a - b);
    let t = 0;
    while (t < cells.length) {
      const first = cells[t];
      let u = t + 1;
      while (u < cells.length && vx[cells[u]] === vx[first] && vy[cells[u]] - vy[first] <= SPREAD * vy[first]) u++;
      const lo = vy[first];
      const hi = vy[cells[u - 1]];
      const ref = hi === lo ? lo : lo + (hi - lo) / 2;
      const rho = hi === lo ? 0 : Math.max(ref - lo, hi - ref) / ref;
      const K = rho === 0 ? 1 : Math.max(1, Math.ceil(Math.log(EPS) / Math.log(rho)));
      const base = moments.length;
      for (let k = 0; k <= K; k++) moments.push(0, 0, 0, 0, 0, 0);
      for (let s = t; s < u; s++) {
        const i = cells[s];
        const dx = x[i] - x0;
        const dy = y[i] - y0;
        const delta = vy[i] - ref;
        let p = 1;
        for (let k = 0; k <= K; k++) {
          const o = base + 6 * k;
          moments[o] += p;
          moments[o + 1] += p * dx;
          moments[o + 2] += p * dy;
          moments[o + 3] += p * dx * dx;
          moments[o + 4] += p * dy * dy;
          moments[o + 5] += p * dx * dy;
          p *= delta;
        }
      }
      bvx.push(vx[first]);
      bvy.push(ref);
      bterms.push(K);
      boffset.push(moments.length);
      t = u;
    }
    blockStart[j + 1] = bvx.length;
  }
  return {
    blockStart,
    vx: Float64Array.from(bvx),
    vyRef: Float64Array.from(bvy),
    terms: Int32Array.from(bterms),
    offset: Int32Array.from(boffset),
    moments: Float64Array.from(moments),
    x0,
    y0,
  };
}
