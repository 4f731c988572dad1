/** Command line: generate the seeded demo synthesis project into data/demo (or `--out DIR`). */
import { execFileSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { buildDemo } from './demo-gen/build-demo.js';

/** True when `ncgen` (Debian netcdf-bin) can be run. */
export function hasNcgen(): boolean {
  try {
    execFileSync('ncgen', ['-version'], { stdio: 'ignore' });
    return true;
  } catch {
    try {
      // Older ncgen builds have no -version flag but print usage and exit non-zero; a missing binary throws ENOENT.
      execFileSync('ncgen', [], { stdio: 'ignore' });
      return true;
    } catch (error) {
      return (error as NodeJS.ErrnoException).code !== 'ENOENT';
    }
  }
}

/** Write every demo file under `outDir`; compile the CDL files with ncgen when available. Returns the paths written. */
export function generateDemo(outDir: string, log: (line: string) => void = () => {}): string[] {
  const { text, netcdf } = buildDemo();
  const written: string[] = [];
  for (const [path, content] of [...text].sort(([a], [b]) => (a < b ? -1 : 1))) {
    const target = join(outDir, path);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, content);
    written.push(path);
  }
  if (hasNcgen()) {
    for (const { cdl, nc } of netcdf) {
      execFileSync('ncgen', ['-k', 'nc3', '-o', join(outDir, nc), join(outDir, cdl)]);
      written.push(nc);
    }
  } else log('ncgen not found (Debian package netcdf-bin): the .cdl files were written but the .nc files were not rebuilt');
  return written;
}

function main(argv: string[]): void {
  const at = argv.indexOf('--out');
  const outDir = at >= 0 ? argv[at + 1] : join(dirname(fileURLToPath(import.meta.url)), 'demo');
  if (!outDir) throw new Error('--out needs a folder');
  const written = generateDemo(outDir, (line) => console.warn(line));
  console.log(`wrote ${written.length} files to ${outDir}`);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) main(process.argv.slice(2));
