// Temporary folders under the system temp directory, removed when the test process exits.
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const made: string[] = [];
process.once('exit', () => {
  for (const dir of made) rmSync(dir, { recursive: true, force: true });
});

/** A fresh empty folder `basinquota-<prefix>-XXXXXX` in the system temp directory. */
export function tempDir(prefix: string): string {
  const dir = mkdtempSync(join(tmpdir(), `basinquota-${prefix}-`));
  made.push(dir);
  return dir;
}

/** Copy the project folder `dir` (without its archive and built site) into a fresh temp folder; resolves to the copy's path. */
export function withTempCopy(dir: string): string {
  const copy = join(tempDir('project'), 'project');
  cpSync(dir, copy, { recursive: true, filter: (path) => !/[\\/](archive|_site)$/.test(path) });
  return copy;
}
