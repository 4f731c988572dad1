import { randomLcg, randomUniform } from 'd3-random';
import { describe, expect, it } from 'vitest';
import { builtinBasins } from '../../../lib/geo/regions/builtin-basins.js';
import { assignRegion, regionIndex } from '../../../lib/geo/regions/region-index.js';

describe('regionIndex', () => {
  // Speed is measured by `npm run bench`, not by timed unit tests.
  it('regionIndex(builtinBasins()).assign places every random sea or land point in a basin', () => {
    const index = regionIndex(builtinBasins());
    const rnd = randomUniform.source(randomLcg(0.1))(0, 1);
    const points = Array.from({ length: 20_000 }, () => [rnd() * 360 - 180, (Math.asin(2 * rnd() - 1) * 180) / Math.PI]);
    let assigned = 0;
    for (const [lon, lat] of points) if (index.assign(lon, lat) !== null) assigned++;
    expect(assigned).toBe(points.length);
  });

  it('assignRegion(regions, lon, lat) folds longitudes and caches per scheme', () => {
    const basins = builtinBasins();
    expect(assignRegion(basins, 200, 20)).toBe('north-pacific');
    expect(assignRegion(basins, -520, 20)).toBe('north-pacific');
    expect(assignRegion(basins, 0, 95)).toBeNull();
  });
});
