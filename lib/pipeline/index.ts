export { runPipeline, hasErrors, type PipelineResult } from './run-pipeline.js';
export type { ProjectInputs } from './project-inputs.js';
export { silentProgress, type Progress } from './progress.js';
export { concatTables, loadTables, type FileCount, type LoadedTables } from './load-tables.js';
