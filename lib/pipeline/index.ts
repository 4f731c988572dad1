export { runPipeline, hasErrors, fitInput, type PipelineResult } from './run-pipeline.js';
export { stageProblem } from './stage-problem.js';
export type { QuantityGrid } from './read-grids.js';
export type { ProjectInputs } from './project-inputs.js';
export { silentProgress, type Progress } from './progress.js';
export { concatTables, loadTables, type FileCount, type LoadedTables } from './load-tables.js';
export { decodeColumnarInputs } from './decode-columnar-inputs.js';
export type { InputCache, CachedTableFile, TableCacheKey, CachedGrid, GridCacheKey } from './input-cache.js';
