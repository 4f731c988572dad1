// Build the demo project once per test process with the real command line.
import { join, resolve } from 'node:path';
import { REPO_ROOT, runCli } from './run-cli.js';
import { tempDir, withTempCopy } from './temp-dir.js';

export { withTempCopy };

/** The demo synthesis project (config basinquota.yaml), relative to the repository root. */
export const DEMO_DIR = 'data/demo';

/** Absolute path of the demo project. */
export const DEMO_PATH = join(REPO_ROOT, DEMO_DIR);

/** Build a temp copy of project `dir` (so its archive never lands in the repository) into a fresh temp folder; rejects with the command's stderr on a non-zero exit. */
export async function buildSite(dir: string, label = 'site'): Promise<string> {
  const out = join(tempDir(label), 'site');
  const run = await runCli(['build', withTempCopy(resolve(REPO_ROOT, dir)), '--out', out]);
  if (run.code !== 0) throw new Error(`basinquota build ${dir} exited ${run.code}:\n${run.stderr}`);
  return out;
}

let demo: Promise<string> | undefined;

/** The demo site built into a temp folder, memoised per process; resolves to the site folder. */
export function buildDemoOnce(): Promise<string> {
  demo ??= buildSite(DEMO_DIR, 'demo');
  return demo;
}
