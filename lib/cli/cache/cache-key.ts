// The content hash that names a cache entry.
import { createHash } from 'node:crypto';
import type { GridCacheKey, TableCacheKey } from '../../pipeline/index.js';

/** Version of the entry layout; bump it when the stored format or what is stored changes. */
export const CACHE_FORMAT_VERSION = 1;

/**
 * SHA-256 (hex) over the cache format version, the basinquota version, the table, the path, the JSON of the
 * file's config entry, the JSON of the config's harmonise block, and the file's bytes: any change to one of
 * them gives another name, so a stale entry is never read.
 */
export function tableCacheKey(key: TableCacheKey, packageVersion: string): string {
  const hash = createHash('sha256');
  const text = JSON.stringify(['basinquota-cache', CACHE_FORMAT_VERSION, packageVersion, 'table', key.table, key.path, key.entry, key.harmonise, key.bytes.length]);
  hash.update(text);
  hash.update('\u0000');
  hash.update(key.bytes);
  return hash.digest('hex');
}

/** SHA-256 (hex) naming a grid entry: format and basinquota versions, the path, the JSON of the grid's config entry, the default density, and the file's bytes. */
export function gridCacheKey(key: GridCacheKey, packageVersion: string): string {
  const hash = createHash('sha256');
  hash.update(JSON.stringify(['basinquota-cache', CACHE_FORMAT_VERSION, packageVersion, 'grid', key.path, key.entry, key.density, key.bytes.length]));
  hash.update('\u0000');
  hash.update(key.bytes);
  return hash.digest('hex');
}
