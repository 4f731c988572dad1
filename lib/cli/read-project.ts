// Read a synthesis project from disk: the config, then every input file it names (the only place inputs are read).
import { readFileSync, realpathSync, existsSync } from 'node:fs';
import { basename, dirname, join, relative, resolve, sep } from 'node:path';
import { parseConfig } from '../config/index.js';
import type { ProjectInputs } from '../pipeline/index.js';
import type { InputBytes, Problem } from '../types.js';
import * as msg from './messages.js';
import { configHooks } from './config-hooks.js';

/** A project read from disk, or the problems that stopped reading it. */
export interface ReadProject {
  /** Absolute project folder. */
  dir: string;
  /** Inputs when the config is valid and every file exists. */
  inputs?: ProjectInputs;
  /** Problems found. */
  problems: Problem[];
}

/** Read `dir/configName` and every file it names; paths may not leave the project, even through symlinks. */
export function readProject(dirArg: string, configName = 'basinquota.yaml'): ReadProject {
  const configPath = resolve(dirArg, configName);
  const dir = dirname(configPath);
  const configFile = basename(configPath);
  if (!existsSync(configPath)) return { dir, problems: [{ file: configFile, line: 0, col: 0, message: msg.fileMissing(configFile), severity: 'error' }] };
  const text = readFileSync(configPath, 'utf8');
  const parsed = parseConfig(configFile, text, configHooks());
  if (!parsed.config) return { dir, problems: parsed.problems };
  const config = parsed.config;
  const problems: Problem[] = [...parsed.problems];
  const files = new Map<string, InputBytes>();
  const realDir = realpathSync(dir);
  const paths = [
    ...config.inputs.samples.map((s) => s.path),
    ...config.inputs.cells.map((c) => c.path),
    ...config.inputs.grids.map((g) => g.path),
    ...(typeof config.inputs.regions === 'object' && 'path' in config.inputs.regions ? [config.inputs.regions.path] : []),
  ];
  for (const path of paths) {
    if (files.has(path)) continue;
    const full = join(dir, path);
    if (!existsSync(full)) {
      problems.push({ file: configFile, line: 0, col: 0, message: msg.fileMissing(path), severity: 'error' });
      continue;
    }
    const real = realpathSync(full);
    const rel = relative(realDir, real);
    if (rel.startsWith('..') || rel.startsWith(sep)) {
      problems.push({ file: configFile, line: 0, col: 0, message: msg.symlinkLeaves(path), severity: 'error' });
      continue;
    }
    files.set(path, { name: path, bytes: new Uint8Array(readFileSync(real)) });
  }
  if (problems.some((p) => p.severity === 'error')) return { dir, problems };
  return { dir, inputs: { configFile, config, configText: text, files }, problems };
}
