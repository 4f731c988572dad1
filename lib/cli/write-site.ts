// Render the site with Eleventy into a temporary folder and swap it in only when everything succeeded.
import { existsSync, mkdirSync, renameSync, rmSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import Eleventy from '@11ty/eleventy';
import type { ExtraFile, ReportModel } from '../site/index.js';
import { PACKAGE_ROOT } from './package-info.js';
import { recoverStaleBuilds } from './stale-builds.js';

export type { ExtraFile };

/** Write the whole site to `outDir` atomically: build in `outDir.tmp-<pid>`, then rename over the old site. */
export async function writeSite(report: ReportModel, extras: ExtraFile[], outDirArg: string): Promise<void> {
  const outDir = resolve(outDirArg);
  mkdirSync(dirname(outDir), { recursive: true });
  recoverStaleBuilds(outDir);
  const tmp = `${outDir}.tmp-${process.pid}`;
  rmSync(tmp, { recursive: true, force: true });
  try {
    await renderPages(report, tmp);
    for (const file of extras) {
      const target = join(tmp, ...file.path.split('/'));
      mkdirSync(dirname(target), { recursive: true });
      writeFileSync(target, file.data);
    }
    const old = `${outDir}.old-${process.pid}`;
    if (existsSync(outDir)) renameSync(outDir, old);
    renameSync(tmp, outDir);
    rmSync(old, { recursive: true, force: true });
  } catch (error) {
    rmSync(tmp, { recursive: true, force: true });
    throw error;
  }
}

/** Run Eleventy over content/ with the report model as global data `report`. */
async function renderPages(report: ReportModel, outDir: string): Promise<void> {
  const cwd = process.cwd();
  // Eleventy resolves its input, config and passthrough paths against the working directory.
  process.chdir(PACKAGE_ROOT);
  try {
    const eleventy = new Eleventy('content', outDir, {
      quietMode: true,
      configPath: '.eleventy.js',
      config(eleventyConfig: { addGlobalData(name: string, value: unknown): void }) {
        eleventyConfig.addGlobalData('report', report);
      },
    });
    await eleventy.write();
  } finally {
    process.chdir(cwd);
  }
}
