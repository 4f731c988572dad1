// readGrids file by file with a cache: hits reuse the stored grid and ledger rows, misses are read and stored.
import type { Config } from '../config/index.js';
import type { Ledger } from '../ledger/index.js';
import type { InputBytes, Problem } from '../types.js';
import type { GridCacheKey, InputCache } from './input-cache.js';
import { readGrids, type QuantityGrid } from './read-grids.js';

/** readGrids with a cache: the same grids, problems and ledger rows, in the same order; grids read without problems are stored. */
export function readGridsCached(config: Config, files: Map<string, InputBytes>, ledger: Ledger, cache: InputCache): { grids: QuantityGrid[]; problems: Problem[] } {
  const grids: QuantityGrid[] = [];
  const problems: Problem[] = [];
  for (const entry of config.inputs.grids) {
    const bytes = files.get(entry.path);
    if (!bytes) continue;
    const key: GridCacheKey = { path: entry.path, bytes: bytes.bytes, entry, density: config.harmonise.default_density };
    const hit = cache.getGrid(key);
    if (hit) {
      for (const e of hit.ledger) ledger.add(e);
      grids.push({ quantity: entry.quantity, grid: hit.grid });
      continue;
    }
    const before = ledger.entries.length;
    const one = readGrids({ ...config, inputs: { ...config.inputs, grids: [entry] } }, files, ledger);
    grids.push(...one.grids);
    problems.push(...one.problems);
    if (one.problems.length === 0 && one.grids.length === 1) cache.putGrid(key, { grid: one.grids[0].grid, ledger: ledger.entries.slice(before) });
  }
  return { grids, problems };
}
