// The results object of a build: plain JSON that the report, the changes page and `basinquota diff` read.
import type { PipelineResult } from '../pipeline/index.js';
import { inventoryByCruise } from './inventory.js';

/** Plain-JSON results of one build (numbers unrounded; key order fixed by construction). */
export interface BuildResults {
  /** Per-cruise holdings. */
  inventory: ReturnType<typeof inventoryByCruise>;
  /** Rows read per input file. */
  files: PipelineResult['counts'];
  /** Ledger counts by table/action/reason. */
  ledger: ReturnType<PipelineResult['ledger']['countsByReason']>;
  /** Per-file harmonise summaries. */
  harmonise: PipelineResult['harmonise'];
  /** Cross-cruise offsets. */
  crossover: PipelineResult['crossover']['offsets'];
  /** Fits per class. */
  fits: PipelineResult['fits'];
  /** Anomaly tests. */
  anomalies: PipelineResult['anomalies'];
}

/** Collect the results object from a pipeline run. */
export function buildResults(result: PipelineResult): BuildResults {
  return {
    inventory: inventoryByCruise(result.samples, result.cells),
    files: result.counts,
    ledger: result.ledger.countsByReason(),
    harmonise: result.harmonise,
    crossover: result.crossover.offsets,
    fits: result.fits,
    anomalies: result.anomalies,
  };
}
