// Fast lookups on a grid's lattice for map rasters: one 2-D level, nearest node or bilinear, no per-pixel allocation.
import type { Grid } from '../types.js';

/** One horizontal field on a lon/lat lattice: values [y][x] (index y·nx + x), NaN missing. */
export interface LatticeField {
  /** Longitudes in degrees east, ascending. */
  lon: Float64Array;
  /** Latitudes in degrees north, ascending. */
  lat: Float64Array;
  /** Values, index y·nx + x. */
  values: Float32Array;
  /** True when longitudes span the globe, so lookups wrap across the dateline. */
  periodicLon: boolean;
}

/** Which part of a grid becomes the 2-D field: a level index or a depth layer to average, and a time index. */
export interface LevelChoice {
  /** Depth level index (default 0, the shallowest). Ignored when `layer` is given. */
  depthIndex?: number;
  /** Depth layer [top, bottom] in m: the mean over levels inside it, NaN levels skipped. */
  layer?: [number, number];
  /** Time index (month − 1 for a climatology; default 0). */
  timeIndex?: number;
}

/** The 2-D field of `grid` at a depth level (or layer mean) and time index. */
export function gridLevel(grid: Grid, choice: LevelChoice = {}): LatticeField {
  const nx = grid.lon.length;
  const ny = grid.lat.length;
  const nz = grid.depth.length;
  const t = choice.timeIndex ?? 0;
  const plane = nx * ny;
  const levels: number[] = [];
  if (choice.layer) {
    const [top, bottom] = choice.layer;
    for (let z = 0; z < nz; z++) if (grid.depth[z] >= top && grid.depth[z] <= bottom) levels.push(z);
  } else {
    levels.push(choice.depthIndex ?? 0);
  }
  const values = new Float32Array(plane);
  for (let i = 0; i < plane; i++) {
    let sum = 0;
    let n = 0;
    for (const z of levels) {
      const v = grid.values[(t * nz + z) * plane + i];
      if (!Number.isNaN(v)) {
        sum += v;
        n++;
      }
    }
    values[i] = n > 0 ? sum / n : Number.NaN;
  }
  return { lon: grid.lon, lat: grid.lat, values, periodicLon: grid.periodicLon };
}

/** Index of the last element ≤ x in ascending `a` (−1 when x < a[0]). */
function floorIndex(a: Float64Array, x: number): number {
  let lo = 0;
  let hi = a.length - 1;
  if (x < a[0]) return -1;
  if (x >= a[hi]) return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (a[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

// Nearest node, accepting points up to half a cell beyond the first and last node (the cells' own extent).
function nearestIndex(a: Float64Array, x: number): number {
  const n = a.length;
  if (n === 1) return 0;
  const i = floorIndex(a, x);
  if (i < 0) return a[0] - x <= (a[1] - a[0]) / 2 ? 0 : -1;
  if (i === n - 1) return x - a[n - 1] <= (a[n - 1] - a[n - 2]) / 2 ? n - 1 : -1;
  return x - a[i] <= a[i + 1] - x ? i : i + 1;
}

/** Value of the lattice node nearest to (lon, lat) in degrees; NaN outside the lattice (beyond half a cell) or missing. */
export function sampleNearest(field: LatticeField, lon: number, lat: number): number {
  const { lon: xs, lat: ys, values } = field;
  const nx = xs.length;
  const y = nearestIndex(ys, lat);
  if (y < 0) return Number.NaN;
  let x: number;
  if (field.periodicLon) {
    // Bring lon into [lon0, lon0 + 360) and pick the nearer of the two neighbours, wrapping at the seam.
    let l = lon;
    while (l < xs[0]) l += 360;
    while (l >= xs[0] + 360) l -= 360;
    const i = floorIndex(xs, l);
    const next = i + 1 < nx ? xs[i + 1] : xs[0] + 360;
    x = l - xs[i] <= next - l ? i : (i + 1) % nx;
  } else {
    x = nearestIndex(xs, lon);
    if (x < 0) return Number.NaN;
  }
  return values[y * nx + x];
}

/** Bilinear value at (lon, lat) from the four surrounding nodes; NaN if any of them is missing or outside. */
export function sampleBilinear(field: LatticeField, lon: number, lat: number): number {
  const { lon: xs, lat: ys, values } = field;
  const nx = xs.length;
  const j = floorIndex(ys, lat);
  if (j < 0 || j >= ys.length - 1) return lat === ys[ys.length - 1] ? sampleNearest(field, lon, lat) : Number.NaN;
  const fy = (lat - ys[j]) / (ys[j + 1] - ys[j]);
  let i: number;
  let i1: number;
  let fx: number;
  if (field.periodicLon) {
    let l = lon;
    while (l < xs[0]) l += 360;
    while (l >= xs[0] + 360) l -= 360;
    i = floorIndex(xs, l);
    i1 = (i + 1) % nx;
    const next = i + 1 < nx ? xs[i + 1] : xs[0] + 360;
    fx = (l - xs[i]) / (next - xs[i]);
  } else {
    i = floorIndex(xs, lon);
    if (i < 0 || i >= nx - 1) return lon === xs[nx - 1] ? sampleNearest(field, lon, lat) : Number.NaN;
    i1 = i + 1;
    fx = (lon - xs[i]) / (xs[i1] - xs[i]);
  }
  const v00 = values[j * nx + i];
  const v10 = values[j * nx + i1];
  const v01 = values[(j + 1) * nx + i];
  const v11 = values[(j + 1) * nx + i1];
  return (1 - fy) * ((1 - fx) * v00 + fx * v10) + fy * ((1 - fx) * v01 + fx * v11);
}
