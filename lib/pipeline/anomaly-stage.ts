// The anomalies stage over the merged cell table: regions, then region × class tests.
import type * as aq from 'arquero';
import { assignRegions, findAnomalies, type AnomalyCell, type AnomalyResults } from '../anomalies/index.js';
import type { Config } from '../config/index.js';
import { builtinBasins, latLonBoxes, regionsFromGeoJson, type RegionCollection } from '../geo/regions/index.js';
import type { Ledger } from '../ledger/index.js';
import { decodeUtf8 } from '../load/index.js';
import type { InputBytes } from '../types.js';

/** The region scheme the config names. */
export function regionScheme(config: Config, files: Map<string, InputBytes>): RegionCollection {
  const r = config.inputs.regions;
  if (r === 'builtin-basins') return builtinBasins();
  if ('boxes_deg' in r) return latLonBoxes(r.boxes_deg);
  const bytes = files.get(r.path);
  if (!bytes) throw new Error(`${r.path}: region file was not read`);
  const text = decodeUtf8(bytes);
  if ('severity' in text) throw new Error(`${r.path}:${text.line}: ${text.message}`);
  return regionsFromGeoJson(text);
}

/** Region ids per cell, and the anomaly results. */
export interface AnomalyStage {
  /** Region id of each cell (null: none). */
  regionIds: (string | null)[];
  /** Results of findAnomalies. */
  results: AnomalyResults;
}

/** Assign regions and test residuals per region × class. */
export function anomalyStage(cells: aq.ColumnTable, regions: RegionCollection, config: Config, ledger: Ledger): AnomalyStage {
  const n = cells.numRows();
  const lon = cells.array('lon') as ArrayLike<number>;
  const lat = cells.array('lat') as ArrayLike<number>;
  const file = cells.array('source_file') as ArrayLike<string>;
  const line = cells.array('source_line') as ArrayLike<number>;
  const positioned = Array.from({ length: n }, (_, i) => ({ lon: lon[i], lat: lat[i], sourceFile: file[i], sourceLine: line[i] }));
  const { regionIds } = assignRegions(positioned, regions, ledger);
  const cls = cells.array('class') as ArrayLike<string>;
  const station = cells.array('station') as ArrayLike<string>;
  const cruise = cells.array('cruise') as ArrayLike<string>;
  const residual = cells.array('residual_log10') as ArrayLike<number>;
  const input: AnomalyCell[] = new Array(n);
  for (let i = 0; i < n; i++) {
    input[i] = { phytoClass: cls[i], stationKey: station[i], cruise: cruise[i], lon: lon[i], lat: lat[i], residual: residual[i], regionId: regionIds[i], sourceFile: file[i], sourceLine: line[i] };
  }
  const a = config.anomalies;
  const results = findAnomalies(input, { minStations: a.min_stations, fdrQ: a.fdr_q, targetFold: a.target_fold, level: config.fits.level }, ledger);
  return { regionIds, results };
}
