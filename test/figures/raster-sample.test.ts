import { describe, expect, it } from 'vitest';
import { gridLevel, sampleBilinear, sampleNearest, type LatticeField } from '../../lib/figures/raster-sample.js';
import type { Grid } from '../../lib/types.js';

const field: LatticeField = {
  lon: Float64Array.of(-170, -10, 10, 170),
  lat: Float64Array.of(-10, 10),
  values: Float32Array.of(1, 2, 3, 4, 5, 6, 7, Number.NaN),
  periodicLon: true,
};

describe('sampleNearest', () => {
  it('sampleNearest(field, lon, lat) picks the nearest node', () => {
    expect(sampleNearest(field, -12, -9)).toBe(2);
    expect(sampleNearest(field, 12, 9)).toBe(7);
  });
  it('sampleNearest wraps across the dateline on a periodic lattice', () => {
    // 179°E is 9° from 170°E and 11° from −170°E.
    expect(sampleNearest(field, 179, -10)).toBe(4);
    expect(sampleNearest(field, -179, -10)).toBe(1);
  });
  it('sampleNearest is NaN beyond half a cell outside the latitudes', () => {
    expect(sampleNearest(field, 0, 40)).toBeNaN();
    expect(sampleNearest(field, 0, 20)).not.toBeNaN();
  });
});

describe('sampleBilinear', () => {
  it('sampleBilinear(field, lon, lat) interpolates between the four nodes', () => {
    // Midway between −10 and 10°E at the equator: mean of 2, 3, 6, 7.
    expect(sampleBilinear(field, 0, 0)).toBeCloseTo(4.5, 6);
  });
  it('sampleBilinear crosses the dateline: 180° is midway between 170°E and −170°E', () => {
    const full = { ...field, values: Float32Array.of(1, 2, 3, 4, 5, 6, 7, 8) };
    // Nodes 170°E (4, 8) and −170°E (1, 5) at ±10°N: the mean at the equator is 4.5.
    expect(sampleBilinear(full, 180, 0)).toBeCloseTo(4.5, 6);
    expect(sampleBilinear(full, -180, 0)).toBeCloseTo(4.5, 6);
  });
  it('sampleBilinear is NaN next to a missing node', () => {
    expect(sampleBilinear(field, 175, 0)).toBeNaN();
  });
});

describe('gridLevel', () => {
  const grid: Grid = {
    quantity: 'dissolved_fe', units: 'nmol/kg', lon: Float64Array.of(0, 1), lat: Float64Array.of(0),
    depth: Float64Array.of(10, 50, 200), timeKind: 'month', time: Float64Array.of(1, 2),
    // [t][z][y][x]
    values: Float32Array.of(1, 2, 3, Number.NaN, 5, 6, 10, 20, 30, 40, 50, 60),
    periodicLon: false, source: 't.nc', variable: 'fe',
  };
  it('gridLevel(grid, {depthIndex, timeIndex}) slices one level', () => {
    expect(Array.from(gridLevel(grid, { depthIndex: 1, timeIndex: 1 }).values)).toEqual([30, 40]);
  });
  it('gridLevel(grid, {layer}) averages levels inside the layer, skipping NaN', () => {
    expect(Array.from(gridLevel(grid, { layer: [0, 60] }).values)).toEqual([2, 2]);
  });
});
