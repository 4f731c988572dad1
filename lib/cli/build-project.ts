// `basinquota build`: read, run the pipeline, model the report, write the site atomically.
import { join } from 'node:path';
import { hasErrors, runPipeline, type PipelineResult } from '../pipeline/index.js';
import { buildReportModel, type ReportModel } from '../site/index.js';
import { buildDate } from './build-date.js';
import { formatProblem } from './format-problem.js';
import { packageVersion } from './package-info.js';
import { progressPrinter } from './progress-printer.js';
import { readProject } from './read-project.js';
import { supplementFiles } from './supplement-files.js';
import { writeSite } from './write-site.js';

/** Options of one build. */
export interface BuildOptions {
  /** Project folder. */
  dir: string;
  /** Config file name inside the project; default basinquota.yaml. */
  config?: string;
  /** Output folder; default DIR/_site. */
  out?: string;
  /** Where messages go (stderr by default). */
  log?: (line: string) => void;
}

/** Result of a build: the exit code, and the model and pipeline result when it got that far. */
export interface BuildOutcome {
  /** Process exit code (0, 1 or 3). */
  code: number;
  /** Report model, when built. */
  report?: ReportModel;
  /** Pipeline result, when it ran. */
  result?: PipelineResult;
}

/** Build one project's site. */
export async function buildProject(options: BuildOptions): Promise<BuildOutcome> {
  const log = options.log ?? ((line: string) => process.stderr.write(`${line}\n`));
  const project = readProject(options.dir, options.config);
  for (const p of project.problems) log(formatProblem(p));
  if (!project.inputs) return { code: 1 };
  log(`basinquota build ${project.dir}`);
  const result = runPipeline(project.inputs, progressPrinter(log));
  for (const p of result.problems) log(formatProblem(p));
  if (hasErrors(result.problems)) return { code: 1, result };
  const report = buildReportModel(project.inputs.config, result, { version: 1, date: buildDate(result), toolVersion: packageVersion() });
  const out = options.out ?? join(project.dir, '_site');
  try {
    await writeSite(report, supplementFiles(result), out);
  } catch (error) {
    log(`cannot write the site to ${out}: ${error instanceof Error ? error.message : String(error)}`);
    return { code: 3, report, result };
  }
  log(`wrote ${out}`);
  return { code: 0, report, result };
}
