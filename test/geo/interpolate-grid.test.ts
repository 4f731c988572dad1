import { describe, expect, it } from 'vitest';
import type { Grid } from '../../lib/types.js';
import { haversineKm } from '../../lib/geo/haversine.js';
import { sampleGrid } from '../../lib/geo/interpolate-grid.js';

function grid(lon: number[], lat: number[], depth: number[], values: number[], extra: Partial<Grid> = {}): Grid {
  return {
    quantity: 'dissolved_fe',
    units: 'nmol/kg',
    lon: Float64Array.from(lon),
    lat: Float64Array.from(lat),
    depth: Float64Array.from(depth),
    timeKind: 'none',
    time: Float64Array.of(0),
    values: Float32Array.from(values),
    periodicLon: false,
    source: 'test.nc',
    variable: 'dfe',
    ...extra,
  };
}

const far = { maxDistanceKm: 1e4 };

describe('sampleGrid', () => {
  // Corners (lon, lat): (0,0)=1, (10,0)=2, (0,10)=3, (10,10)=5.
  const square = grid([0, 10], [0, 10], [0], [1, 2, 3, 5]);

  it('sampleGrid(grid, point) is bilinear in lon/lat', () => {
    // Hand-computed: wx = 0.25, wy = 0.5 → 0.375·1 + 0.125·2 + 0.375·3 + 0.125·5 = 2.375.
    const s = sampleGrid(square, { lon: 2.5, lat: 5, depth: 0 }, far)!;
    expect(s.value).toBeCloseTo(2.375, 6);
    const corners = [haversineKm(2.5, 5, 0, 0), haversineKm(2.5, 5, 10, 0), haversineKm(2.5, 5, 0, 10), haversineKm(2.5, 5, 10, 10)];
    expect(s.distanceKm).toBe(Math.min(...corners));
    expect(sampleGrid(square, { lon: 10, lat: 10, depth: 0 }, far)).toEqual({ value: 5, distanceKm: 0 });
  });

  it('sampleGrid(grid with a missing corner) renormalises the weights over the valid corners', () => {
    const coast = grid([0, 10], [0, 10], [0], [1, 2, 3, NaN]);
    // Hand-computed: (0.375·1 + 0.125·2 + 0.375·3) / 0.875 = 2.
    expect(sampleGrid(coast, { lon: 2.5, lat: 5, depth: 0 }, far)!.value).toBeCloseTo(2, 6);
  });

  it('sampleGrid(periodic grid, point) interpolates across the dateline', () => {
    const lon = Array.from({ length: 18 }, (_, i) => -180 + 20 * i);
    const g = grid(lon, [0, 1], [0], [...lon.map((_, i) => i), ...lon.map((_, i) => i)], { periodicLon: true });
    // Between lon 160 (x = 17) and 180 ≡ −180 (x = 0): halfway → 0.5·17 + 0.5·0 (hand-computed).
    expect(sampleGrid(g, { lon: 170, lat: 0.5, depth: 0 }, far)!.value).toBeCloseTo(8.5, 6);
    expect(sampleGrid(g, { lon: 175 + 360, lat: 0.5, depth: 0 }, far)!.value).toBeCloseTo(4.25, 6);
    expect(sampleGrid(g, { lon: -175, lat: 0.5, depth: 0 }, far)!.value).toBeCloseTo(0.25, 6);
    // The same point on a non-periodic copy has no bracketing cell; the nearest node (lon 160) is used.
    const regional = { ...g, periodicLon: false };
    expect(sampleGrid(regional, { lon: 170, lat: 0, depth: 0 }, far)).toEqual({ value: 17, distanceKm: haversineKm(170, 0, 160, 0) });
  });

  it('sampleGrid(grid, point near the pole) clamps to the last row within one spacing', () => {
    const lon = Array.from({ length: 36 }, (_, i) => -180 + 10 * i);
    const g = grid(lon, [85, 87.5], [0], [...lon.map((_, i) => i), ...lon.map((_, i) => 100 + i)], { periodicLon: true });
    // lon 5 lies halfway between x = 18 (0°) and x = 19 (10°) on the 87.5° row: 100 + 18.5.
    expect(sampleGrid(g, { lon: 5, lat: 89.9, depth: 0 }, far)!.value).toBeCloseTo(118.5, 5);
  });

  it('sampleGrid(grid, point) is linear in depth, clamps above the first level, stops below the deepest', () => {
    const g = grid([0, 1], [0, 1], [0, 100, 200], [10, 10, 10, 10, 20, 20, 20, 20, 40, 40, 40, 40]);
    const at = (depth: number, depthToleranceM?: number) => sampleGrid(g, { lon: 0.5, lat: 0.5, depth }, { maxDistanceKm: 100, depthToleranceM })?.value ?? null;
    expect(at(150)).toBeCloseTo(30, 6); // hand-computed: halfway between 20 and 40
    expect(at(-5)).toBe(10);
    expect(at(250)).toBe(40); // within one level spacing (100 m) below the deepest level
    expect(at(301)).toBeNull();
    expect(at(201, 0)).toBeNull();
    const seafloor = grid([0, 1], [0, 1], [0, 100, 200], [10, 10, 10, 10, 20, 20, 20, 20, NaN, NaN, NaN, NaN]);
    expect(sampleGrid(seafloor, { lon: 0.5, lat: 0.5, depth: 150 }, far)!.value).toBe(20);
  });

  it('sampleGrid(climatology, point) takes the point month, or the month of timeMs', () => {
    const g = grid([0, 1], [0, 1], [0], Array.from({ length: 48 }, (_, i) => Math.floor(i / 4) + 1), {
      timeKind: 'month',
      time: Float64Array.from({ length: 12 }, (_, i) => i + 1),
    });
    expect(sampleGrid(g, { lon: 0.5, lat: 0.5, depth: 0, month: 7 }, far)!.value).toBe(7);
    expect(sampleGrid(g, { lon: 0.5, lat: 0.5, depth: 0, timeMs: Date.UTC(2011, 2, 31, 23) }, far)!.value).toBe(3);
    expect(() => sampleGrid(g, { lon: 0.5, lat: 0.5, depth: 0 }, far)).toThrow('test.nc: grid dfe is a monthly climatology; the sample point needs month (1..12) or timeMs');
    const series = { ...g, timeKind: 'time' as const, time: Float64Array.from({ length: 12 }, (_, i) => Date.UTC(2000, i, 1)) };
    expect(sampleGrid(series, { lon: 0.5, lat: 0.5, depth: 0, timeMs: Date.UTC(2000, 4, 20) }, far)!.value).toBe(6);
    expect(() => sampleGrid(series, { lon: 0.5, lat: 0.5, depth: 0, month: 1 }, far)).toThrow('test.nc: grid dfe has a time axis; the sample point needs timeMs');
  });

  it('sampleGrid(grid with no valid corner) returns the nearest valid node only within maxDistanceKm', () => {
    const g = grid([0, 1, 2, 3], [0, 1], [0], [NaN, NaN, NaN, 9, NaN, NaN, NaN, NaN]);
    const d = haversineKm(0.5, 0.5, 3, 0);
    expect(d).toBeGreaterThan(280);
    expect(sampleGrid(g, { lon: 0.5, lat: 0.5, depth: 0 }, { maxDistanceKm: 300 })).toEqual({ value: 9, distanceKm: d });
    expect(sampleGrid(g, { lon: 0.5, lat: 0.5, depth: 0 }, { maxDistanceKm: 250 })).toBeNull();
  });

  // Speed is measured by `npm run bench`, not by timed unit tests.
  it('sampleGrid(1°×1°×33 grid with scattered gaps) answers almost every random point', () => {
    const lon = Array.from({ length: 360 }, (_, i) => -179.5 + i);
    const lat = Array.from({ length: 180 }, (_, i) => -89.5 + i);
    const depth = Array.from({ length: 33 }, (_, i) => i * 150);
    const values = Float32Array.from({ length: 360 * 180 * 33 }, (_, i) => (i % 7 === 0 ? NaN : i % 1000));
    const g: Grid = { ...grid([0], [0], [0], []), lon: Float64Array.from(lon), lat: Float64Array.from(lat), depth: Float64Array.from(depth), values, periodicLon: true };
    let seed = 12345;
    const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
    let found = 0;
    for (let i = 0; i < 10_000; i++) if (sampleGrid(g, { lon: next() * 360 - 180, lat: next() * 180 - 90, depth: next() * 4800 }, { maxDistanceKm: 200 })) found++;
    expect(found).toBeGreaterThan(9_900);
  });
});
