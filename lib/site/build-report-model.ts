// Assemble the page model from a pipeline result and the build's metadata.
import type { Config } from '../config/index.js';
import type { PipelineResult } from '../pipeline/index.js';
import { countBy, groupLedger, inventoryByCruise } from './inventory.js';
import type { FileAccount, ReportModel } from './report-model.js';
import { keyFindings } from './key-findings.js';

/** Facts of the build that come from the shell: version number, date, tool version. */
export interface BuildFacts {
  /** Report version number. */
  version: number;
  /** ISO 8601 build date. */
  date: string;
  /** basinquota package version. */
  toolVersion: string;
}

/** Pages every build has. */
const BASE_PAGES = ['index.html', 'inventory.html'];

/** Build the ReportModel the templates read. */
export function buildReportModel(config: Config, result: PipelineResult, facts: BuildFacts): ReportModel {
  const { samples, cells, ledger } = result;
  const inventory = inventoryByCruise(samples, cells);
  const stations = new Set<string>();
  for (const table of [samples, cells]) {
    if (table.numRows() === 0) continue;
    const cruise = table.array('cruise') as ArrayLike<string>;
    const station = table.array('station') as ArrayLike<string>;
    for (let i = 0; i < table.numRows(); i++) stations.add(`${cruise[i]}\u0000${station[i]}`);
  }
  const classColumn = cells.columnNames().includes('class') ? 'class' : 'phyto_class';
  const files: FileAccount[] = result.counts.map((c) => {
    const excluded = ledger.excluded(c.table, c.file).length;
    return { table: c.table, file: c.file, rowsRead: c.rowsRead, rowsUsed: c.rowsRead - excluded, rowsExcluded: excluded };
  });
  return {
    meta: {
      title: config.report.title,
      authors: config.report.authors,
      programme: config.report.programme ?? null,
      licence: config.report.licence,
      contact: config.report.contact ?? null,
      version: facts.version,
      date: facts.date,
      toolVersion: facts.toolVersion,
    },
    counts: {
      cruises: inventory.length,
      stations: stations.size,
      samples: samples.numRows(),
      cells: cells.numRows(),
      cellsByClass: countBy(cells, classColumn),
    },
    findings: keyFindings(result, new Map((result.regions?.features ?? []).map((f) => [String(f.properties.id), String(f.properties.name)]))),
    inventory,
    files,
    ledger: groupLedger(ledger.entries),
    conversions: result.harmonise.flatMap((h) => h.conversions.map((c) => ({ file: h.file, column: c.column, from: c.from, to: c.to, method: c.method, rows: c.rows }))),
    matchSources: countBy(cells, 'ambient_dissolved_fe_source'),
    crossover: result.crossover.offsets.map((o) => ({ cruiseA: o.cruise_a, cruiseB: o.cruise_b, offset: o.offset_nmol_kg, se: o.se_nmol_kg, nDepths: o.n_depths, nPairs: o.n_station_pairs, flagged: o.flagged })),
    crossoverSettings: { maxDistanceKm: config.crossover.max_distance_km, minDepthM: config.crossover.min_depth_m, thresholdNmolKg: config.crossover.threshold_nmol_kg },
    pages: [...BASE_PAGES],
    sections: {},
  };
}
