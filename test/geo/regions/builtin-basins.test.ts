import { geoArea, geoContains } from 'd3-geo';
import { randomLcg, randomUniform } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { builtinBasinBoundaries, builtinBasinRules, builtinBasins } from '../../../lib/geo/regions/builtin-basins.js';
import { regionIndex } from '../../../lib/geo/regions/region-index.js';

const basins = builtinBasins();
const index = regionIndex(basins);

describe('builtinBasins', () => {
  it('builtinBasins() lists seven basins with stable ids in rule order', () => {
    expect(basins.features.map((f) => f.id)).toEqual(['arctic', 'north-atlantic', 'south-atlantic', 'indian', 'north-pacific', 'south-pacific', 'southern']);
    expect(basins.features.map((f) => f.properties.name)).toEqual(builtinBasinRules.map((r) => r.name));
    expect(builtinBasinBoundaries.length).toBeGreaterThan(3);
  });

  it('builtinBasins() tiles the sphere: areas sum to 4π', () => {
    // Area of the unit sphere, 4π sr (common knowledge).
    const total = basins.features.reduce((s, f) => s + geoArea(f), 0);
    expect(total).toBeCloseTo(4 * Math.PI, 9);
  });

  it('builtinBasins() puts every random point in exactly one basin', () => {
    const rnd = randomUniform.source(randomLcg(0.42))(0, 1);
    for (let k = 0; k < 300; k++) {
      const lon = rnd() * 360 - 180;
      const lat = (Math.asin(2 * rnd() - 1) * 180) / Math.PI;
      const containing = basins.features.filter((f) => geoContains(f, [lon, lat]));
      expect(containing.length).toBe(1);
      expect(index.assign(lon, lat)).toBe(containing[0].id);
    }
  });

  it('assignRegion(builtinBasins(), lon, lat) puts well-known sea areas in their basin', () => {
    // Positions of named seas and stations: common knowledge (any atlas).
    const cases: [string, number, number, string][] = [
      ['mid North Atlantic', -40, 35, 'north-atlantic'],
      ['Gulf of Mexico', -90, 25, 'north-atlantic'],
      ['Caribbean Sea', -75, 15, 'north-atlantic'],
      ['Caribbean off Colón', -79.9, 9.6, 'north-atlantic'],
      ['Hudson Bay', -85, 60, 'north-atlantic'],
      ['Mediterranean, Ionian Sea', 18, 36, 'north-atlantic'],
      ['Levantine Sea', 33, 33.5, 'north-atlantic'],
      ['Black Sea', 35, 43, 'north-atlantic'],
      ['North Sea', 3, 56, 'north-atlantic'],
      ['off Brazil', -30, -10, 'south-atlantic'],
      ['off Namibia', 10, -25, 'south-atlantic'],
      ['Arabian Sea', 65, 15, 'indian'],
      ['Bay of Bengal', 88, 15, 'indian'],
      ['Red Sea', 38, 20, 'indian'],
      ['Persian Gulf', 52, 27, 'indian'],
      ['Mozambique Channel', 40, -20, 'indian'],
      ['off Perth', 110, -32, 'indian'],
      ['Andaman Sea', 96, 12, 'indian'],
      ['Timor Sea', 127, -11, 'indian'],
      ['Gulf of Carpentaria', 139, -14, 'indian'],
      ['off Hawaii', -157, 20, 'north-pacific'],
      ['Gulf of Alaska', -145, 55, 'north-pacific'],
      ['South China Sea', 115, 15, 'north-pacific'],
      ['Gulf of Thailand', 101.5, 10, 'north-pacific'],
      ['Sea of Japan', 135, 40, 'north-pacific'],
      ['Bering Sea', -178, 58, 'north-pacific'],
      ['Gulf of California', -111, 27, 'north-pacific'],
      ['Gulf of Panama', -79.5, 8.3, 'north-pacific'],
      ['Coral Sea', 155, -18, 'south-pacific'],
      ['Tasman Sea', 160, -38, 'south-pacific'],
      ['off Peru', -80, -10, 'south-pacific'],
      ['Java Sea', 110, -5, 'south-pacific'],
      ['Drake Passage', -65, -58, 'southern'],
      ['Ross Sea', -175, -75, 'southern'],
      ['off Kerguelen', 70, -49, 'southern'],
      ['Fram Strait', 0, 79, 'arctic'],
      ['Barents Sea', 40, 72, 'arctic'],
      ['North Pole', 0, 90, 'arctic'],
    ];
    for (const [place, lon, lat, basin] of cases) expect([place, index.assign(lon, lat)]).toEqual([place, basin]);
  });

  it('assignRegion(builtinBasins(), lon, 0) puts the equator in the northern basin', () => {
    expect(index.assign(-140, 0)).toBe('north-pacific');
    expect(index.assign(-25, 0)).toBe('north-atlantic');
    expect(index.assign(180, 5)).toBe(index.assign(-180, 5));
  });

  it('builtinBasins() is deterministic', () => {
    expect(JSON.stringify(builtinBasins())).toBe(JSON.stringify(basins));
  });
});
