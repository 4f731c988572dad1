import { describe, expect, it } from 'vitest';
import { biovolumeFromShape, parseCellShape } from '../../lib/quotas/index.js';

// Hand-computed from the Hillebrand et al. (1999) J. Phycol. 35:403 formulas, written out beside each case.
describe('biovolumeFromShape(shape, dims)', () => {
  it('sphere: π/6·d³ with d = length', () => {
    // π/6 · 2³ = 4π/3 = 4.18879020478639
    expect(biovolumeFromShape('sphere', { length: 2 })).toBeCloseTo(4.18879020478639, 12);
  });
  it('prolate spheroid: π/6·d²·h with d = width, h = length', () => {
    // π/6 · 2² · 4 = 8π/3 = 8.377580409572781
    expect(biovolumeFromShape('prolate-spheroid', { length: 4, width: 2 })).toBeCloseTo(8.377580409572781, 12);
  });
  it('cylinder: π/4·d²·h', () => {
    // π/4 · 2² · 4 = 4π = 12.566370614359172
    expect(biovolumeFromShape('cylinder', { length: 4, width: 2 })).toBeCloseTo(12.566370614359172, 12);
  });
  it('capsule (cylinder with two half spheres): π·d²·(h/4 − d/12), h the total length', () => {
    // π·4·(1 − 1/6) = 10π/3 = 10.471975511965976; check: cylinder of length 2 (2π) + sphere of diameter 2 (4π/3).
    expect(biovolumeFromShape('capsule', { length: 4, width: 2 })).toBeCloseTo(10.471975511965976, 12);
  });
  it('ellipsoid: π/6·a·b·c', () => {
    // π/6 · 4 · 2 · 3 = 4π = 12.566370614359172
    expect(biovolumeFromShape('ellipsoid', { length: 4, width: 2, height: 3 })).toBeCloseTo(12.566370614359172, 12);
  });
  it('cone: π/12·d²·h', () => {
    // π/12 · 2² · 3 = π
    expect(biovolumeFromShape('cone', { length: 3, width: 2 })).toBeCloseTo(Math.PI, 12);
  });
  it('returns NaN when a needed dimension is missing or a capsule is shorter than wide', () => {
    expect(biovolumeFromShape('cylinder', { length: 4 })).toBeNaN();
    expect(biovolumeFromShape('ellipsoid', { length: 4, width: 2 })).toBeNaN();
    expect(biovolumeFromShape('capsule', { length: 1, width: 2 })).toBeNaN();
    expect(biovolumeFromShape('sphere', { length: -1 })).toBeNaN();
  });
});

describe('parseCellShape(text)', () => {
  it('reads names case-insensitively with spaces or underscores', () => {
    expect(parseCellShape(' Prolate Spheroid ')).toBe('prolate-spheroid');
    expect(parseCellShape('cylinder_with_two_half_spheres')).toBe('capsule');
    expect(parseCellShape('CONE')).toBe('cone');
    expect(parseCellShape('rhomboid')).toBeNull();
  });
});
