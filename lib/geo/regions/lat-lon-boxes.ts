import { densifyPath, type LonLat } from './densify.js';
import { badBoxSize } from './messages.js';
import type { RegionCollection, RegionFeature } from './region-types.js';

/** Degrees between inserted points along box edges on parallels (d3-geo reads edges as great circles). */
export const BOX_DENSIFY_DEG = 0.5;

/**
 * Regular sizeDeg × sizeDeg lon/lat boxes tiling the globe from 90°S and 180°W, ordered south to north then
 * west to east; ids like 'box-lat-45s_40s-lon-170w_165w' (decimal point written 'p': 'box-lat-2p5n_5n-…').
 */
export function latLonBoxes(sizeDeg: number): RegionCollection {
  const nLat = 180 / sizeDeg;
  if (!(sizeDeg > 0 && sizeDeg <= 90) || Math.abs(nLat - Math.round(nLat)) > 1e-9) throw new RangeError(badBoxSize(sizeDeg));
  const rows = Math.round(nLat);
  const features: RegionFeature[] = [];
  for (let j = 0; j < rows; j++) {
    // Edges from integer multiples, not running sums, so neighbouring boxes share exact coordinates.
    const south = -90 + (180 * j) / rows;
    const north = -90 + (180 * (j + 1)) / rows;
    for (let i = 0; i < 2 * rows; i++) {
      const west = -180 + (180 * i) / rows;
      const east = -180 + (180 * (i + 1)) / rows;
      const id = `box-lat-${code(south, 'n', 's')}_${code(north, 'n', 's')}-lon-${code(west, 'e', 'w')}_${code(east, 'e', 'w')}`;
      const name = `${label(south, 'N', 'S')}–${label(north, 'N', 'S')}, ${label(west, 'E', 'W')}–${label(east, 'E', 'W')}`;
      // Clockwise on a north-up map (d3-geo's exterior winding): up the west side, east along the top.
      const corners: LonLat[] = [[west, south], [west, north], [east, north], [east, south], [west, south]];
      const ring = densifyPath(corners, BOX_DENSIFY_DEG);
      features.push({ type: 'Feature', id, properties: { id, name, box: [west, south, east, north] }, geometry: { type: 'Polygon', coordinates: [ring] } });
    }
  }
  return { type: 'FeatureCollection', features };
}

function number(v: number): string {
  return String(Number(Math.abs(v).toFixed(6)));
}

function code(v: number, pos: string, neg: string): string {
  return v === 0 ? '0' : `${number(v).replace('.', 'p')}${v > 0 ? pos : neg}`;
}

function label(v: number, pos: string, neg: string): string {
  return v === 0 ? '0°' : `${number(v)}°${v > 0 ? pos : neg}`;
}
