import { describe, expect, it } from 'vitest';
import { haversineKm } from '../../lib/geo/haversine.js';

describe('haversineKm', () => {
  it('haversineKm(0, 0, 0, 1) is one degree of arc on the 6371.0088 km sphere', () => {
    // REFERENCE_VALUES.md, "Sphere": Haversine (0,0)–(0,1°) = 111.19508023353291 km (mean Earth radius 6371.0088 km, IUGG).
    expect(haversineKm(0, 0, 0, 1)).toBeCloseTo(111.19508023353291, 9);
  });

  it('haversineKm(179.5, 0, -179.5, 0) goes the short way across the dateline', () => {
    // Same one degree of arc along the equator (REFERENCE_VALUES.md, "Sphere").
    expect(haversineKm(179.5, 0, -179.5, 0)).toBeCloseTo(111.19508023353291, 9);
    expect(haversineKm(10, 20, 30, 40)).toBe(haversineKm(30, 40, 10, 20));
  });
});
