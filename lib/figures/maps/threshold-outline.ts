// The outline where a gridded field exceeds a threshold (e.g. the HNLC region from surface nitrate), as lon/lat polygons.
import { contours } from 'd3-contour';
import { geoArea } from 'd3-geo';
import type { MultiLineString, MultiPolygon, Position } from 'geojson';
import type { LatticeField } from '../raster-sample.js';

function axisAt(a: Float64Array, index: number): number {
  // d3-contour puts node k at coordinate k + 0.5; clamp to the lattice and interpolate between nodes.
  const k = Math.min(Math.max(index - 0.5, 0), a.length - 1);
  const i = Math.min(Math.floor(k), a.length - 2);
  if (a.length === 1) return a[0];
  return a[i] + (k - i) * (a[i + 1] - a[i]);
}

// A periodic lattice gets one wrapped column on each side, so contours run across the dateline seam
// instead of closing along it; the duplicated column draws over itself.
function wrapPad(field: LatticeField): LatticeField {
  const nx = field.lon.length;
  const ny = field.lat.length;
  const lon = new Float64Array(nx + 2);
  lon.set(field.lon, 1);
  lon[0] = field.lon[nx - 1] - 360;
  lon[nx + 1] = field.lon[0] + 360;
  const values = new Float32Array((nx + 2) * ny);
  for (let y = 0; y < ny; y++) {
    values.set(field.values.subarray(y * nx, (y + 1) * nx), y * (nx + 2) + 1);
    values[y * (nx + 2)] = field.values[y * nx + nx - 1];
    values[y * (nx + 2) + nx + 1] = field.values[y * nx];
  }
  return { lon, lat: field.lat, values, periodicLon: false };
}

/** The region above a threshold: its polygons, and the contour lines to draw (frame edges of the lattice left out). */
export interface ThresholdOutline {
  /** Polygons (lon/lat, d3-geo winding) enclosing lattice values ≥ threshold. */
  polygons: MultiPolygon;
  /** The same boundaries without the segments that run along the lattice's outer frame (seam, pole rows). */
  lines: MultiLineString;
}

/** Where `field` ≥ `threshold` (e.g. HNLC from surface nitrate), by marching squares (d3-contour) on the lattice, mapped to lon/lat. */
export function thresholdOutline(input: LatticeField, threshold: number): ThresholdOutline {
  const field = input.periodicLon ? wrapPad(input) : input;
  const nx = field.lon.length;
  const ny = field.lat.length;
  let lo = Infinity;
  for (let i = 0; i < field.values.length; i++) if (field.values[i] < lo) lo = field.values[i];
  // Missing nodes count as clearly below the threshold, so the outline never encloses them.
  const floor = Math.min(lo, threshold) - Math.abs(threshold) - 1;
  const values = Array.from(field.values, (v) => (Number.isNaN(v) ? floor : v));
  const [planar] = contours().size([nx, ny]).thresholds([threshold])(values);
  const polygons: Position[][][] = [];
  const lines: Position[][] = [];
  const onFrame = ([x, y]: number[]) => x <= 0 || x >= nx || y <= 0 || y >= ny;
  const toLonLat = ([x, y]: number[]) => [axisAt(field.lon, x), axisAt(field.lat, y)] as Position;
  for (const polygon of planar.coordinates) {
    for (const ring of polygon) {
      let run: Position[] = [];
      for (let k = 0; k < ring.length; k++) {
        const frameEdge = k > 0 && onFrame(ring[k - 1]) && onFrame(ring[k]);
        if (frameEdge || k === 0) {
          if (run.length > 1) lines.push(run);
          run = [toLonLat(ring[k])];
        } else run.push(toLonLat(ring[k]));
      }
      if (run.length > 1) lines.push(run);
    }
    let rings = polygon.map((ring) => ring.map(toLonLat));
    // Flipping y (row index → ascending latitude) reverses the winding; d3-geo reads winding as inside/outside,
    // so a polygon that came out covering more than a hemisphere is reversed.
    if (geoArea({ type: 'Polygon', coordinates: rings }) > 2 * Math.PI) rings = rings.map((r) => r.slice().reverse());
    polygons.push(rings);
  }
  return { polygons: { type: 'MultiPolygon', coordinates: polygons }, lines: { type: 'MultiLineString', coordinates: lines } };
}
