import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/run-cli.js';
import { tempDir } from '../helpers/temp-dir.js';

describe('basinquota init', () => {
  it('init DIR writes a commented project that check accepts; init into a non-empty folder exits 2', async () => {
    const dir = join(tempDir('init'), 'project');
    const made = await runCli(['init', dir]);
    expect(made.code, made.stderr).toBe(0);
    const config = readFileSync(join(dir, 'basinquota.yaml'), 'utf8');
    expect(config).toMatch(/^# basinquota synthesis project, made by `basinquota init`/);
    expect(config).toContain('# Bottle data, one file per cruise.');
    const check = await runCli(['check', dir]);
    expect(check.code, check.stderr).toBe(0);
    expect(check.stderr.trim().split('\n').at(-1)).toMatch(/^check passed/);
    writeFileSync(join(dir, 'extra.txt'), 'x');
    const again = await runCli(['init', dir]);
    expect(again.code).toBe(2);
    expect(again.stderr).toContain('is not empty; choose a new or empty folder');
  }, 120_000);

  it('--help of every command prints its usage and exits 0', async () => {
    for (const command of ['init', 'check', 'build', 'serve', 'diff', 'demo']) {
      const run = await runCli([command, '--help']);
      expect(run.code, command).toBe(0);
      expect(run.stdout, command).toMatch(new RegExp(`^basinquota ${command}\\b`));
    }
    const none = await runCli([]);
    expect(none.code).toBe(2);
    expect(none.stdout).toContain('Exit codes: 0 success, 1 invalid config or input');
  }, 120_000);
});
