// The harmonise stage file by file with a cache: hits reuse their stored result, misses are harmonised and stored.
import type * as aq from 'arquero';
import type { Config } from '../config/index.js';
import type { Ledger } from '../ledger/index.js';
import type { TableName } from '../load/index.js';
import { dropCrossFileDuplicates } from './cross-file-duplicates.js';
import { harmoniseTables, type HarmonisedTables } from './harmonise-tables.js';
import type { InputCache } from './input-cache.js';
import type { LoadedFile, LoadedTables } from './load-tables.js';

/**
 * harmoniseTables with a cache: the same tables, summaries and ledger rows, in the same order. Each file is
 * harmonised alone (harmonising is per file), then cross-file duplicate bottles are dropped over all files as before.
 * A miss whose load had no errors is stored with its load and harmonise results.
 */
export function harmoniseLoaded(config: Config, loaded: LoadedTables, ledger: Ledger, cache: InputCache): HarmonisedTables {
  const out: HarmonisedTables = { samples: [], cells: [], summaries: [] };
  const one = (table: TableName, index: number, input: aq.ColumnTable | undefined, file: LoadedFile | undefined): void => {
    if (!input || input.numCols() === 0) return;
    if (file?.hit) {
      for (const e of file.hit.harmoniseLedger) ledger.add(e);
      out[table].push(file.hit.harmonised);
      out.summaries.push(file.hit.summary);
      return;
    }
    const before = ledger.entries.length;
    const entry = config.inputs[table][index];
    const alone = { ...config, inputs: { ...config.inputs, samples: table === 'samples' ? [config.inputs.samples[index]] : [], cells: table === 'cells' ? [config.inputs.cells[index]] : [] } };
    const result = harmoniseTables(alone, table === 'samples' ? [input] : [], table === 'cells' ? [input] : [], ledger);
    const harmonised = result[table][0];
    out[table].push(harmonised);
    out.summaries.push(result.summaries[0]);
    if (file?.load && entry && !file.load.problems.some((p) => p.severity === 'error')) {
      cache.putTable(file.key, { ...file.load, harmonised, harmoniseLedger: ledger.entries.slice(before), summary: result.summaries[0] });
    }
  };
  config.inputs.samples.forEach((_, i) => one('samples', i, loaded.samples[i], loaded.samplesFiles?.[i]));
  config.inputs.cells.forEach((_, i) => one('cells', i, loaded.cells[i], loaded.cellsFiles?.[i]));
  out.samples = dropCrossFileDuplicates(out.samples, ledger);
  return out;
}
