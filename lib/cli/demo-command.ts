// `basinquota demo`: build the demo project's two versions (the first cruises, then after the held-back cruise) into one site.
import { cpSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildProject } from './build-project.js';
import { PACKAGE_ROOT } from './package-info.js';

/** The demo's configs in version order. */
const DEMO_CONFIGS = ['basinquota.v1.yaml', 'basinquota.yaml'];

/** Build version 1 then version 2 of data/demo into `out` (default _site-demo); the archive lives in a temporary copy. */
export async function demoCommand(out: string | undefined, log: (line: string) => void): Promise<number> {
  const source = join(PACKAGE_ROOT, 'data', 'demo');
  const work = mkdtempSync(join(tmpdir(), 'basinquota-demo-'));
  try {
    cpSync(source, work, { recursive: true, filter: (path) => !/[\\/](archive|_site)$/.test(path) });
    const target = out ?? join(PACKAGE_ROOT, '_site-demo');
    for (const config of DEMO_CONFIGS) {
      const outcome = await buildProject({ dir: work, config, out: target, log });
      if (outcome.code !== 0) return outcome.code;
    }
    return 0;
  } finally {
    rmSync(work, { recursive: true, force: true });
  }
}
