// Polygon winding for d3-geo: a ring list covering more than a hemisphere is taken to be wound the wrong way.
import { geoArea } from 'd3-geo';
import type { MultiPolygon, Polygon, Position } from 'geojson';

function rewindRings(rings: Position[][]): Position[][] {
  // Spherical polygons: d3-geo reads clockwise exteriors as the small side; region files often use the planar (RFC 7946) opposite.
  return geoArea({ type: 'Polygon', coordinates: rings }) > 2 * Math.PI ? rings.map((r) => r.slice().reverse()) : rings;
}

/** A copy of a Polygon / MultiPolygon whose polygons each cover less than a hemisphere (d3-geo winding). */
export function rewind<T extends Polygon | MultiPolygon>(geometry: T): T {
  if (geometry.type === 'Polygon') return { ...geometry, coordinates: rewindRings(geometry.coordinates) };
  return { ...geometry, coordinates: (geometry as MultiPolygon).coordinates.map(rewindRings) } as T;
}
