// The whole pure pipeline: load → harmonise → match → quotas → fits → anomalies; tables in, tables and results out.
import type * as aq from 'arquero';
import { Ledger } from '../ledger/index.js';
import type { Problem } from '../types.js';
import { concatTables, loadTables, type FileCount } from './load-tables.js';
import type { ProjectInputs } from './project-inputs.js';
import { silentProgress, type Progress } from './progress.js';
import { harmoniseTables, type HarmonisedTables } from './harmonise-tables.js';
import type { HarmoniseSummary } from '../harmonise/index.js';
import { stageProblem } from './stage-problem.js';

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
  /** Per-file harmonise summaries (conversions, substitutions). */
  harmonise: HarmoniseSummary[];
}

/** Run every stage on in-memory inputs. */
export function runPipeline(inputs: ProjectInputs, progress: Progress = silentProgress): PipelineResult {
  const ledger = new Ledger();
  progress.start('load');
  const loaded = loadTables(inputs.config, inputs.files, ledger);
  const rowsRead = loaded.counts.reduce((s, c) => s + c.rowsRead, 0);
  const rowsLoaded = [...loaded.samples, ...loaded.cells].reduce((s, t) => s + t.numRows(), 0);
  progress.end('load', rowsRead, rowsLoaded);
  const base = { ledger, counts: loaded.counts, problems: loaded.problems, harmonise: [] };
  if (hasErrors(loaded.problems)) return { ...base, samples: concatTables(loaded.samples), cells: concatTables(loaded.cells) };

  progress.start('harmonise');
  let harmonised: HarmonisedTables;
  try {
    harmonised = harmoniseTables(inputs.config, loaded.samples, loaded.cells, ledger);
  } catch (error) {
    return { ...base, samples: concatTables(loaded.samples), cells: concatTables(loaded.cells), problems: [...loaded.problems, stageProblem(error, inputs.configFile)] };
  }
  const samples = concatTables(harmonised.samples);
  const cells = concatTables(harmonised.cells);
  progress.end('harmonise', rowsLoaded, samples.numRows() + cells.numRows());
  return { ...base, samples, cells, harmonise: harmonised.summaries };
}

/** True when any problem is an error. */
export function hasErrors(problems: readonly Problem[]): boolean {
  return problems.some((p) => p.severity === 'error');
}
