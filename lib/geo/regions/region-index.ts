import { geoBounds, geoContains } from 'd3-geo';
import type { Position } from 'geojson';
import type { RegionCollection, RegionFeature } from './region-types.js';

/** Side of the lookup raster cells, degrees. */
const CELL_DEG = 0.5;
const N_LON = 360 / CELL_DEG;
const N_LAT = 180 / CELL_DEG;
/** Side of the candidate buckets, degrees. */
const BUCKET_DEG = 10;
const B_LON = 360 / BUCKET_DEG;
const B_LAT = 180 / BUCKET_DEG;
/** Shift north-east (degrees, ≈ 0.1 m) at which polygons are tested, so points on shared edges resolve one way. */
const EDGE_NUDGE_DEG = 1e-6;

const UNKNOWN = 0;
const BOUNDARY = 1;
const INSIDE = 2;
const OUTSIDE = 3;

interface Prepared {
  id: string;
  feature: RegionFeature;
  /** First raster column of the window and its width (columns wrap modulo N_LON). */
  i0: number;
  ni: number;
  /** First raster row and height. */
  j0: number;
  nj: number;
  /** Cell states in the window, row-major (BOUNDARY cells need the exact test). */
  state: Uint8Array;
}

/** A point-in-region lookup built once per region scheme. */
export interface RegionIndex {
  /** Id of the first region (in scheme order) containing the point, or null; lon in degrees east, lat north. */
  assign(lon: number, lat: number): string | null;
}

// One index per scheme object: building it costs ~0.3 s for the basins, and the same scheme is used on every build.
const memo = new WeakMap<RegionCollection, RegionIndex>();

/**
 * An index over a region scheme for fast point lookup (built once per scheme object): a 0.5° raster marks cells crossed by an edge;
 * other cells are inside or outside as a whole (one d3-geo geoContains per connected patch), so only
 * points near a boundary pay for the exact spherical test. Regions with properties.box are tested by
 * arithmetic. Results are cached per coordinate pair.
 */
export function regionIndex(regions: RegionCollection): RegionIndex {
  const known = memo.get(regions);
  if (known) return known;
  const index = buildIndex(regions);
  memo.set(regions, index);
  return index;
}

function buildIndex(regions: RegionCollection): RegionIndex {
  const prepared = regions.features.map(prepare);
  const buckets: number[][] = Array.from({ length: B_LON * B_LAT }, () => []);
  prepared.forEach((r, k) => {
    const seen = new Set<number>();
    for (let jj = 0; jj < r.nj; jj++) {
      for (let ii = 0; ii < r.ni; ii++) {
        const gi = (r.i0 + ii) % N_LON;
        const b = Math.floor((r.j0 + jj) / (BUCKET_DEG / CELL_DEG)) * B_LON + Math.floor(gi / (BUCKET_DEG / CELL_DEG));
        if (!seen.has(b)) {
          seen.add(b);
          buckets[b].push(k);
        }
      }
    }
  });
  const cache = new Map<string, string | null>();
  const lookup = (lon: number, lat: number, exactLon: number, exactLat: number): string | null => {
    const gi = Math.min(N_LON - 1, Math.floor((lon + 180) / CELL_DEG));
    const gj = Math.min(N_LAT - 1, Math.max(0, Math.floor((lat + 90) / CELL_DEG)));
    const bucket = buckets[Math.floor(gj / (BUCKET_DEG / CELL_DEG)) * B_LON + Math.floor(gi / (BUCKET_DEG / CELL_DEG))];
    for (const k of bucket) {
      const r = prepared[k];
      const ii = (gi - r.i0 + N_LON) % N_LON;
      const jj = gj - r.j0;
      if (ii >= r.ni || jj < 0 || jj >= r.nj) continue;
      const box = r.feature.properties.box;
      if (box) {
        const [x, y] = [exactLon, exactLat];
        if (x >= box[0] && x < box[2] && y >= box[1] && (y < box[3] || (box[3] === 90 && y === 90))) return r.id;
        continue;
      }
      const s = r.state[jj * r.ni + ii];
      if (s === INSIDE || (s === BOUNDARY && geoContains(r.feature, [lon, lat]))) return r.id;
    }
    return null;
  };
  return {
    assign(lonIn: number, lat: number): string | null {
      if (!Number.isFinite(lonIn) || !Number.isFinite(lat) || Math.abs(lat) > 90) return null;
      const lon = ((((lonIn + 180) % 360) + 360) % 360) - 180;
      const key = `${lon},${lat}`;
      const hit = cache.get(key);
      if (hit !== undefined) return hit;
      // Polygons are tested a hair north-east of the point, so a point exactly on an edge shared by two
      // regions (the equator, a meridian, a vertex) goes to the region north or east of it, never to both or neither.
      const latNudged = lat + (lat < 90 - EDGE_NUDGE_DEG ? EDGE_NUDGE_DEG : -EDGE_NUDGE_DEG);
      const lonNudged = lon + EDGE_NUDGE_DEG >= 180 ? lon + EDGE_NUDGE_DEG - 360 : lon + EDGE_NUDGE_DEG;
      const id = lookup(lonNudged, latNudged, lon, lat);
      cache.set(key, id);
      return id;
    },
  };
}

/** Id of the first region containing (lon, lat) or null (d3-geo geoContains); the index is built once per scheme object. */
export function assignRegion(regions: RegionCollection, lon: number, lat: number): string | null {
  return regionIndex(regions).assign(lon, lat);
}

function prepare(feature: RegionFeature): Prepared {
  const [[w, s], [e0, n]] = geoBounds(feature);
  const e = e0 < w ? e0 + 360 : e0;
  const i0 = Math.floor((w + 180) / CELL_DEG);
  const ni = Math.min(N_LON, Math.floor((e + 180) / CELL_DEG) - i0 + 1);
  const j0 = Math.max(0, Math.floor((s + 90) / CELL_DEG));
  const nj = Math.min(N_LAT - 1, Math.floor((n + 90) / CELL_DEG)) - j0 + 1;
  // Boxes are tested by arithmetic, so they need no raster.
  const isBox = feature.properties.box !== undefined;
  const r: Prepared = { id: feature.id, feature, i0: ((i0 % N_LON) + N_LON) % N_LON, ni, j0, nj, state: new Uint8Array(isBox ? 0 : ni * nj) };
  if (isBox) return r;
  const polygons = feature.geometry.type === 'Polygon' ? [feature.geometry.coordinates] : feature.geometry.coordinates;
  for (const rings of polygons) for (const ring of rings) markRing(r, ring);
  fillPatches(r, ni === N_LON);
  return r;
}

// Mark every cell that the bounding box of an edge (a great-circle arc) touches, with a small pad.
function markRing(r: Prepared, ring: Position[]): void {
  const pad = 1e-7;
  for (let k = 1; k < ring.length; k++) {
    const [[w, s], [e0, n]] = geoBounds({ type: 'LineString', coordinates: [ring[k - 1], ring[k]] });
    const e = e0 < w ? e0 + 360 : e0;
    const gi0 = Math.floor((w - pad + 180) / CELL_DEG);
    const gi1 = Math.floor((e + pad + 180) / CELL_DEG);
    const gj0 = Math.max(0, Math.floor((s - pad + 90) / CELL_DEG));
    const gj1 = Math.min(N_LAT - 1, Math.floor((n + pad + 90) / CELL_DEG));
    for (let gi = gi0; gi <= Math.min(gi1, gi0 + N_LON - 1); gi++) {
      const ii = (((gi - r.i0) % N_LON) + N_LON) % N_LON;
      if (ii >= r.ni) continue;
      for (let gj = gj0; gj <= gj1; gj++) {
        const jj = gj - r.j0;
        if (jj >= 0 && jj < r.nj) r.state[jj * r.ni + ii] = BOUNDARY;
      }
    }
  }
}

// Cells not crossed by an edge form patches wholly inside or outside; one exact test per patch.
function fillPatches(r: Prepared, wrap: boolean): void {
  const stack: number[] = [];
  for (let start = 0; start < r.state.length; start++) {
    if (r.state[start] !== UNKNOWN) continue;
    const ii = start % r.ni;
    const jj = Math.floor(start / r.ni);
    const lon = -180 + ((r.i0 + ii) % N_LON + 0.5) * CELL_DEG;
    const lat = -90 + (r.j0 + jj + 0.5) * CELL_DEG;
    const value = geoContains(r.feature, [lon, lat]) ? INSIDE : OUTSIDE;
    r.state[start] = value;
    stack.push(start);
    while (stack.length > 0) {
      const c = stack.pop() as number;
      const ci = c % r.ni;
      const cj = Math.floor(c / r.ni);
      const neighbours: [number, number][] = [[ci - 1, cj], [ci + 1, cj], [ci, cj - 1], [ci, cj + 1]];
      for (const [ni0, nj] of neighbours) {
        const nii = wrap ? (ni0 + r.ni) % r.ni : ni0;
        if (nii < 0 || nii >= r.ni || nj < 0 || nj >= r.nj) continue;
        const nc = nj * r.ni + nii;
        if (r.state[nc] === UNKNOWN) {
          r.state[nc] = value;
          stack.push(nc);
        }
      }
    }
  }
}
