export { parseConfig, MAX_YAML_ALIASES, type ParsedConfig } from './parse-config.js';
export { configSchema, type Config, type SampleInputConfig, type CellInputConfig, type GridInputConfig, type ClassConfig } from './schema.js';
export { checkRelativePath } from './project-path.js';
export type { SemanticHooks } from './check-semantics.js';
export { configJsonSchema } from './json-schema.js';
