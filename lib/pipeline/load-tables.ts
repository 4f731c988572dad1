// The load stage over every configured table file: decode, parse, concatenate, count.
import * as aq from 'arquero';
import type { Config } from '../config/index.js';
import type { Ledger } from '../ledger/index.js';
import { decodeUtf8, isColumnarFile, readColumnar, readTable, type ColumnarText, type ReadTableResult, type TableName } from '../load/index.js';
import type { InputBytes, LedgerEntry, Problem } from '../types.js';
import type { CachedTableFile, InputCache, TableCacheKey } from './input-cache.js';

/** Rows read from one input file (the ledger invariant is checked per file). */
export interface FileCount {
  /** Logical table. */
  table: TableName;
  /** File path as in the config. */
  file: string;
  /** Data records read. */
  rowsRead: number;
}

/** One file's load, kept for the cache: its key, and either the cached result or what loading it produced. */
export interface LoadedFile {
  /** Cache key of the file. */
  key: TableCacheKey;
  /** The cached result, on a hit. */
  hit?: CachedTableFile;
  /** On a miss: the load part of what will be cached (errors make the file uncacheable). */
  load?: Pick<CachedTableFile, 'loaded' | 'loadLedger' | 'rowsRead' | 'problems'>;
}

/** Loaded tables: one Arquero table per file, in config order. */
export interface LoadedTables {
  /** Per samples file, its table. */
  samples: aq.ColumnTable[];
  /** Per cells file, its table. */
  cells: aq.ColumnTable[];
  /** Rows read per file. */
  counts: FileCount[];
  /** File-level problems. */
  problems: Problem[];
  /** With a cache: per samples file (parallel to `samples`), its key and hit or load result. */
  samplesFiles?: LoadedFile[];
  /** With a cache: per cells file (parallel to `cells`). */
  cellsFiles?: LoadedFile[];
}

/** Read every samples and cells file named in the config; with a cache, files whose key hits are taken from it (same tables, counts, problems and ledger rows). */
export function loadTables(config: Config, files: Map<string, InputBytes>, ledger: Ledger, columnar: Map<string, ColumnarText> = new Map(), cache?: InputCache): LoadedTables {
  const out: LoadedTables = { samples: [], cells: [], counts: [], problems: [] };
  if (cache) {
    out.samplesFiles = [];
    out.cellsFiles = [];
  }
  const entries: [TableName, Config['inputs']['samples'] | Config['inputs']['cells']][] = [
    ['samples', config.inputs.samples],
    ['cells', config.inputs.cells],
  ];
  for (const [table, list] of entries) {
    for (const entry of list) {
      const bytes = files.get(entry.path);
      if (!bytes) throw new Error(`internal: file ${entry.path} was not read`);
      const key: TableCacheKey = { table, path: entry.path, bytes: bytes.bytes, entry, harmonise: config.harmonise };
      const hit = cache?.getTable(key);
      if (hit) {
        for (const e of hit.loadLedger) ledger.add(e);
        out.problems.push(...hit.problems);
        out.counts.push({ table, file: entry.path, rowsRead: hit.rowsRead });
        out[table].push(hit.loaded);
        out[`${table}Files`]?.push({ key, hit });
        continue;
      }
      const before = ledger.entries.length;
      const options = { table, columns: entry.columns, delimiter: entry.delimiter, cruise: entry.cruise };
      let result: ReadTableResult;
      if (isColumnarFile(entry.path)) {
        const decoded = columnar.get(entry.path);
        if (!decoded) continue; // decodeColumnarInputs reported why
        result = readColumnar(decoded, options, ledger);
      } else {
        const decoded = decodeUtf8(bytes);
        if ('severity' in decoded) {
          out.problems.push(decoded);
          continue;
        }
        result = readTable(decoded, options, ledger);
      }
      out.problems.push(...result.problems);
      out.counts.push({ table, file: entry.path, rowsRead: result.rowsRead });
      out[table].push(result.table);
      const loadLedger: LedgerEntry[] = ledger.entries.slice(before);
      out[`${table}Files`]?.push({ key, load: { loaded: result.table, loadLedger, rowsRead: result.rowsRead, problems: result.problems } });
    }
  }
  return out;
}

/** Concatenate per-file tables (columns missing in some files become missing values). */
export function concatTables(tables: aq.ColumnTable[]): aq.ColumnTable {
  const nonEmpty = tables.filter((t) => t.numCols() > 0);
  if (nonEmpty.length === 0) return aq.table({});
  const names = [...new Set(nonEmpty.flatMap((t) => t.columnNames()))];
  const columns: Record<string, unknown[]> = {};
  for (const name of names) {
    const out: unknown[] = [];
    for (const t of nonEmpty) {
      const n = t.numRows();
      if (t.columnNames().includes(name)) {
        const values = t.array(name) as ArrayLike<unknown>;
        for (let i = 0; i < n; i++) out.push(values[i]);
      } else {
        const fill = isNumericName(name, nonEmpty) ? NaN : null;
        for (let i = 0; i < n; i++) out.push(fill);
      }
    }
    columns[name] = out;
  }
  return aq.table(columns);
}

function isNumericName(name: string, tables: aq.ColumnTable[]): boolean {
  for (const t of tables) {
    if (t.columnNames().includes(name) && t.numRows() > 0) {
      const v = t.get(name, 0);
      return typeof v === 'number';
    }
  }
  return false;
}
