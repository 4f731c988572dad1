// `basinquota init DIR`: a new project made from the shipped example (version 1 of the demo): its config and the files it names.
import { copyFileSync, existsSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { parseConfig } from '../config/index.js';
import * as msg from './messages.js';
import { PACKAGE_ROOT } from './package-info.js';

/** The example's config inside the package. */
const EXAMPLE_CONFIG = join(PACKAGE_ROOT, 'data', 'demo', 'basinquota.v1.yaml');

/** The comment block that opens a project made by init (replacing the demo's own header). */
const HEADER = `# basinquota synthesis project, made by \`basinquota init\` from the shipped example.
# The example data are invented (programme, ships, cruises, people). Replace the files under samples/,
# cells/ and grids/ with your own, map your column headers and units below, then run
#   basinquota check .    and    basinquota build .
# Editors can validate this file against schema/basinquota.schema.json of the basinquota package.
`;

/** Write an example project into `dir`; returns the exit code (0, or 2 when dir is not empty). */
export function initProject(dir: string, log: (line: string) => void): number {
  if (existsSync(dir) && readdirSync(dir).length > 0) {
    log(msg.initNotEmpty(dir));
    return 2;
  }
  const text = readFileSync(EXAMPLE_CONFIG, 'utf8');
  const { config } = parseConfig('basinquota.yaml', text);
  if (!config) throw new Error('the shipped example config does not validate');
  mkdirSync(dir, { recursive: true });
  const paths = [...config.inputs.samples, ...config.inputs.cells, ...config.inputs.grids].map((e) => e.path);
  for (const path of paths) {
    mkdirSync(dirname(join(dir, path)), { recursive: true });
    copyFileSync(join(PACKAGE_ROOT, 'data', 'demo', path), join(dir, path));
  }
  // Keep the example's explanatory comments on the settings; only the opening block is the demo's own.
  const body = text.replace(/^(#[^\n]*\n)+\n?/, '');
  writeFileSync(join(dir, 'basinquota.yaml'), `${HEADER}\n${body}`);
  log(`wrote an example project to ${dir}; edit ${join(dir, 'basinquota.yaml')} and run basinquota check ${dir}`);
  return 0;
}
