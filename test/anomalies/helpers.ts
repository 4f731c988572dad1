import { randomLcg, randomNormal } from 'd3-random';
import type { AnomalyCell } from '../../lib/anomalies/anomaly-types.js';

/** Seeded cells: per region a list of station means; cells scatter around them with sdCell. */
export function syntheticCells(spec: { region: string; stationMeans: number[]; cellsPerStation?: number; phytoClass?: string }[], seed = 0.5, sdCell = 0.15): AnomalyCell[] {
  const normal = randomNormal.source(randomLcg(seed));
  const cells: AnomalyCell[] = [];
  let line = 2;
  for (const { region, stationMeans, cellsPerStation = 4, phytoClass = 'diatom' } of spec) {
    stationMeans.forEach((m, s) => {
      const within = normal(0, sdCell);
      const draws = Array.from({ length: cellsPerStation }, () => within());
      // Centre the cells so the station mean is exactly the planted value.
      const centre = draws.reduce((a, b) => a + b, 0) / draws.length;
      for (const d of draws) {
        cells.push({ phytoClass, stationKey: `${region}-s${String(s).padStart(2, '0')}`, cruise: 'C1', lon: 10, lat: -50, residual: m + d - centre, regionId: region, sourceFile: 'cells.csv', sourceLine: line++ });
      }
    });
  }
  return cells;
}

/** Seeded station means around `mean` with between-station SD `sd`. */
export function stationDraws(n: number, mean: number, sd: number, seed: number): number[] {
  const normal = randomNormal.source(randomLcg(seed))(mean, sd);
  return Array.from({ length: n }, () => normal());
}
