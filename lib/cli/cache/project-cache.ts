// The on-disk cache of per-file load + harmonise results, in <project>/.basinquota-cache/.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CachedGrid, CachedTableFile, GridCacheKey, InputCache, TableCacheKey } from '../../pipeline/index.js';
import { CACHE_FORMAT_VERSION, gridCacheKey, tableCacheKey } from './cache-key.js';
import { decodeGrid, encodeGrid, type GridHeader } from './grid-codec.js';
import { decodeTable, encodeTable, type TableHeader } from './table-codec.js';

/** Folder name of the cache inside a project. */
export const CACHE_DIR = '.basinquota-cache';

const MAGIC = 'BQC\u0001';

/** Counts of what the cache did in this build. */
export interface CacheStats {
  /** Entries read and used. */
  hits: number;
  /** Keys with no entry. */
  misses: number;
  /** Entries present but unreadable (corrupt, truncated, other format): ignored, then rewritten. */
  rejected: number;
  /** Entries written. */
  writes: number;
}

/** The project cache: the pipeline hook plus its counters and housekeeping. */
export interface ProjectCache extends InputCache {
  /** What happened so far. */
  readonly stats: CacheStats;
  /** Delete entries this build neither read nor wrote (they belong to inputs or settings no longer in use). */
  prune(): void;
}

/** Options of the project cache. */
export interface ProjectCacheOptions {
  /** basinquota version mixed into every key; the shell passes package.json's. */
  packageVersion: string;
}

/** What a table entry's header holds besides format and key. */
interface TableEntryHeader {
  rowsRead: number;
  problems: CachedTableFile['problems'];
  loadLedger: CachedTableFile['loadLedger'];
  harmoniseLedger: CachedTableFile['harmoniseLedger'];
  summary: CachedTableFile['summary'];
  loaded: TableHeader;
  harmonised: TableHeader;
}

/** What a grid entry's header holds besides format and key. */
interface GridEntryHeader {
  grid: GridHeader;
  ledger: CachedGrid['ledger'];
}

/**
 * A cache in `<project>/.basinquota-cache/` (with a `.gitignore` of `*`): one file per table or grid input, named
 * by tableCacheKey or gridCacheKey. An entry is "BQC\x01", the SHA-256 of the rest, a 4-byte header length, the
 * JSON header and the array bytes; an entry that fails these checks is a miss. Failing to write is never an error.
 */
export function projectCache(projectDir: string, options: ProjectCacheOptions): ProjectCache {
  const dir = join(projectDir, CACHE_DIR);
  const stats: CacheStats = { hits: 0, misses: 0, rejected: 0, writes: 0 };
  const used = new Set<string>();
  const pathOf = (name: string) => join(dir, `${name}.bin`);
  const get = <T>(name: string, decode: (header: unknown, blob: Uint8Array) => T): T | undefined => {
    used.add(name);
    let bytes: Uint8Array;
    try {
      bytes = readFileSync(pathOf(name));
    } catch {
      stats.misses++;
      return undefined;
    }
    try {
      const { header, blob } = readEntry(bytes, name);
      const value = decode(header, blob);
      stats.hits++;
      return value;
    } catch {
      stats.rejected++;
      return undefined;
    }
  };
  const put = (name: string, encode: () => { header: object; chunks: Uint8Array[] }): void => {
    used.add(name);
    try {
      const { header, chunks } = encode();
      const bytes = writeEntry({ format: CACHE_FORMAT_VERSION, key: name, ...header }, chunks);
      ensureDir(dir);
      const tmp = join(dir, `${name}.${process.pid}.tmp`);
      writeFileSync(tmp, bytes);
      renameSync(tmp, pathOf(name));
      stats.writes++;
    } catch {
      // An unwritable cache or an uncacheable value only costs the next build its speed.
    }
  };
  return {
    stats,
    getTable: (key: TableCacheKey) => get(tableCacheKey(key, options.packageVersion), (header, blob) => tableFromEntry(header as TableEntryHeader, blob)),
    putTable: (key: TableCacheKey, value: CachedTableFile) => put(tableCacheKey(key, options.packageVersion), () => tableToEntry(value)),
    getGrid: (key: GridCacheKey) =>
      get(gridCacheKey(key, options.packageVersion), (header, blob) => {
        const h = header as GridEntryHeader;
        return { grid: decodeGrid(h.grid, blob), ledger: h.ledger };
      }),
    putGrid: (key: GridCacheKey, value: CachedGrid) =>
      put(gridCacheKey(key, options.packageVersion), () => {
        const { header, chunks } = encodeGrid(value.grid, 0);
        return { header: { grid: header, ledger: value.ledger }, chunks };
      }),
    prune(): void {
      if (!existsSync(dir)) return;
      for (const f of readdirSync(dir)) {
        const m = /^([0-9a-f]{64})\.bin$/.exec(f);
        if ((m && !used.has(m[1])) || f.endsWith('.tmp')) rmSync(join(dir, f), { force: true });
      }
    },
  };
}

function ensureDir(dir: string): void {
  mkdirSync(dir, { recursive: true });
  const ignore = join(dir, '.gitignore');
  if (!existsSync(ignore)) writeFileSync(ignore, '*\n');
}

function tableToEntry(value: CachedTableFile): { header: TableEntryHeader; chunks: Uint8Array[] } {
  const loaded = encodeTable(value.loaded, 0);
  const harmonised = encodeTable(value.harmonised, loaded.chunks.reduce((s, c) => s + c.length, 0));
  const { rowsRead, problems, loadLedger, harmoniseLedger, summary } = value;
  return { header: { rowsRead, problems, loadLedger, harmoniseLedger, summary, loaded: loaded.header, harmonised: harmonised.header }, chunks: [...loaded.chunks, ...harmonised.chunks] };
}

function tableFromEntry(h: TableEntryHeader, blob: Uint8Array): CachedTableFile {
  return {
    loaded: decodeTable(h.loaded, blob),
    loadLedger: h.loadLedger,
    rowsRead: h.rowsRead,
    problems: h.problems,
    harmonised: decodeTable(h.harmonised, blob),
    harmoniseLedger: h.harmoniseLedger,
    summary: h.summary,
  };
}

/** An entry: magic, SHA-256 of the rest, header length, JSON header, then the blob (8-byte aligned within itself). */
function writeEntry(header: object, chunks: Uint8Array[]): Uint8Array {
  const headerBytes = new TextEncoder().encode(JSON.stringify(header));
  const body = concat([new Uint8Array(new Uint32Array([headerBytes.length]).buffer), headerBytes, ...chunks]);
  const digest = createHash('sha256').update(body).digest();
  return concat([new TextEncoder().encode(MAGIC), digest, body]);
}

function readEntry(bytes: Uint8Array, key: string): { header: unknown; blob: Uint8Array } {
  const magic = new TextEncoder().encode(MAGIC);
  if (bytes.length < magic.length + 36 || magic.some((b, i) => bytes[i] !== b)) throw new Error('not a cache entry');
  const digest = bytes.subarray(magic.length, magic.length + 32);
  const body = bytes.subarray(magic.length + 32);
  if (!createHash('sha256').update(body).digest().equals(digest)) throw new Error('checksum mismatch');
  const headerLength = new DataView(body.buffer, body.byteOffset, 4).getUint32(0, true);
  if (4 + headerLength > body.length) throw new Error('truncated header');
  const header = JSON.parse(new TextDecoder().decode(body.subarray(4, 4 + headerLength))) as { format?: number; key?: string };
  if (header.format !== CACHE_FORMAT_VERSION || header.key !== key) throw new Error('other format or key');
  return { header, blob: body.subarray(4 + headerLength) };
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((s, p) => s + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
