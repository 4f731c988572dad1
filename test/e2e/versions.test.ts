// Versions through the real command line: the committed demo is a fresh build; unchanged rebuilds keep the number; a changed input bumps it.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEMO_PATH } from '../helpers/build-demo.js';
import { REPO_ROOT, runCli } from '../helpers/run-cli.js';
import { readTree, treeDifferences } from '../helpers/site-files.js';
import { tempDir, withTempCopy } from '../helpers/temp-dir.js';

const versionOf = (site: string): string => /Version (\d+) ·/.exec(readFileSync(join(site, 'index.html'), 'utf8'))?.[1] ?? 'none';

describe('report versions', () => {
  it('npm run demo (basinquota demo) reproduces the committed _site-demo byte for byte', async () => {
    const out = join(tempDir('demo-fresh'), 'site');
    const run = await runCli(['demo', '--out', out], 300_000);
    expect(run.code, run.stderr).toBe(0);
    expect(treeDifferences(readTree(join(REPO_ROOT, '_site-demo')), readTree(out))).toEqual([]);
    expect(versionOf(out)).toBe('2');
  }, 300_000);

  it('an unchanged rebuild keeps the version; one removed cell makes version 2 whose changes page names exactly that cell', async () => {
    const project = withTempCopy(DEMO_PATH);
    const out = join(tempDir('versions'), 'site');
    // Fast builds: the bootstrap is not what this test is about.
    const configFile = join(project, 'basinquota.yaml');
    writeFileSync(configFile, readFileSync(configFile, 'utf8').replace('    n: 500\n', '    n: 0\n'));
    const first = await runCli(['build', project, '--out', out], 300_000);
    expect(first.code, first.stderr).toBe(0);
    expect(versionOf(out)).toBe('1');
    const firstTree = readTree(out);

    const again = await runCli(['build', project, '--out', out], 300_000);
    expect(again.code, again.stderr).toBe(0);
    expect(again.stderr).toMatch(/wrote version 1 to .*\(inputs unchanged\)/);
    expect(treeDifferences(firstTree, readTree(out))).toEqual([]);

    const cells = join(project, 'cells', 'SG2104_cells.csv');
    const lines = readFileSync(cells, 'utf8').trimEnd().split('\n');
    const removedId = lines[lines.length - 1].split(',')[0];
    writeFileSync(cells, `${lines.slice(0, -1).join('\n')}\n`);
    const changed = await runCli(['build', project, '--out', out], 300_000);
    expect(changed.code, changed.stderr).toBe(0);
    expect(versionOf(out)).toBe('2');
    const changes = readFileSync(join(out, 'changes.html'), 'utf8');
    const removed = /<td data-change="cells-removed">([\s\S]*?)<\/td>/.exec(changes)?.[1] ?? '';
    const added = /<td data-change="cells-added">([\s\S]*?)<\/td>/.exec(changes)?.[1] ?? '';
    expect(removed).toContain(removedId);
    expect(removed).toMatch(/^1\b/);
    expect(added).not.toMatch(/^[1-9]/);
    // The earlier version stays browsable.
    expect(readFileSync(join(out, 'versions', 'v1', 'index.html'), 'utf8')).toMatch(/Version 1 ·/);
    const diff = await runCli(['diff', 'v1', 'v2', project]);
    expect(diff.code, diff.stderr).toBe(0);
    expect(diff.stdout).toContain(removedId);
  }, 600_000);
});
