// Checks the schema cannot express: paths inside the project, known canonical columns, units, class aliases.
import { CELL_COLUMNS, SAMPLE_COLUMNS } from '../load/canonical.js';
import * as msg from './messages.js';
import type { Config } from './schema.js';
import { checkRelativePath } from './project-path.js';
import { formatPath } from './format-path.js';

/** Optional checks supplied by other stages (e.g. the unit parser). */
export interface SemanticHooks {
  /** Returns an error message for a unit the quantity cannot take, or null. */
  validateUnit?: (quantity: string, unit: string, file: string) => string | null;
}

/** One semantic problem, located by key path. */
export interface SemanticProblem {
  /** Key path in the config. */
  path: PropertyKey[];
  /** What is wrong. */
  message: string;
  /** Point at the key rather than the value. */
  atKey?: boolean;
}

/** Find problems in a schema-valid config. */
export function checkConfigSemantics(config: Config, hooks: SemanticHooks): SemanticProblem[] {
  const out: SemanticProblem[] = [];
  const checkPath = (path: PropertyKey[], value: string): void => {
    const message = checkRelativePath(value);
    if (message) out.push({ path, message });
  };
  const firstUse = new Map<string, string>();
  const checkOnce = (path: PropertyKey[], value: string): void => {
    const where = firstUse.get(value);
    if (where) out.push({ path, message: msg.pathTwice(value, where) });
    else firstUse.set(value, formatPath(path.slice(0, -1)));
  };
  const tables = [
    ['samples', config.inputs.samples, SAMPLE_COLUMNS],
    ['cells', config.inputs.cells, CELL_COLUMNS],
  ] as const;
  for (const [table, entries, known] of tables) {
    entries.forEach((entry, i) => {
      checkPath(['inputs', table, i, 'path'], entry.path);
      checkOnce(['inputs', table, i, 'path'], entry.path);
      for (const name of Object.keys(entry.columns)) {
        if (!(name in known)) out.push({ path: ['inputs', table, i, 'columns', name], message: msg.unknownCanonicalColumn(name, table.slice(0, -1)), atKey: true });
      }
      for (const [name, unit] of Object.entries(entry.units)) {
        if (!(name in known)) {
          out.push({ path: ['inputs', table, i, 'units', name], message: msg.unknownCanonicalColumn(name, table.slice(0, -1)), atKey: true });
          continue;
        }
        const problem = hooks.validateUnit?.(name, unit, entry.path);
        if (problem) out.push({ path: ['inputs', table, i, 'units', name], message: msg.badUnit(problem) });
      }
    });
  }
  config.inputs.grids.forEach((grid, i) => checkPath(['inputs', 'grids', i, 'path'], grid.path));
  if (typeof config.inputs.regions === 'object' && 'path' in config.inputs.regions) checkPath(['inputs', 'regions', 'path'], config.inputs.regions.path);
  const aliasOwner = new Map<string, string>();
  for (const [name, cls] of Object.entries(config.classes)) {
    for (const alias of [name, ...cls.aliases]) {
      const key = alias.trim().toLowerCase();
      const first = aliasOwner.get(key);
      if (first && first !== name) out.push({ path: ['classes', name, 'aliases'], message: msg.aliasTwice(alias, first, name) });
      else aliasOwner.set(key, name);
    }
    if (cls.carbon === 'biovolume-factor' && !config.carbon.factor_fg_per_um3) out.push({ path: ['classes', name, 'carbon'], message: msg.factorMissing(name) });
  }
  return out;
}
