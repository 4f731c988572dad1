import { geoArea } from 'd3-geo';
import type { Position } from 'geojson';

/**
 * Rings rewound to d3-geo's convention (exterior clockwise, holes counter-clockwise on a north-up map;
 * RFC 7946 §3.1.6 prescribes the opposite). An exterior ring whose d3 area exceeds a hemisphere (2π sr)
 * is taken to be wound the other way and reversed; holes likewise the other way round.
 */
export function rewindPolygon(rings: readonly Position[][]): Position[][] {
  return rings.map((ring, k) => {
    const copy = ring.map((p) => [p[0], p[1]]);
    const area = geoArea({ type: 'Polygon', coordinates: [copy] });
    const isHole = k > 0;
    const flip = isHole ? area < 2 * Math.PI : area > 2 * Math.PI;
    return flip ? copy.reverse() : copy;
  });
}
