import type { RegionCollection } from '../geo/regions/region-types.js';
import { regionIndex } from '../geo/regions/region-index.js';
import type { Ledger } from '../ledger/ledger.js';
import { noPosition, outsideRegions } from './messages.js';

/** A positioned row for region assignment. */
export interface PositionedRow {
  /** Longitude, degrees east. */
  lon: number;
  /** Latitude, degrees north. */
  lat: number;
  /** Input file (ledger); default ''. */
  sourceFile?: string;
  /** Input line (ledger); default 0. */
  sourceLine?: number;
}

/** Region ids per row and the rows left without one, with the reason. */
export interface RegionAssignment {
  /** Region id per input row (null when unassigned). */
  regionIds: (string | null)[];
  /** Rows without a region, in input order. */
  unassigned: { index: number; reason: 'no-position' | 'outside-regions' }[];
}

/** Region id of every row (first containing region, d3-geo); unassigned rows go to the ledger as 'flagged' cells. */
export function assignRegions(rows: readonly PositionedRow[], regions: RegionCollection, ledger?: Ledger): RegionAssignment {
  const index = regionIndex(regions);
  const regionIds: (string | null)[] = [];
  const unassigned: RegionAssignment['unassigned'] = [];
  rows.forEach((row, i) => {
    const usable = Number.isFinite(row.lon) && Number.isFinite(row.lat) && Math.abs(row.lat) <= 90;
    const id = usable ? index.assign(row.lon, row.lat) : null;
    regionIds.push(id);
    if (id !== null) return;
    const reason = usable ? 'outside-regions' : 'no-position';
    unassigned.push({ index: i, reason });
    ledger?.add({
      table: 'cells', file: row.sourceFile ?? '', line: row.sourceLine ?? 0, stage: 'anomalies', action: 'flagged', reason,
      detail: usable ? outsideRegions(row.lon, row.lat) : noPosition(row.lon, row.lat),
    });
  });
  return { regionIds, unassigned };
}
