import type { Grid } from '../types.js';
import { sampleNeedsMonth, sampleNeedsTime } from '../grids/messages.js';
import { EARTH_RADIUS_KM, haversineKm } from './haversine.js';

/** A place and time to sample a grid at: degrees east/north, depth in m positive down, month 1..12 or ms since 1970 UTC. */
export interface GridPoint {
  /** Longitude, degrees east (any range; wrapped). */
  lon: number;
  /** Latitude, degrees north. */
  lat: number;
  /** Depth in m, positive down. */
  depth: number;
  /** Month 1..12 for a climatology; default from `timeMs`. */
  month?: number;
  /** Time in ms since 1970-01-01T00:00Z; the nearest step of a time-series grid is used. */
  timeMs?: number;
}

/** Options of sampleGrid. */
export interface SampleOptions {
  /** Farthest a nearest-valid-node fallback may reach, km (great circle). */
  maxDistanceKm: number;
  /** How far below the deepest level a sample still takes the deepest level, m; default the last level spacing (0 for one level). */
  depthToleranceM?: number;
}

/** A sampled value and the great-circle distance in km to the nearest valid grid node that went into it. */
export interface GridSample {
  /** Interpolated value in the grid's units. */
  value: number;
  /** Distance to the nearest valid node used, km. */
  distanceKm: number;
}

/** What sampleGrid precomputes once per grid. */
interface Prepared {
  nx: number;
  ny: number;
  nz: number;
  /** Widest lon cell still interpolated across, degrees (1.5× median spacing); wider cells are holes. */
  lonGap: number;
  /** Months 1..12 → time index, −1 when absent. */
  monthIndex: Int32Array;
}

const cache = new WeakMap<Grid, Prepared>();
const RAD = Math.PI / 180;

function prepare(grid: Grid): Prepared {
  const nx = grid.lon.length;
  const gaps = Float64Array.from({ length: Math.max(0, nx - 1) }, (_, i) => grid.lon[i + 1] - grid.lon[i]).sort();
  const monthIndex = new Int32Array(13).fill(-1);
  if (grid.timeKind === 'month') grid.time.forEach((m, i) => (monthIndex[m] = i));
  return { nx, ny: grid.lat.length, nz: grid.depth.length, lonGap: nx > 1 ? 1.5 * gaps[(nx - 1) >> 1] : 360, monthIndex };
}

/** Largest i with axis[i] <= v (axis ascending, axis[0] <= v). */
function floorIndex(axis: Float64Array, v: number): number {
  let lo = 0;
  let hi = axis.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (axis[mid] <= v) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

function wrap(lon: number): number {
  const w = (((lon + 180) % 360) + 360) % 360 - 180;
  return w === 180 ? -180 : w;
}

// Bracket results are kept in module scratch variables so a call allocates nothing but its result.
let b0 = 0;
let b1 = 0;
let bw = 0;

/** Bracket on a non-periodic axis; edges clamp within one spacing (poles, coasts of a regional grid). */
function bracket(axis: Float64Array, v: number): boolean {
  const n = axis.length;
  if (n === 1) {
    b0 = b1 = 0;
    bw = 0;
    return v === axis[0];
  }
  if (v < axis[0]) {
    b0 = b1 = 0;
    bw = 0;
    return axis[0] - v <= axis[1] - axis[0];
  }
  if (v >= axis[n - 1]) {
    b0 = b1 = n - 1;
    bw = 0;
    return v - axis[n - 1] <= axis[n - 1] - axis[n - 2];
  }
  b0 = floorIndex(axis, v);
  b1 = b0 + 1;
  bw = (v - axis[b0]) / (axis[b1] - axis[b0]);
  return true;
}

/** Bracket in longitude, across the dateline when the grid is periodic; cells wider than `gap` are holes. */
function lonBracket(grid: Grid, p: Prepared, lon: number): boolean {
  const axis = grid.lon;
  const n = p.nx;
  if (n > 1 && lon >= axis[0] && lon < axis[n - 1]) {
    b0 = floorIndex(axis, lon);
    b1 = b0 + 1;
    const width = axis[b1] - axis[b0];
    bw = (lon - axis[b0]) / width;
    return width <= p.lonGap;
  }
  if (grid.periodicLon && n > 1) {
    const width = axis[0] + 360 - axis[n - 1];
    b0 = n - 1;
    b1 = 0;
    bw = (lon >= axis[n - 1] ? lon - axis[n - 1] : lon + 360 - axis[n - 1]) / width;
    return true;
  }
  return bracket(axis, lon);
}

function timeIndex(grid: Grid, p: Prepared, point: GridPoint): number {
  if (grid.timeKind === 'none') return 0;
  if (grid.timeKind === 'month') {
    const month = point.month ?? (point.timeMs !== undefined ? new Date(point.timeMs).getUTCMonth() + 1 : undefined);
    if (month === undefined) throw new Error(sampleNeedsMonth(grid.source, grid.variable));
    return month >= 1 && month <= 12 ? p.monthIndex[month] : -1;
  }
  if (point.timeMs === undefined) throw new Error(sampleNeedsTime(grid.source, grid.variable));
  const t = grid.time;
  if (point.timeMs <= t[0]) return 0;
  const i = floorIndex(t, point.timeMs);
  return i + 1 < t.length && t[i + 1] - point.timeMs < point.timeMs - t[i] ? i + 1 : i;
}

/** Nearest valid node at level `z` within `maxKm` of the point, or null; scans only the lat/lon window the distance allows. */
function nearestValid(grid: Grid, p: Prepared, base: number, lon: number, lat: number, maxKm: number): GridSample | null {
  const { nx, ny } = p;
  const angle = maxKm / EARTH_RADIUS_KM;
  const latSpan = angle / RAD;
  const y0 = lat - latSpan <= grid.lat[0] ? 0 : floorIndex(grid.lat, lat - latSpan);
  const maxAbsLat = Math.min(90, Math.abs(lat) + latSpan);
  const c = Math.cos(maxAbsLat * RAD);
  // Δλ ≤ 2·asin(sin(d/2R)/cos φmax) on the sphere: from the haversine formula with both cos φ ≥ cos φmax.
  const s = c > 0 ? Math.sin(Math.min(angle, Math.PI) / 2) / c : 2;
  const lonSpan = s >= 1 ? 180 : (2 * Math.asin(s)) / RAD;
  const west = wrap(lon - lonSpan);
  const xStart = west < grid.lon[0] || west >= grid.lon[nx - 1] ? (west < grid.lon[0] ? 0 : nx - 1) : floorIndex(grid.lon, west);
  let best = Infinity;
  let bestValue = NaN;
  for (let y = y0; y < ny && grid.lat[y] <= lat + latSpan; y++) {
    const row = base + y * nx;
    for (let k = 0; k < nx; k++) {
      const x = (xStart + k) % nx;
      const east = (((grid.lon[x] - west) % 360) + 360) % 360;
      if (east > 2 * lonSpan && k > 0) break;
      const v = grid.values[row + x];
      if (v !== v) continue;
      const d = haversineKm(lon, lat, grid.lon[x], grid.lat[y]);
      if (d < best || (d === best && v < bestValue)) {
        best = d;
        bestValue = v;
      }
    }
  }
  return best <= maxKm ? { value: bestValue, distanceKm: best } : null;
}

/**
 * Samples a grid at a point: bilinear in lon/lat (across the dateline on periodic grids), linear in depth,
 * the point's month of a climatology or the nearest time step. Missing corners are left out and the weights
 * renormalised over the valid ones (common practice); with no valid corner, the nearest valid node at the
 * nearest level within `maxDistanceKm` is returned. Above the first level the first level is used; below the
 * deepest, the deepest within `depthToleranceM`, else null. Lat (and non-periodic lon) clamp to the edge row
 * within one spacing of the edge. `distanceKm` is the haversine distance to the nearest valid node used.
 */
export function sampleGrid(grid: Grid, point: GridPoint, options: SampleOptions): GridSample | null {
  let p = cache.get(grid);
  if (p === undefined) {
    p = prepare(grid);
    cache.set(grid, p);
  }
  const t = timeIndex(grid, p, point);
  if (t < 0) return null;
  const { nx, ny, nz } = p;
  const depth = grid.depth;
  let z0 = 0;
  let z1 = 0;
  let wz = 0;
  if (point.depth > depth[0]) {
    if (point.depth >= depth[nz - 1]) {
      const tolerance = options.depthToleranceM ?? (nz > 1 ? depth[nz - 1] - depth[nz - 2] : 0);
      if (point.depth - depth[nz - 1] > tolerance) return null;
      z0 = z1 = nz - 1;
    } else {
      z0 = floorIndex(depth, point.depth);
      z1 = z0 + 1;
      wz = (point.depth - depth[z0]) / (depth[z1] - depth[z0]);
    }
  }
  const lon = wrap(point.lon);
  const lat = point.lat;
  const lonInside = lonBracket(grid, p, lon);
  const x0 = b0;
  const x1 = b1;
  const wx = bw;
  const latInside = bracket(grid.lat, lat);
  const y0 = b0;
  const y1 = b1;
  const wy = bw;
  const plane = nx * ny;
  const values = grid.values;
  if (lonInside && latInside) {
    let sum = 0;
    let weight = 0;
    let nearest = Infinity;
    for (let c = 0; c < 4; c++) {
      const x = c & 1 ? x1 : x0;
      const y = c & 2 ? y1 : y0;
      const wxy = (c & 1 ? wx : 1 - wx) * (c & 2 ? wy : 1 - wy);
      if (wxy === 0) continue;
      let used = false;
      for (let k = 0; k < 2; k++) {
        const w = wxy * (k ? wz : 1 - wz);
        if (w === 0) continue;
        const v = values[((t * nz + (k ? z1 : z0)) * ny + y) * nx + x];
        if (v !== v) continue;
        sum += w * v;
        weight += w;
        used = true;
      }
      if (used) nearest = Math.min(nearest, haversineKm(lon, lat, grid.lon[x], grid.lat[y]));
    }
    if (weight > 0) return { value: sum / weight, distanceKm: nearest };
  }
  const zNear = wz < 0.5 ? z0 : z1;
  return nearestValid(grid, p, (t * nz + zNear) * plane, lon, lat, options.maxDistanceKm);
}
