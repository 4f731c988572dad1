// The harmonise stage over every loaded file, with options taken from the config.
import type * as aq from 'arquero';
import type { Config } from '../config/index.js';
import { harmoniseCells, harmoniseSamples, type HarmoniseSummary } from '../harmonise/index.js';
import type { Ledger } from '../ledger/index.js';
import type { QualityFlag } from '../types.js';
import { dropCrossFileDuplicates } from './cross-file-duplicates.js';

/** Harmonised per-file tables and their summaries. */
export interface HarmonisedTables {
  /** Samples, one table per file, in config order. */
  samples: aq.ColumnTable[];
  /** Cells, one table per file. */
  cells: aq.ColumnTable[];
  /** Per-file summaries (conversions, substitutions). */
  summaries: HarmoniseSummary[];
}

/** Harmonise each loaded file with its config entry. */
export function harmoniseTables(config: Config, samples: aq.ColumnTable[], cells: aq.ColumnTable[], ledger: Ledger): HarmonisedTables {
  const h = config.harmonise;
  const out: HarmonisedTables = { samples: [], cells: [], summaries: [] };
  config.inputs.samples.forEach((entry, i) => {
    if (!samples[i] || samples[i].numCols() === 0) return;
    const flags = typeof entry.flags === 'string' ? entry.flags : entry.flags.map;
    const result = harmoniseSamples(
      samples[i],
      {
        file: entry.path,
        units: entry.units,
        fillValues: entry.fill_values,
        landCheck: h.land_check,
        coastToleranceKm: h.coast_tolerance_km,
        flags,
        accept: h.accept_flags as QualityFlag[],
        detectionLimitPolicy: h.detection_limit_policy,
        defaultDetectionLimits: entry.detection_limits,
        defaultDensity: h.default_density,
      },
      ledger,
    );
    out.samples.push(result.table);
    out.summaries.push(result.summary);
  });
  config.inputs.cells.forEach((entry, i) => {
    if (!cells[i] || cells[i].numCols() === 0) return;
    const result = harmoniseCells(cells[i], { file: entry.path, units: entry.units, fillValues: entry.fill_values, landCheck: h.land_check, coastToleranceKm: h.coast_tolerance_km }, ledger);
    out.cells.push(result.table);
    out.summaries.push(result.summary);
  });
  out.samples = dropCrossFileDuplicates(out.samples, ledger);
  return out;
}
