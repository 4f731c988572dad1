// The checks other stages lend the config validator.
import type { SemanticHooks } from '../config/index.js';
import { validateUnit } from '../units/index.js';

/** Hooks passed to parseConfig by the command line: units are checked by the unit parser itself. */
export function configHooks(): SemanticHooks {
  return { validateUnit: (quantity, unit) => validateUnit(quantity, unit) };
}
