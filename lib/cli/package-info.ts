// Where the package lives on disk and its version (the shell may read its own package.json).
import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Absolute folder of the installed basinquota package. */
export const PACKAGE_ROOT = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

/** basinquota's version from package.json. */
export function packageVersion(): string {
  return (JSON.parse(readFileSync(join(PACKAGE_ROOT, 'package.json'), 'utf8')) as { version: string }).version;
}
