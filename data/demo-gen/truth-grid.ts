/** Gridded climatologies sampled from the truth fields on a regular lon/lat/depth/month grid, land as NaN. */
import { landMask } from '../../lib/geo/index.js';
import type { Grid } from '../../lib/types.js';
import { truthField, type FieldQuantity } from './truth-fields.js';

/** Depth levels of the NetCDF climatologies (m). */
export const GRID_DEPTHS = [0, 10, 25, 50, 100, 200, 500, 1000, 2000, 4000] as const;

/** Axis centres from -limit + step/2 to limit - step/2. */
function centres(limit: number, step: number): Float64Array {
  const n = Math.round((2 * limit) / step);
  return Float64Array.from({ length: n }, (_, i) => -limit + step * (i + 0.5));
}

/** Options of truthGrid. */
export interface TruthGridOptions {
  /** Grid spacing in degrees (both axes). */
  stepDeg: number;
  /** Depth levels (m). */
  depths: readonly number[];
  /** Canonical unit of the quantity. */
  units: string;
  /** Source file name recorded in the grid. */
  source: string;
  /** Variable name. */
  variable: string;
  /** Factor applied to the canonical values, e.g. 1.025 kg/L to write per litre; default 1. */
  scale?: number;
}

/** A 12-month climatology of `quantity` (times `scale`) with longitudes in [-180, 180), values rounded to 4 significant digits. */
export function truthGrid(quantity: FieldQuantity, options: TruthGridOptions): Grid {
  const lon = centres(180, options.stepDeg);
  const lat = centres(90, options.stepDeg);
  const depth = Float64Array.from(options.depths);
  const time = Float64Array.from({ length: 12 }, (_, i) => i + 1);
  const land = landMask({ resolution: '110m', coastToleranceKm: 0 });
  const wet = new Uint8Array(lon.length * lat.length);
  for (let y = 0; y < lat.length; y++) for (let x = 0; x < lon.length; x++) wet[y * lon.length + x] = land.insideLand(lon[x], lat[y]) ? 0 : 1;
  const values = new Float32Array(time.length * depth.length * lat.length * lon.length);
  const scale = options.scale ?? 1;
  let i = 0;
  for (let t = 0; t < time.length; t++) {
    for (let z = 0; z < depth.length; z++) {
      for (let y = 0; y < lat.length; y++) {
        for (let x = 0; x < lon.length; x++) {
          values[i++] = wet[y * lon.length + x] ? Number((scale * truthField(quantity, lon[x], lat[y], depth[z], time[t])).toPrecision(4)) : NaN;
        }
      }
    }
  }
  return { quantity, units: options.units, lon, lat, depth, timeKind: 'month', time, values, periodicLon: true, source: options.source, variable: options.variable };
}
