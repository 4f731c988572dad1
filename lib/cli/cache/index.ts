export { projectCache, CACHE_DIR, type ProjectCache, type ProjectCacheOptions, type CacheStats } from './project-cache.js';
export { tableCacheKey, gridCacheKey, CACHE_FORMAT_VERSION } from './cache-key.js';
export { encodeGrid, decodeGrid, type GridHeader } from './grid-codec.js';
export { encodeTable, decodeTable, type EncodedTable, type TableHeader, type ColumnHeader } from './table-codec.js';
