import { geoArea } from 'd3-geo';
import { describe, expect, it } from 'vitest';
import { latLonBoxes } from '../../../lib/geo/regions/lat-lon-boxes.js';
import { assignRegion } from '../../../lib/geo/regions/region-index.js';

describe('latLonBoxes', () => {
  it('latLonBoxes(5) makes 2592 boxes with readable unique ids', () => {
    const boxes = latLonBoxes(5);
    expect(boxes.features.length).toBe(36 * 72);
    expect(new Set(boxes.features.map((f) => f.id)).size).toBe(boxes.features.length);
    expect(boxes.features[0].id).toBe('box-lat-90s_85s-lon-180w_175w');
    expect(boxes.features[0].properties.name).toBe('90°S–85°S, 180°W–175°W');
  });

  it('latLonBoxes(10) tiles the sphere: areas sum to 4π', () => {
    // Area of the unit sphere, 4π sr (common knowledge).
    const total = latLonBoxes(10).features.reduce((s, f) => s + geoArea(f), 0);
    expect(total).toBeCloseTo(4 * Math.PI, 9);
  });

  it('assignRegion(latLonBoxes(5), lon, lat) finds the box, edges going north and east', () => {
    const boxes = latLonBoxes(5);
    expect(assignRegion(boxes, -167.5, -42)).toBe('box-lat-45s_40s-lon-170w_165w');
    expect(assignRegion(boxes, -167.3, -40)).toBe('box-lat-40s_35s-lon-170w_165w');
    expect(assignRegion(boxes, -165, 40)).toBe('box-lat-40n_45n-lon-165w_160w');
    expect(assignRegion(boxes, 0, 0)).toBe('box-lat-0_5n-lon-0_5e');
    expect(assignRegion(boxes, 180, 89)).toBe('box-lat-85n_90n-lon-180w_175w');
    expect(assignRegion(boxes, 12, 90)).toBe('box-lat-85n_90n-lon-10e_15e');
    expect(assignRegion(boxes, NaN, 0)).toBeNull();
  });

  it('latLonBoxes(2.5) writes the decimal point as p', () => {
    expect(assignRegion(latLonBoxes(2.5), 1, 3)).toBe('box-lat-2p5n_5n-lon-0_2p5e');
  });

  it('latLonBoxes(size) refuses a size that does not tile the globe', () => {
    expect(() => latLonBoxes(7)).toThrow('lat-lon box size must divide 180 evenly and be at most 90 degrees, got 7');
    expect(() => latLonBoxes(0)).toThrow('got 0');
  });
});
