import { describe, expect, it } from 'vitest';
import { geoContains } from 'd3-geo';
import { randomLcg } from 'd3-random';
import { feature } from 'topojson-client';
import type { GeometryCollection, Topology } from 'topojson-specification';
import land50m from 'world-atlas/land-50m.json' with { type: 'json' };
import { landMask } from '../../lib/geo/land.js';

describe('landMask()', () => {
  const mask = landMask();

  it('isOnLand(134, -25) is true in central Australia', () => {
    // Common knowledge: 25°S 134°E lies in the interior of Australia.
    expect(mask.isOnLand(134, -25)).toBe(true);
  });

  it('isOnLand(-160, 0) is false in the central Pacific', () => {
    // Common knowledge: 0°N 160°W is open Pacific Ocean.
    expect(mask.isOnLand(-160, 0)).toBe(false);
  });

  it('isOnLand knows interior Siberia, Antarctica and the open Atlantic and Arctic (common knowledge)', () => {
    expect(mask.isOnLand(100, 60)).toBe(true);
    expect(mask.isOnLand(0, -80)).toBe(true);
    expect(mask.isOnLand(-30, 30)).toBe(false);
    expect(mask.isOnLand(0, 89)).toBe(false);
  });

  it('isOnLand(20, -30) is on land while the swapped (-30, 20) is at sea', () => {
    // Common knowledge: 30°S 20°E is inland South Africa; 20°N 30°W is the open Atlantic.
    expect(mask.isOnLand(20, -30)).toBe(true);
    expect(mask.isOnLand(-30, 20)).toBe(false);
  });

  it('isOnLand accepts longitudes outside [-180, 180) (134 + 360 is still Australia)', () => {
    expect(mask.isOnLand(134 + 360, -25)).toBe(true);
    expect(mask.isOnLand(134 - 360, -25)).toBe(true);
  });

  it('isOnLand is false for NaN positions', () => {
    expect(mask.isOnLand(NaN, 10)).toBe(false);
    expect(mask.insideLand(10, NaN)).toBe(false);
  });

  it('a point inside land within the coast tolerance counts as at sea', () => {
    // San Francisco, near the shore: inside the Natural Earth polygon but within 10 km of its coastline.
    const [lon, lat] = [-122.4, 37.77];
    expect(mask.insideLand(lon, lat)).toBe(true);
    expect(mask.distanceToCoastKm(lon, lat, 10)).toBeLessThan(10);
    expect(mask.isOnLand(lon, lat)).toBe(false);
    expect(landMask({ coastToleranceKm: 0 }).isOnLand(lon, lat)).toBe(true);
  });

  it('distanceToCoastKm is Infinity far from any coast', () => {
    expect(mask.distanceToCoastKm(134, -25, 50)).toBe(Infinity);
  });

  it('insideLand agrees with d3-geo geoContains on seeded random points, across the dateline and the poles', () => {
    const land = feature(land50m as unknown as Topology, (land50m as unknown as Topology).objects.land as GeometryCollection);
    const random = randomLcg(42);
    const points: [number, number][] = [[178, -17.8], [-179.5, 67], [179.5, 67], [-179.9, -85], [179.9, -85], [-70, -85]];
    for (let i = 0; i < 80; i++) points.push([-180 + 360 * random(), -90 + 180 * random()]);
    for (const p of points) expect(mask.insideLand(p[0], p[1]), `${p}`).toBe(geoContains(land, p));
  });

  it('landMask({ resolution: "110m" }) gives the same answers on the well-known points', () => {
    const coarse = landMask({ resolution: '110m' });
    expect(coarse.isOnLand(134, -25)).toBe(true);
    expect(coarse.isOnLand(-160, 0)).toBe(false);
  });

});
