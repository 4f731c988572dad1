import { describe, expect, it } from 'vitest';
import { geoAzimuthalEqualArea, geoEqualEarth, geoPath } from 'd3-geo';
import { makeProjection } from '../../../lib/figures/maps/projection.js';

const extent: [[number, number], [number, number]] = [[0, 0], [600, 400]];

describe('makeProjection', () => {
  for (const [kind, point] of [['equal-earth', [-150, 35]], ['south-polar', [70, -62]], ['north-polar', [-20, 75]]] as const) {
    it(`makeProjection('${kind}') projects and inverts back within 1e-9 degrees`, () => {
      const { projection } = makeProjection(kind, { extent });
      const xy = projection([point[0], point[1]]);
      expect(xy).not.toBeNull();
      const back = projection.invert!(xy!)!;
      expect(Math.abs(back[0] - point[0])).toBeLessThan(1e-9);
      expect(Math.abs(back[1] - point[1])).toBeLessThan(1e-9);
    });
  }

  it("makeProjection('equal-earth') matches d3-geo's geoEqualEarth fitted the same way", () => {
    const ref = geoEqualEarth().fitExtent(extent, { type: 'Sphere' });
    const ours = makeProjection('equal-earth', { extent }).projection;
    const a = ours([12.5, -33])!;
    const b = ref([12.5, -33])!;
    expect(a[0]).toBeCloseTo(b[0], 9);
    expect(a[1]).toBeCloseTo(b[1], 9);
  });

  it("makeProjection('south-polar') puts the South Pole at the centre of the extent", () => {
    const { projection } = makeProjection('south-polar', { extent: [[0, 0], [400, 400]] });
    const p = projection([0, -90])!;
    expect(p[0]).toBeCloseTo(200, 6);
    expect(p[1]).toBeCloseTo(200, 6);
    // Outside the 40° boundary the clipped projection draws nothing.
    expect(geoPath(projection)({ type: 'Point', coordinates: [0, -20] })).toBeNull();
    expect(geoAzimuthalEqualArea().rotate([0, 90])([0, -90])).toEqual([480, 250]);
  });

  // Sphere cell area R²·Δλ·(sin φ₂ − sin φ₁) (REFERENCE_VALUES.md "Sphere"); R² and Δλ cancel in a ratio.
  const band = (lat0: number) => Math.sin(((lat0 + 10) * Math.PI) / 180) - Math.sin((lat0 * Math.PI) / 180);
  const cell = (lat0: number) => ({
    type: 'Polygon' as const,
    // Clockwise (d3-geo's small-side winding): up the west edge, east along the top, down, west along the bottom,
    // with points every degree so edges follow parallels.
    coordinates: [[
      [0, lat0],
      ...Array.from({ length: 11 }, (_, i) => [i, lat0 + 10]),
      ...Array.from({ length: 11 }, (_, i) => [10 - i, lat0]),
    ]],
  });
  for (const [kind, low] of [['equal-earth', 0], ['north-polar', 10], ['south-polar', -70]] as const) {
    const high = kind === 'south-polar' ? -20 : 60;
    it(`makeProjection('${kind}') is equal-area: 10°×10° cells at ${low}° and ${high}° keep their spherical area ratio within 1 %`, () => {
      const path = geoPath(makeProjection(kind, { extent, boundaryLat: 5 }).projection);
      const sphereRatio = band(low) / band(high);
      // 0–10°N vs 60–70°N: 0.173648 / 0.073667 = 2.3572 (sin 10°, sin 70° − sin 60°).
      if (kind === 'equal-earth') expect(sphereRatio).toBeCloseTo(2.3572, 3);
      const ratio = path.area(cell(low)) / path.area(cell(high));
      expect(Math.abs(ratio / sphereRatio - 1)).toBeLessThan(0.01);
    });
  }
});
