import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import land50m from 'world-atlas/land-50m.json' with { type: 'json' };
import land110m from 'world-atlas/land-110m.json' with { type: 'json' };

/** Mean Earth radius, km (IUGG; Moritz 2000, Geodetic Reference System 1980). */
const EARTH_RADIUS_KM = 6371.0088;

/** Options of a land mask. */
export interface LandMaskOptions {
  /** Natural Earth land outline: '50m' (default, better for coastal stations) or '110m' (coarser, faster). */
  resolution?: '50m' | '110m';
  /** Points on land within this distance of the coastline count as at sea, km; default 10. */
  coastToleranceKm?: number;
}

/** A land test over Natural Earth land polygons (world-atlas TopoJSON). */
export interface LandMask {
  /** True when (lon, lat) in degrees is inside land and farther than the coast tolerance from the coastline. */
  isOnLand(lon: number, lat: number): boolean;
  /** True when (lon, lat) is inside a land polygon, with no coast tolerance. */
  insideLand(lon: number, lat: number): boolean;
  /** Distance to the nearest coastline, km, searched up to `maxKm` (Infinity when none is that close); equirectangular near the point. */
  distanceToCoastKm(lon: number, lat: number, maxKm: number): number;
}

type Ring = [number, number][];
type PolygonRings = Ring[];

interface Indexed {
  /** All polygon edges as x1, y1, x2, y2 in degrees (lon, lat). */
  segs: number[];
  /** Per 1° cell: indices of every edge whose box touches the cell (decides containment). */
  cellSegs: Map<number, number[]>;
  /** Per 1° cell: indices of real coastline edges (not antimeridian cuts or the polar closure). */
  coastSegs: Map<number, number[]>;
  /** Per 1° cell without edges: 1 land, 0 sea (uniform over the cell). */
  state: Uint8Array;
  /** Per cell: the nearest edge-free cell west in the same row, or -1. */
  westFree: Int32Array;
}

const NX = 360;
const NY = 180;

function col(lon: number): number {
  return Math.min(NX - 1, Math.max(0, Math.floor(lon + 180)));
}

function row(lat: number): number {
  return Math.min(NY - 1, Math.max(0, Math.floor(lat + 90)));
}

function normaliseLon(lon: number): number {
  return ((((lon + 180) % 360) + 360) % 360) - 180;
}

function isArtificial(ax: number, ay: number, bx: number, by: number): boolean {
  // Natural Earth cuts polygons along the antimeridian and closes Antarctica along the pole; neither is a coast.
  if (Math.abs(ax) > 179.999 && Math.abs(bx) > 179.999) return true;
  return ay < -89.99 && by < -89.99;
}

function push(map: Map<number, number[]>, key: number, value: number): void {
  const bucket = map.get(key);
  if (bucket) bucket.push(value);
  else map.set(key, [value]);
}

/** Longitude where edge `s` crosses latitude y (half-open rule, so a vertex is counted once), or NaN. */
function crossing(segs: number[], s: number, y: number): number {
  const k = s * 4;
  const y1 = segs[k + 1], y2 = segs[k + 3];
  if (y1 > y === y2 > y) return NaN;
  return segs[k] + ((y - y1) * (segs[k + 2] - segs[k])) / (y2 - y1);
}

function buildIndex(topology: Topology): Indexed {
  const fc = feature(topology, topology.objects.land as GeometryCollection);
  const segs: number[] = [];
  const cellSegs = new Map<number, number[]>();
  const coastSegs = new Map<number, number[]>();
  const add = (bx: number, by: number, ax: number, ay: number, artificial: boolean): void => {
    const s = segs.length / 4;
    segs.push(bx, by, ax, ay);
    for (let j = row(Math.min(ay, by)); j <= row(Math.max(ay, by)); j++) {
      for (let i = col(Math.min(ax, bx)); i <= col(Math.max(ax, bx)); i++) {
        push(cellSegs, j * NX + i, s);
        if (!artificial) push(coastSegs, j * NX + i, s);
      }
    }
  };
  for (const f of fc.features) {
    const g = f.geometry;
    const list: PolygonRings[] = g.type === 'Polygon' ? [g.coordinates as PolygonRings] : g.type === 'MultiPolygon' ? (g.coordinates as PolygonRings[]) : [];
    for (const ring of list.flat()) {
      for (let k = 1; k < ring.length; k++) {
        const [bx, by] = ring[k - 1];
        const [ax, ay] = ring[k];
        if (Math.abs(ax - bx) <= 180) {
          add(bx, by, ax, ay, isArtificial(ax, ay, bx, by));
          continue;
        }
        // topojson rejoins rings across the antimeridian: split the hop at ±180 and close the planar ring along
        // x = −180 down to the south pole (two hops close along the meridian, Antarctica's single hop over the pole).
        const edge = bx > 0 ? 180 : -180;
        const span = ax + (bx > 0 ? 360 : -360) - bx;
        // A hop from exactly −180 to +180 has zero unwrapped length: it crosses at its start.
        const yc = span === 0 ? by : by + ((edge - bx) / span) * (ay - by);
        add(bx, by, edge, yc, Math.abs(bx) > 179.999);
        add(-edge, yc, ax, ay, Math.abs(ax) > 179.999);
        add(-180, yc, -180, -90, true);
      }
    }
  }
  // Sweep each row west to east along its mid-latitude: parity of crossings gives every edge-free cell's state.
  const state = new Uint8Array(NX * NY);
  const westFree = new Int32Array(NX * NY).fill(-1);
  for (let j = 0; j < NY; j++) {
    const y = j - 90 + 0.5;
    let parity = 0;
    let free = -1;
    for (let i = 0; i < NX; i++) {
      const c = j * NX + i;
      westFree[c] = free;
      const bucket = cellSegs.get(c);
      if (!bucket) {
        state[c] = parity;
        free = c;
        continue;
      }
      for (const s of bucket) {
        const x = crossing(segs, s, y);
        if (!Number.isNaN(x) && col(x) === i) parity ^= 1;
      }
    }
  }
  return { segs, cellSegs, coastSegs, state, westFree };
}

const cache = new Map<string, Indexed>();

function indexFor(resolution: '50m' | '110m'): Indexed {
  let idx = cache.get(resolution);
  if (!idx) {
    idx = buildIndex((resolution === '50m' ? land50m : land110m) as unknown as Topology);
    cache.set(resolution, idx);
  }
  return idx;
}

/**
 * A land mask from Natural Earth land (world-atlas land-50m or land-110m via topojson-client): point in polygon by
 * crossing parity in longitude–latitude (edges are at most a few km, so this agrees with d3-geo geoContains on the
 * sphere; a test checks that), over a 1° edge index so a query costs a few edges, not the whole coastline.
 */
export function landMask(options: LandMaskOptions = {}): LandMask {
  const idx = indexFor(options.resolution ?? '50m');
  const tolerance = options.coastToleranceKm ?? 10;
  function insideLand(lonIn: number, lat: number): boolean {
    if (!Number.isFinite(lonIn) || !Number.isFinite(lat)) return false;
    const lon = normaliseLon(lonIn);
    const i = col(lon), j = row(lat);
    const c = j * NX + i;
    if (!idx.cellSegs.has(c)) return idx.state[c] === 1;
    // Cast a ray west from the point to the nearest edge-free cell of known state, counting crossings.
    const w = idx.westFree[c];
    let parity = w >= 0 ? idx.state[w] : 0;
    for (let ii = w >= 0 ? (w % NX) + 1 : 0; ii <= i; ii++) {
      const bucket = idx.cellSegs.get(j * NX + ii);
      if (!bucket) continue;
      for (const s of bucket) {
        const x = crossing(idx.segs, s, lat);
        if (!Number.isNaN(x) && x < lon && col(x) === ii) parity ^= 1;
      }
    }
    return parity === 1;
  }

  function distanceToCoastKm(lonIn: number, lat: number, maxKm: number): number {
    const lon = normaliseLon(lonIn);
    const kmPerDeg = (EARTH_RADIUS_KM * Math.PI) / 180;
    const cosLat = Math.max(Math.cos((lat * Math.PI) / 180), 1e-6);
    const dLat = maxKm / kmPerDeg;
    const dLon = Math.min(180, maxKm / (kmPerDeg * cosLat));
    const j0 = Math.max(0, Math.floor(lat - dLat + 90)), j1 = Math.min(NY - 1, Math.floor(lat + dLat + 90));
    const iLo = Math.floor(lon - dLon + 180), iHi = Math.floor(lon + dLon + 180);
    let best = Infinity;
    const seen = new Set<number>();
    for (let j = j0; j <= j1; j++) {
      for (let ii = iLo; ii <= Math.min(iHi, iLo + NX - 1); ii++) {
        const bucket = idx.coastSegs.get(j * NX + (((ii % NX) + NX) % NX));
        if (!bucket) continue;
        for (const s of bucket) {
          if (seen.has(s)) continue;
          seen.add(s);
          const k = s * 4;
          const ax = normaliseLon(idx.segs[k] - lon) * cosLat * kmPerDeg, ay = (idx.segs[k + 1] - lat) * kmPerDeg;
          const bx = normaliseLon(idx.segs[k + 2] - lon) * cosLat * kmPerDeg, by = (idx.segs[k + 3] - lat) * kmPerDeg;
          const dx = bx - ax, dy = by - ay;
          const len2 = dx * dx + dy * dy;
          const t = len2 > 0 ? Math.min(1, Math.max(0, -(ax * dx + ay * dy) / len2)) : 0;
          best = Math.min(best, Math.hypot(ax + t * dx, ay + t * dy));
        }
      }
    }
    return best <= maxKm ? best : Infinity;
  }

  return {
    insideLand,
    distanceToCoastKm,
    isOnLand(lon: number, lat: number): boolean {
      if (!insideLand(lon, lat)) return false;
      return tolerance <= 0 || distanceToCoastKm(lon, lat, tolerance) > tolerance;
    },
  };
}
