// One map layer from a grid: the level nearest a depth, averaged over the grid's time steps.
import { gridLevel, type LatticeField } from '../../figures/index.js';
import type { Grid } from '../../types.js';

/** Index of the grid depth nearest `depthM` (the first on ties). */
export function nearestDepthIndex(grid: Grid, depthM: number): number {
  let best = 0;
  for (let i = 1; i < grid.depth.length; i++) if (Math.abs(grid.depth[i] - depthM) < Math.abs(grid.depth[best] - depthM)) best = i;
  return best;
}

/** The field at the level nearest `depthM`, the mean over all time steps (a climatology's annual mean), NaN where every step is missing. */
export function latticeLevel(grid: Grid, depthM: number): { field: LatticeField; depth: number } {
  const depthIndex = nearestDepthIndex(grid, depthM);
  const steps = Math.max(1, grid.time.length);
  const sum = new Float64Array(grid.lon.length * grid.lat.length);
  const n = new Uint16Array(sum.length);
  for (let t = 0; t < steps; t++) {
    const level = gridLevel(grid, { depthIndex, timeIndex: t });
    for (let i = 0; i < sum.length; i++) {
      const v = level.values[i];
      if (!Number.isNaN(v)) {
        sum[i] += v;
        n[i]++;
      }
    }
  }
  const values = new Float32Array(sum.length);
  for (let i = 0; i < values.length; i++) values[i] = n[i] ? sum[i] / n[i] : Number.NaN;
  return { field: { lon: grid.lon, lat: grid.lat, values, periodicLon: grid.periodicLon }, depth: grid.depth[depthIndex] ?? 0 };
}

/** Lattice nodes as CSV rows (lon, lat, value), missing nodes left out. */
export function latticeRows(field: LatticeField): { lon: number; lat: number; value: number }[] {
  const rows: { lon: number; lat: number; value: number }[] = [];
  const nx = field.lon.length;
  for (let y = 0; y < field.lat.length; y++) {
    for (let x = 0; x < nx; x++) {
      const v = field.values[y * nx + x];
      if (!Number.isNaN(v)) rows.push({ lon: field.lon[x], lat: field.lat[y], value: Number(v.toPrecision(6)) });
    }
  }
  return rows;
}

/** Finite range of a field as [min, max], or null. */
export function fieldRange(field: LatticeField): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of field.values) {
    if (Number.isFinite(v)) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  return lo <= hi ? [lo, hi] : null;
}
