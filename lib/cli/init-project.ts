// `basinquota init DIR`: a new project copied from the shipped example (the version-1 demo project).
import { cpSync, existsSync, mkdirSync, readdirSync, renameSync } from 'node:fs';
import { join } from 'node:path';
import * as msg from './messages.js';
import { PACKAGE_ROOT } from './package-info.js';

/** Files of the example project that init does not copy. */
const SKIP = new Set(['archive', '_site', '.basinquota-cache', 'truth.json', 'truth-cells.csv', 'README.md', 'basinquota.yaml']);

/** Write an example project into `dir`; returns the exit code (0, or 2 when dir is not empty). */
export function initProject(dir: string, log: (line: string) => void): number {
  if (existsSync(dir) && readdirSync(dir).length > 0) {
    log(msg.initNotEmpty(dir));
    return 2;
  }
  mkdirSync(dir, { recursive: true });
  const example = join(PACKAGE_ROOT, 'data', 'demo');
  for (const name of readdirSync(example)) {
    if (SKIP.has(name)) continue;
    cpSync(join(example, name), join(dir, name), { recursive: true });
  }
  // The example is the first version of the demo: its config becomes the project's config.
  if (existsSync(join(dir, 'basinquota.v1.yaml'))) renameSync(join(dir, 'basinquota.v1.yaml'), join(dir, 'basinquota.yaml'));
  log(`wrote an example project to ${dir}; edit ${join(dir, 'basinquota.yaml')} and run basinquota check ${dir}`);
  return 0;
}
