// One deterministic zip of site files.
import { zipSync, type Zippable } from 'fflate';
import type { ExtraFile } from '../extra-file.js';

const encoder = new TextEncoder();

/** Bytes of a file's data (text as UTF-8). */
export function fileBytes(data: string | Uint8Array): Uint8Array {
  return typeof data === 'string' ? encoder.encode(data) : data;
}

/**
 * A zip holding `files` under `prefix`-stripped names, entries sorted by name, each stamped `stamp`
 * (ISO date-time read as the zip's local DOS time, so the bytes do not depend on the time zone; years before 1980,
 * the DOS epoch, become 1980; an unreadable stamp and the default are 1980-01-01).
 */
export function zipFiles(files: readonly ExtraFile[], prefix = '', stamp = '1980-01-01T00:00:00Z'): Uint8Array {
  const parsed = new Date(stamp);
  const d = Number.isNaN(parsed.getTime()) ? new Date('1980-01-01T00:00:00Z') : parsed;
  const year = Math.max(1980, d.getUTCFullYear());
  // fflate writes DOS time from local-time getters; a Date built from local parts gives the same fields everywhere.
  const mtime = new Date(year, d.getUTCMonth(), d.getUTCDate(), d.getUTCHours(), d.getUTCMinutes(), d.getUTCSeconds());
  const sorted = [...files].sort((a, b) => (a.path < b.path ? -1 : a.path > b.path ? 1 : 0));
  const entries: Zippable = {};
  for (const f of sorted) {
    const name = f.path.startsWith(prefix) ? f.path.slice(prefix.length) : f.path;
    entries[name] = [fileBytes(f.data), { mtime, level: 6 }];
  }
  return zipSync(entries, { mtime, level: 6 });
}
