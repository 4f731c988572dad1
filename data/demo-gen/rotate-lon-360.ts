/** A Grid re-expressed with longitudes 0–360 (columns rotated), as some climatologies ship; the reader must rotate back. */
import type { Grid } from '../../lib/types.js';

/** Copy of `grid` whose longitudes run 0–360 ascending, values moved with their columns. */
export function rotateLon360(grid: Grid): Grid {
  const nx = grid.lon.length;
  const order = Array.from({ length: nx }, (_, i) => i).sort((a, b) => ((grid.lon[a] + 360) % 360) - ((grid.lon[b] + 360) % 360));
  const values = new Float32Array(grid.values.length);
  for (let row = 0; row < grid.values.length / nx; row++) for (let x = 0; x < nx; x++) values[row * nx + x] = grid.values[row * nx + order[x]];
  return { ...grid, lon: Float64Array.from(order, (i) => (grid.lon[i] + 360) % 360), values };
}
