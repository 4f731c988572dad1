// The checks other stages lend the config validator.
import type { SemanticHooks } from '../config/index.js';

/** Hooks passed to parseConfig by the command line. */
export function configHooks(): SemanticHooks {
  return {};
}
