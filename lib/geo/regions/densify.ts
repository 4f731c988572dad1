// Insert points along lon/lat segments so great-circle edges (d3-geo) follow the straight lon/lat line.

/** A [longitude, latitude] pair in degrees. */
export type LonLat = [number, number];

/** Points of a polyline with at most stepDeg between neighbours, vertices kept (linear in lon/lat). */
export function densifyPath(vertices: readonly LonLat[], stepDeg: number): LonLat[] {
  const out: LonLat[] = [[vertices[0][0], vertices[0][1]]];
  for (let k = 1; k < vertices.length; k++) {
    const inner = densifySegment(vertices[k - 1], vertices[k], stepDeg);
    out.push(...inner, [vertices[k][0], vertices[k][1]]);
  }
  return out;
}

// Interior points only; computed from the lexicographically smaller end so a segment shared by two
// regions (walked in opposite directions) gets bit-identical points and the regions tile exactly.
function densifySegment(a: LonLat, b: LonLat, stepDeg: number): LonLat[] {
  const swap = a[0] > b[0] || (a[0] === b[0] && a[1] > b[1]);
  const [p, q] = swap ? [b, a] : [a, b];
  const n = Math.ceil(Math.max(Math.abs(q[0] - p[0]), Math.abs(q[1] - p[1])) / stepDeg);
  const pts: LonLat[] = [];
  for (let i = 1; i < n; i++) pts.push([p[0] + ((q[0] - p[0]) * i) / n, p[1] + ((q[1] - p[1]) * i) / n]);
  return swap ? pts.reverse() : pts;
}

/** Longitude folded into (−180, 180]; 180 stays 180 so rings ending on the antimeridian stay closed. */
export function wrapLon(lon: number): number {
  return lon > 180 ? lon - 360 : lon < -180 ? lon + 360 : lon;
}
