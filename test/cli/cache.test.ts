import { copyFileSync, existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { parse, stringify } from 'yaml';
import { generateProject } from '../../bench/generate-project.js';
import { CACHE_DIR, projectCache } from '../../lib/cli/cache/index.js';
import { readProject } from '../../lib/cli/read-project.js';
import { runPipeline, type InputCache, type PipelineResult } from '../../lib/pipeline/index.js';
import { tempDir, withTempCopy } from '../helpers/temp-dir.js';

/** A project with two samples files and two cells files (the benchmark's generator, split by cruise). */
function twoCruiseProject(): string {
  const dir = join(tempDir('cache'), 'project');
  generateProject(dir, 600, null);
  const config = parse(readFileSync(join(dir, 'basinquota.yaml'), 'utf8')) as { inputs: { samples: { path: string }[]; cells: { path: string }[] } };
  for (const [table, column] of [['samples', 0], ['cells', 1]] as const) {
    const [header, ...rows] = readFileSync(join(dir, `${table}.csv`), 'utf8').trimEnd().split('\n');
    const odd = (r: string) => Number(/CR(\d)/.exec(r.split(',')[column])?.[1]) % 2 === 1;
    writeFileSync(join(dir, `${table}-a.csv`), `${[header, ...rows.filter(odd)].join('\n')}\n`);
    writeFileSync(join(dir, `${table}-b.csv`), `${[header, ...rows.filter((r) => !odd(r))].join('\n')}\n`);
    const entry = config.inputs[table][0];
    config.inputs[table] = [{ ...entry, path: `${table}-a.csv` }, { ...entry, path: `${table}-b.csv` }];
  }
  copyFileSync(join('test', 'fixtures', 'grids', 'climatology.nc'), join(dir, 'dfe.nc'));
  (config.inputs as Record<string, unknown>).grids = [{ path: 'dfe.nc', quantity: 'dissolved_fe', variable: 'dfe' }];
  writeFileSync(join(dir, 'basinquota.yaml'), stringify(config));
  return dir;
}

const run = (dir: string, cache?: InputCache): PipelineResult => {
  const project = readProject(dir);
  if (!project.inputs) throw new Error(project.problems.map((p) => p.message).join('; '));
  return runPipeline(project.inputs, undefined, cache);
};

/** Everything a build shows, as plain data. */
const view = (r: PipelineResult) => ({
  samples: r.samples.objects(),
  cells: r.cells.objects(),
  ledger: r.ledger.entries,
  counts: r.counts,
  problems: r.problems,
  harmonise: r.harmonise,
  grids: r.grids,
  fits: r.fits,
  anomalies: r.anomalies,
});

describe('projectCache(dir) with runPipeline', () => {
  let base: string;
  beforeAll(() => {
    base = twoCruiseProject();
  });

  it('runPipeline(unchanged project, cache) hits every table file the second time and equals a build without the cache', () => {
    const dir = withTempCopy(base);
    const cold = projectCache(dir, { packageVersion: '1.0.0' });
    const first = run(dir, cold);
    expect(cold.stats).toEqual({ hits: 0, misses: 5, rejected: 0, writes: 5 });
    const warm = projectCache(dir, { packageVersion: '1.0.0' });
    const second = run(dir, warm);
    expect(warm.stats).toEqual({ hits: 5, misses: 0, rejected: 0, writes: 0 });
    const plain = view(run(dir));
    expect(first.grids).toHaveLength(1);
    expect(first.problems.filter((p) => p.severity === 'error')).toEqual([]);
    expect(first.fits).not.toBeNull();
    expect(view(first)).toEqual(plain);
    expect(view(second)).toEqual(plain);
    expect(readFileSync(join(dir, CACHE_DIR, '.gitignore'), 'utf8')).toBe('*\n');
  });

  it('runPipeline(one file changed, cache) re-reads only that file and equals a build without the cache', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const path = join(dir, 'cells-b.csv');
    const lines = readFileSync(path, 'utf8').trimEnd().split('\n');
    writeFileSync(path, `${lines.slice(0, -1).join('\n')}\n`);
    const cache = projectCache(dir, { packageVersion: '1.0.0' });
    const result = run(dir, cache);
    expect(cache.stats).toEqual({ hits: 4, misses: 1, rejected: 0, writes: 1 });
    expect(view(result)).toEqual(view(run(dir)));
  });

  it('runPipeline(grid file changed, cache) re-reads only the grid', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    copyFileSync(join('test', 'fixtures', 'grids', 'packed.nc'), join(dir, 'dfe.nc'));
    const cache = projectCache(dir, { packageVersion: '1.0.0' });
    const result = run(dir, cache);
    expect(cache.stats.misses).toBe(1);
    expect(cache.stats.hits).toBe(4);
    expect(result.grids).toHaveLength(1);
    expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
    expect(view(result)).toEqual(view(run(dir)));
  });

  it('runPipeline(harmonise block changed, cache) misses every file', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const configPath = join(dir, 'basinquota.yaml');
    const config = parse(readFileSync(configPath, 'utf8')) as Record<string, unknown>;
    writeFileSync(configPath, stringify({ ...config, harmonise: { default_density: 1030 } }));
    const cache = projectCache(dir, { packageVersion: '1.0.0' });
    const result = run(dir, cache);
    expect(cache.stats).toEqual({ hits: 0, misses: 5, rejected: 0, writes: 5 });
    expect(view(result)).toEqual(view(run(dir)));
  });

  it('runPipeline(one file entry changed, cache) misses only that file', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const configPath = join(dir, 'basinquota.yaml');
    const config = parse(readFileSync(configPath, 'utf8')) as { inputs: { samples: { cruise?: string; path: string }[] } };
    config.inputs.samples[1] = { ...config.inputs.samples[1], cruise: 'ignored-when-the-file-has-a-cruise-column' };
    writeFileSync(configPath, stringify(config));
    const cache = projectCache(dir, { packageVersion: '1.0.0' });
    run(dir, cache);
    expect(cache.stats).toEqual({ hits: 4, misses: 1, rejected: 0, writes: 1 });
  });

  it('runPipeline(other package version, cache) misses every file', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const cache = projectCache(dir, { packageVersion: '1.0.1' });
    run(dir, cache);
    expect(cache.stats).toEqual({ hits: 0, misses: 5, rejected: 0, writes: 5 });
  });

  it('runPipeline(corrupt and truncated entries, cache) ignores them, rebuilds the same result and rewrites them', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const entries = readdirSync(join(dir, CACHE_DIR)).filter((f) => f.endsWith('.bin')).map((f) => join(dir, CACHE_DIR, f));
    expect(entries).toHaveLength(5);
    const flipped = readFileSync(entries[0]);
    flipped[flipped.length - 3] ^= 0xff;
    writeFileSync(entries[0], flipped);
    writeFileSync(entries[1], readFileSync(entries[1]).subarray(0, 100));
    writeFileSync(entries[2], 'not a cache entry');
    const cache = projectCache(dir, { packageVersion: '1.0.0' });
    const result = run(dir, cache);
    expect(cache.stats).toEqual({ hits: 2, misses: 0, rejected: 3, writes: 3 });
    expect(view(result)).toEqual(view(run(dir)));
    const again = projectCache(dir, { packageVersion: '1.0.0' });
    run(dir, again);
    expect(again.stats.hits).toBe(5);
  });

  it('prune() removes the entries of inputs no longer in use', () => {
    const dir = withTempCopy(base);
    run(dir, projectCache(dir, { packageVersion: '1.0.0' }));
    const cache = projectCache(dir, { packageVersion: '2.0.0' });
    run(dir, cache);
    cache.prune();
    expect(readdirSync(join(dir, CACHE_DIR)).filter((f) => f.endsWith('.bin'))).toHaveLength(5);
    expect(existsSync(join(dir, CACHE_DIR, '.gitignore'))).toBe(true);
  });
});
