// The hook through which a build reuses per-file results of earlier builds; the pipeline stays pure, the shell stores.
import type * as aq from 'arquero';
import type { HarmoniseSummary } from '../harmonise/index.js';
import type { TableName } from '../load/index.js';
import type { Grid, LedgerEntry, Problem } from '../types.js';

/** What identifies one table file's load + harmonise result: everything that result depends on. */
export interface TableCacheKey {
  /** Logical table. */
  table: TableName;
  /** File path as in the config. */
  path: string;
  /** The file's bytes. */
  bytes: Uint8Array;
  /** The file's config entry (columns, units, flags, …). */
  entry: unknown;
  /** The config's `harmonise` block. */
  harmonise: unknown;
}

/** One table file's load and harmonise results, as a build without the cache would produce them. */
export interface CachedTableFile {
  /** The loaded table (before harmonise). */
  loaded: aq.ColumnTable;
  /** Ledger rows the load stage wrote for the file, in order. */
  loadLedger: LedgerEntry[];
  /** Data records read. */
  rowsRead: number;
  /** File-level problems from the load stage (warnings only: files with errors are never cached). */
  problems: Problem[];
  /** The harmonised table (before cross-file duplicates are dropped). */
  harmonised: aq.ColumnTable;
  /** Ledger rows the harmonise stage wrote for the file, in order. */
  harmoniseLedger: LedgerEntry[];
  /** The file's harmonise summary. */
  summary: HarmoniseSummary;
}

/** What identifies one grid file's result: its bytes, its config entry and the density used for per-volume units. */
export interface GridCacheKey {
  /** File path as in the config. */
  path: string;
  /** The file's bytes. */
  bytes: Uint8Array;
  /** The grid's config entry (quantity, variable, units, …). */
  entry: unknown;
  /** The config's harmonise.default_density (per-volume grid units are converted with it). */
  density: number;
}

/** One grid file's result: the grid in canonical units and the ledger rows reading it wrote. */
export interface CachedGrid {
  /** The grid. */
  grid: Grid;
  /** Ledger rows written while reading it, in order. */
  ledger: LedgerEntry[];
}

/** A store of per-file results; `get` returns undefined on a miss or an unreadable entry and must never throw. */
export interface InputCache {
  /** The cached result for this key, if any. */
  getTable(key: TableCacheKey): CachedTableFile | undefined;
  /** Remember a result for this key. */
  putTable(key: TableCacheKey, value: CachedTableFile): void;
  /** The cached grid for this key, if any. */
  getGrid(key: GridCacheKey): CachedGrid | undefined;
  /** Remember a grid for this key. */
  putGrid(key: GridCacheKey, value: CachedGrid): void;
}
