// Inserts points along lon/lat edges so that d3-geo, which draws great-circle arcs, draws them as rhumb lines.
import type { GeoPermissibleObjects } from 'd3-geo';
import type { Position } from 'geojson';

function densifyLine(line: Position[], stepDeg: number): Position[] {
  const out: Position[] = [];
  for (let i = 0; i < line.length; i++) {
    const [x1, y1] = line[i];
    if (i > 0) {
      const [x0, y0] = line[i - 1];
      const n = Math.ceil(Math.max(Math.abs(x1 - x0), Math.abs(y1 - y0)) / stepDeg);
      for (let k = 1; k < n; k++) out.push([x0 + ((x1 - x0) * k) / n, y0 + ((y1 - y0) * k) / n]);
    }
    out.push([x1, y1]);
  }
  return out;
}

/** A copy of a Polygon / MultiPolygon / LineString / MultiLineString with edges split every `stepDeg` degrees; other objects unchanged. */
export function densify<T extends GeoPermissibleObjects>(object: T, stepDeg = 1): T {
  const o = object as unknown as { type: string; coordinates?: unknown };
  switch (o.type) {
    case 'LineString':
      return { ...o, coordinates: densifyLine(o.coordinates as Position[], stepDeg) } as unknown as T;
    case 'MultiLineString':
    case 'Polygon':
      return { ...o, coordinates: (o.coordinates as Position[][]).map((l) => densifyLine(l, stepDeg)) } as unknown as T;
    case 'MultiPolygon':
      return { ...o, coordinates: (o.coordinates as Position[][][]).map((p) => p.map((l) => densifyLine(l, stepDeg))) } as unknown as T;
    default:
      return object;
  }
}
