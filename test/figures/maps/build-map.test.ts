import { describe, expect, it } from 'vitest';
import { geoArea, geoContains } from 'd3-geo';
import { buildMap } from '../../../lib/figures/maps/build-map.js';
import { thresholdOutline } from '../../../lib/figures/maps/threshold-outline.js';
import { feStarGrid } from '../../../lib/figures/maps/fe-star.js';
import type { LatticeField } from '../../../lib/figures/raster-sample.js';
import type { Grid } from '../../../lib/types.js';

const lon = Float64Array.from({ length: 36 }, (_, i) => -175 + 10 * i);
const lat = Float64Array.from({ length: 18 }, (_, j) => -85 + 10 * j);
const nitrate = new Float32Array(36 * 18).map((_, k) => (lat[Math.floor(k / 36)] < -40 ? 20 : 1));
const field: LatticeField = { lon, lat, values: nitrate, periodicLon: true };

const layers = {
  raster: { field, title: 'nitrate (µmol kg⁻¹)' },
  stations: [{ lon: 20, lat: -50, cruise: 'B' }, { lon: -60, lat: -60, cruise: 'A' }],
  regions: { shapes: [{ id: 'r1', geometry: { type: 'Polygon' as const, coordinates: [[[0, -60], [0, -50], [30, -50], [30, -60], [0, -60]]] }, residual: -0.2, flagged: true, label: 'Box <1>' }] },
};

describe('buildMap', () => {
  it('buildMap(layers, options) twice gives identical SVG bytes', () => {
    const a = buildMap(layers, { projection: 'south-polar', widthPx: 160, pixelRatio: 1 });
    const b = buildMap(layers, { projection: 'south-polar', widthPx: 160, pixelRatio: 1 });
    expect(a.svg).toBe(b.svg);
  });

  it('buildMap draws one raster <image>, land, graticule, one circle per station and an escaped flagged label', () => {
    const { svg } = buildMap(layers, { projection: 'equal-earth', widthPx: 200, pixelRatio: 1, title: 'Nitrate' });
    expect(svg.match(/<image /g)?.length).toBe(1);
    expect(svg).toContain('class="land"');
    expect(svg).toContain('class="graticule"');
    expect(svg.match(/<circle /g)?.length).toBe(2 + 2); // two stations, two legend swatches
    expect(svg).toContain('>Box &lt;1&gt;</text>');
    expect(svg).not.toMatch(/ d="[^"]*\d\.\d{3}/);
  });
});

describe('thresholdOutline', () => {
  it('thresholdOutline(nitrate, 4) encloses the high-nitrate south and not the rest', () => {
    const { polygons, lines } = thresholdOutline(field, 4);
    expect(geoContains(polygons, [0, -70])).toBe(true);
    expect(geoContains(polygons, [0, 0])).toBe(false);
    // The band south of about 40°S covers (1 − sin 40°)/2 ≈ 18 % of the sphere (area 4π).
    expect(geoArea(polygons) / (4 * Math.PI)).toBeGreaterThan(0.12);
    expect(geoArea(polygons) / (4 * Math.PI)).toBeLessThan(0.25);
    // The drawn line is the contour near 40°S only: no segment along the lattice frame at 85°S.
    for (const line of lines.coordinates) for (const [, y] of line) expect(y).toBeGreaterThan(-60);
  });
});

describe('feStarGrid', () => {
  const base = { quantity: 'x', units: 'x', lon: Float64Array.of(0), lat: Float64Array.of(0), depth: Float64Array.of(0), timeKind: 'none' as const, time: Float64Array.of(0), periodicLon: false, source: 'a', variable: 'v' };
  it('feStarGrid(dfe, po4, R) is dFe − R·PO₄ (Parekh et al. 2005)', () => {
    const dfe: Grid = { ...base, values: Float32Array.of(0.5) };
    const po4: Grid = { ...base, values: Float32Array.of(1.5) };
    // 0.5 nmol/kg − 0.47 mmol/mol × 1.5 µmol/kg = −0.205 nmol/kg
    expect(feStarGrid(dfe, po4, 0.47).values[0]).toBeCloseTo(-0.205, 6);
  });
  it('feStarGrid throws on different lattices', () => {
    const dfe: Grid = { ...base, values: Float32Array.of(0.5) };
    const po4: Grid = { ...base, lon: Float64Array.of(1), values: Float32Array.of(1.5) };
    expect(() => feStarGrid(dfe, po4, 0.47)).toThrow(/different grids/);
  });
});
