// The on-disk cache of per-file load + harmonise results, in <project>/.basinquota-cache/.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CachedTableFile, InputCache, TableCacheKey } from '../../pipeline/index.js';
import { CACHE_FORMAT_VERSION, tableCacheKey } from './cache-key.js';
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

/** Header stored before the blob of one entry. */
interface EntryHeader {
  format: number;
  key: string;
  rowsRead: number;
  problems: CachedTableFile['problems'];
  loadLedger: CachedTableFile['loadLedger'];
  harmoniseLedger: CachedTableFile['harmoniseLedger'];
  summary: CachedTableFile['summary'];
  loaded: TableHeader;
  harmonised: TableHeader;
}

/**
 * A cache in `<project>/.basinquota-cache/` (with a `.gitignore` of `*`): one file per table input, named by
 * tableCacheKey. An entry is "BQC\x01", the SHA-256 of the rest, a 4-byte header length, the JSON header and the
 * column bytes; any entry that fails these checks is treated as a miss. Failing to write is never an error.
 */
export function projectCache(projectDir: string, options: ProjectCacheOptions): ProjectCache {
  const dir = join(projectDir, CACHE_DIR);
  const stats: CacheStats = { hits: 0, misses: 0, rejected: 0, writes: 0 };
  const used = new Set<string>();
  const pathOf = (name: string) => join(dir, `${name}.bin`);
  return {
    stats,
    getTable(key: TableCacheKey): CachedTableFile | undefined {
      const name = tableCacheKey(key, options.packageVersion);
      used.add(name);
      let bytes: Uint8Array;
      try {
        bytes = readFileSync(pathOf(name));
      } catch {
        stats.misses++;
        return undefined;
      }
      try {
        const value = readEntry(bytes, name);
        stats.hits++;
        return value;
      } catch {
        stats.rejected++;
        return undefined;
      }
    },
    putTable(key: TableCacheKey, value: CachedTableFile): void {
      const name = tableCacheKey(key, options.packageVersion);
      used.add(name);
      try {
        const bytes = writeEntry(value, name);
        ensureDir(dir);
        const tmp = join(dir, `${name}.${process.pid}.tmp`);
        writeFileSync(tmp, bytes);
        renameSync(tmp, pathOf(name));
        stats.writes++;
      } catch {
        // An unwritable cache or an uncacheable table only costs the next build its speed.
      }
    },
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

function writeEntry(value: CachedTableFile, key: string): Uint8Array {
  const loaded = encodeTable(value.loaded, 0);
  const loadedLength = loaded.chunks.reduce((s, c) => s + c.length, 0);
  const harmonised = encodeTable(value.harmonised, loadedLength);
  const header: EntryHeader = {
    format: CACHE_FORMAT_VERSION,
    key,
    rowsRead: value.rowsRead,
    problems: value.problems,
    loadLedger: value.loadLedger,
    harmoniseLedger: value.harmoniseLedger,
    summary: value.summary,
    loaded: loaded.header,
    harmonised: harmonised.header,
  };
  const headerBytes = new TextEncoder().encode(JSON.stringify(header));
  const parts = [new Uint8Array(new Uint32Array([headerBytes.length]).buffer), headerBytes, ...loaded.chunks, ...harmonised.chunks];
  const body = concat(parts);
  const digest = createHash('sha256').update(body).digest();
  return concat([new TextEncoder().encode(MAGIC), digest, body]);
}

function readEntry(bytes: Uint8Array, key: string): CachedTableFile {
  const magic = new TextEncoder().encode(MAGIC);
  if (bytes.length < magic.length + 36 || magic.some((b, i) => bytes[i] !== b)) throw new Error('not a cache entry');
  const digest = bytes.subarray(magic.length, magic.length + 32);
  const body = bytes.subarray(magic.length + 32);
  const actual = createHash('sha256').update(body).digest();
  if (!actual.equals(digest)) throw new Error('checksum mismatch');
  const headerLength = new DataView(body.buffer, body.byteOffset, 4).getUint32(0, true);
  if (4 + headerLength > body.length) throw new Error('truncated header');
  const header = JSON.parse(new TextDecoder().decode(body.subarray(4, 4 + headerLength))) as EntryHeader;
  if (header.format !== CACHE_FORMAT_VERSION || header.key !== key) throw new Error('other format or key');
  const blob = body.subarray(4 + headerLength);
  return {
    loaded: decodeTable(header.loaded, blob),
    loadLedger: header.loadLedger,
    rowsRead: header.rowsRead,
    problems: header.problems,
    harmonised: decodeTable(header.harmonised, blob),
    harmoniseLedger: header.harmoniseLedger,
    summary: header.summary,
  };
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
