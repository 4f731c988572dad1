import type { AnomalyCell, StationResidual } from './anomaly-types.js';

/** Stations of one region × class group. */
export interface StationGroup {
  /** Region id. */
  region: string;
  /** Phytoplankton class. */
  phytoClass: string;
  /** Station means, sorted by cruise then station. */
  stations: StationResidual[];
}

/**
 * Mean residual per station within each region × class (cells of one station are not independent, so
 * stations are the unit of replication); groups sorted by region then class. Cells need a finite residual and a region.
 */
export function stationMeans(cells: readonly AnomalyCell[]): StationGroup[] {
  const groups = new Map<string, { region: string; phytoClass: string; stations: Map<string, AnomalyCell[]> }>();
  for (const cell of cells) {
    if (cell.regionId === null || !Number.isFinite(cell.residual)) continue;
    const gk = `${cell.regionId}\u0000${cell.phytoClass}`;
    let g = groups.get(gk);
    if (!g) {
      g = { region: cell.regionId, phytoClass: cell.phytoClass, stations: new Map() };
      groups.set(gk, g);
    }
    const sk = `${cell.cruise}\u0000${cell.stationKey}`;
    const list = g.stations.get(sk);
    if (list) list.push(cell);
    else g.stations.set(sk, [cell]);
  }
  return [...groups.values()]
    .sort((a, b) => compare(a.region, b.region) || compare(a.phytoClass, b.phytoClass))
    .map((g) => ({
      region: g.region,
      phytoClass: g.phytoClass,
      stations: [...g.stations.values()]
        .map((list): StationResidual => ({
          cruise: list[0].cruise,
          station: list[0].stationKey,
          nCells: list.length,
          meanResidual: mean(list.map((c) => c.residual)),
          lon: mean(list.map((c) => c.lon)),
          lat: mean(list.map((c) => c.lat)),
        }))
        .sort((a, b) => compare(a.cruise, b.cruise) || compare(a.station, b.station)),
    }));
}

/** Code-unit string order (locale-independent, so output bytes do not depend on the machine). */
export function compare(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

// Summed in sorted order so the result does not depend on the order of the input rows.
function mean(xs: number[]): number {
  xs.sort((a, b) => a - b);
  let s = 0;
  for (const x of xs) s += x;
  return s / xs.length;
}
