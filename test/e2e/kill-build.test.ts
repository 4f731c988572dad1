// A build killed at any moment leaves the previous site and archive as they were, and the next build succeeds.
import { spawn } from 'node:child_process';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { makeProject } from '../corpus/make-project.js';
import { REPO_ROOT, runCli } from '../helpers/run-cli.js';
import { readTree, treeDifferences } from '../helpers/site-files.js';
import { tempDir } from '../helpers/temp-dir.js';

/** Start a build and SIGKILL it after `ms`; resolves when the process is gone. */
function killBuildAfter(project: string, out: string, ms: number): Promise<void> {
  return new Promise((resolve) => {
    const child = spawn(process.execPath, ['bin/basinquota.js', 'build', project, '--out', out], { cwd: REPO_ROOT, stdio: 'ignore' });
    const timer = setTimeout(() => child.kill('SIGKILL'), ms);
    child.on('exit', () => {
      clearTimeout(timer);
      resolve();
    });
  });
}

describe('a killed build', () => {
  it('SIGKILL at several points leaves the previous site and archive intact, and the next build succeeds', async () => {
    const project = makeProject();
    const out = join(tempDir('killed'), 'site');
    const first = await runCli(['build', project, '--out', out]);
    expect(first.code, first.stderr).toBe(0);
    const site = readTree(out);
    const archive = readTree(join(project, 'archive'));
    // A changed config, so every killed build would have written a new version 2.
    const config = join(project, 'basinquota.yaml');
    writeFileSync(config, `${readFileSync(config, 'utf8')}# edited\n`);
    for (const ms of [300, 1500, 3000, 4500, 6000, 7500]) {
      await killBuildAfter(project, out, ms);
      const now = readTree(out);
      // Either the kill came before the swap (the old site) or after it (a complete new site): never a mixture.
      const unchanged = treeDifferences(site, now).length === 0;
      if (!unchanged) expect(readdirSync(out)).toContain('index.html');
      expect(treeDifferences(archive, readTree(join(project, 'archive'))).filter((d) => !d.includes('v2/'))).toEqual([]);
    }
    const next = await runCli(['build', project, '--out', out]);
    expect(next.code, next.stderr).toBe(0);
    expect(next.stderr).toMatch(/wrote version 2 to /);
    // No half-written folders are left beside the site.
    expect(readdirSync(join(out, '..')).filter((n) => /\.(tmp|old)-\d+$/.test(n))).toEqual([]);
  }, 300_000);

  it('an output folder that cannot be created gives a clear message and exit code 3', async () => {
    const project = makeProject();
    const blocker = join(tempDir('blocked'), 'a-file');
    writeFileSync(blocker, 'not a folder');
    const run = await runCli(['build', project, '--out', join(blocker, 'site')]);
    expect(run.code).toBe(3);
    expect(run.stderr).toMatch(/^cannot write the site to .*a-file\/site: /m);
    expect(run.stderr).not.toContain('    at ');
  }, 120_000);
});
