// The whole pure pipeline: load → harmonise → match → quotas → fits → anomalies; tables in, tables and results out.
import type * as aq from 'arquero';
import { fitQuotas, residualsFromFit, type FitInput, type FitResults } from '../fits/index.js';
import type { HarmoniseSummary } from '../harmonise/index.js';
import { Ledger } from '../ledger/index.js';
import { crossoverOffsets, matchCells, type CruiseOffset, type StationPairDifference } from '../match/index.js';
import { computeQuotas } from '../quotas/index.js';
import type { Problem } from '../types.js';
import { harmoniseLoaded } from './harmonise-loaded.js';
import { harmoniseTables } from './harmonise-tables.js';
import type { InputCache } from './input-cache.js';
import { concatTables, loadTables, type FileCount } from './load-tables.js';
import type { ProjectInputs } from './project-inputs.js';
import { silentProgress, type Progress } from './progress.js';
import { readGrids, type QuantityGrid } from './read-grids.js';
import { readGridsCached } from './read-grids-cached.js';
import { stageProblem } from './stage-problem.js';
import { crossoverOptions, fitOptions, matchOptions, quotaOptions } from './stage-options.js';
import { withColumn } from './with-column.js';
import { anomalyStage, regionScheme } from './anomaly-stage.js';
import type { AnomalyResults } from '../anomalies/index.js';
import type { RegionCollection } from '../geo/regions/index.js';

/** What a pipeline run produced. When `problems` holds an error, later stages did not run and their fields are empty. */
export interface PipelineResult {
  /** Harmonised bottle samples. */
  samples: aq.ColumnTable;
  /** The merged cell table: matched, with quotas and residuals, as far as the pipeline got. */
  cells: aq.ColumnTable;
  /** Gridded fields in canonical units. */
  grids: QuantityGrid[];
  /** Every row excluded, converted or flagged. */
  ledger: Ledger;
  /** Rows read per input file. */
  counts: FileCount[];
  /** File-level errors and warnings. */
  problems: Problem[];
  /** Per-file harmonise summaries (conversions, substitutions). */
  harmonise: HarmoniseSummary[];
  /** Cross-cruise dFe comparison. */
  crossover: { pairs: StationPairDifference[]; offsets: CruiseOffset[] };
  /** Fits of Fe:C on dFe per class, or null when not reached. */
  fits: FitResults | null;
  /** The region scheme used. */
  regions: RegionCollection | null;
  /** Region × class anomaly tests, or null when not reached. */
  anomalies: AnomalyResults | null;
}

/** Run every stage on in-memory inputs; with a cache, table files whose key hits skip load and harmonise (same results). */
export function runPipeline(inputs: ProjectInputs, progress: Progress = silentProgress, cache?: InputCache): PipelineResult {
  const { config } = inputs;
  const ledger = new Ledger();
  const knownFiles = [...inputs.files.keys()];
  const result: PipelineResult = {
    samples: concatTables([]),
    cells: concatTables([]),
    grids: [],
    ledger,
    counts: [],
    problems: [],
    harmonise: [],
    crossover: { pairs: [], offsets: [] },
    fits: null,
    regions: null,
    anomalies: null,
  };
  const failed = (error: unknown): PipelineResult => {
    result.problems.push(stageProblem(error, inputs.configFile, knownFiles));
    return result;
  };

  progress.start('load');
  const loaded = loadTables(config, inputs.files, ledger, inputs.columnar, cache);
  result.counts = loaded.counts;
  result.problems.push(...loaded.problems);
  const rowsRead = loaded.counts.reduce((s, c) => s + c.rowsRead, 0);
  const rowsLoaded = [...loaded.samples, ...loaded.cells].reduce((s, t) => s + t.numRows(), 0);
  const gridsRead = cache ? readGridsCached(config, inputs.files, ledger, cache) : readGrids(config, inputs.files, ledger);
  result.grids = gridsRead.grids;
  result.problems.push(...gridsRead.problems);
  progress.end('load', rowsRead, rowsLoaded);
  result.samples = concatTables(loaded.samples);
  result.cells = concatTables(loaded.cells);
  if (hasErrors(result.problems)) return result;

  progress.start('harmonise');
  try {
    const harmonised = cache ? harmoniseLoaded(config, loaded, ledger, cache) : harmoniseTables(config, loaded.samples, loaded.cells, ledger);
    result.harmonise = harmonised.summaries;
    result.samples = concatTables(harmonised.samples);
    result.cells = concatTables(harmonised.cells);
  } catch (error) {
    return failed(error);
  }
  progress.end('harmonise', rowsLoaded, result.samples.numRows() + result.cells.numRows());

  progress.start('match');
  const cellsIn = result.cells.numRows();
  try {
    result.cells = matchCells(result.cells, result.samples, result.grids, matchOptions(config), ledger);
    result.crossover = crossoverOffsets(result.samples, crossoverOptions(config));
  } catch (error) {
    return failed(error);
  }
  progress.end('match', cellsIn, result.cells.numRows());

  progress.start('quotas');
  const matched = result.cells.numRows();
  try {
    result.cells = computeQuotas(result.cells, quotaOptions(config), ledger);
  } catch (error) {
    return failed(error);
  }
  progress.end('quotas', matched, result.cells.numRows());

  progress.start('fits');
  const input = fitInput(result.cells);
  result.fits = fitQuotas(input, fitOptions(config));
  const lines = result.cells.array('source_line') as ArrayLike<number>;
  const files = result.cells.array('source_file') as ArrayLike<string>;
  for (const e of result.fits.excluded) {
    ledger.add({ table: 'cells', file: files[e.index], line: lines[e.index], stage: 'fits', action: 'flagged', reason: e.reason, detail: e.detail });
  }
  result.cells = withColumn(result.cells, 'residual_log10', residualsFromFit(input, result.fits));
  progress.end('fits', result.cells.numRows(), result.fits.classes.filter((c) => c.fitted).length);

  progress.start('anomalies');
  try {
    result.regions = regionScheme(config, inputs.files);
    const stage = anomalyStage(result.cells, result.regions, config, ledger);
    result.cells = withColumn(result.cells, 'region', stage.regionIds);
    result.anomalies = stage.results;
  } catch (error) {
    return failed(error);
  }
  progress.end('anomalies', result.cells.numRows(), result.anomalies.groups.length);
  return result;
}

/** The fits stage's view of the merged cell table. */
export function fitInput(cells: aq.ColumnTable): FitInput {
  const n = cells.numRows();
  const cruise = cells.array('cruise') as ArrayLike<string>;
  const station = cells.array('station') as ArrayLike<string>;
  const stationKey: string[] = new Array(n);
  for (let i = 0; i < n; i++) stationKey[i] = `${cruise[i]} ${station[i]}`;
  return {
    cellClass: Array.from(cells.array('class') as ArrayLike<string>),
    station: stationKey,
    dFe: cells.array('ambient_dissolved_fe') as ArrayLike<number>,
    feC: cells.array('fe_c') as ArrayLike<number>,
    feCSigma: cells.array('fe_c_sigma') as ArrayLike<number>,
  };
}

/** True when any problem is an error. */
export function hasErrors(problems: readonly Problem[]): boolean {
  return problems.some((p) => p.severity === 'error');
}
