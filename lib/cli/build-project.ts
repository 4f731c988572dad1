// `basinquota build`: read, run the pipeline, number the version, model the report, write the site atomically, archive.
import { join } from 'node:path';
import { decodeColumnarInputs, hasErrors, runPipeline, type PipelineResult } from '../pipeline/index.js';
import { buildReportModel, buildResults, buildSnapshot, type ReportModel } from '../site/index.js';
import { buildManifest, diffSnapshots, firstVersionChanges, nextVersion, prettyJson } from '../version/index.js';
import { ArchiveError, archivedSiteFiles, readArchive, writeArchiveVersion } from './archive.js';
import { buildDate } from './build-date.js';
import { projectCache } from './cache/index.js';
import { formatProblem } from './format-problem.js';
import { packageVersion } from './package-info.js';
import { progressPrinter } from './progress-printer.js';
import { readProject } from './read-project.js';
import { reportExtras } from './report-extras.js';
import { summaryLines } from './summary-lines.js';
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
  /** Reuse per-file results from DIR/.basinquota-cache and update it; default true. */
  cache?: boolean;
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
  const inputs = project.inputs;
  const columnarProblems = await decodeColumnarInputs(inputs);
  for (const p of columnarProblems) log(formatProblem(p));
  if (hasErrors(columnarProblems)) return { code: 1 };
  log(`basinquota build ${project.dir}`);
  const cache = options.cache === false ? undefined : projectCache(project.dir, { packageVersion: packageVersion() });
  const result = runPipeline(inputs, progressPrinter(log), cache);
  cache?.prune();
  for (const p of result.problems) log(formatProblem(p));
  if (hasErrors(result.problems)) return { code: 1, result };

  let archive;
  try {
    archive = readArchive(project.dir);
  } catch (error) {
    if (error instanceof ArchiveError) {
      log(error.message);
      return { code: 1, result };
    }
    throw error;
  }
  const results = buildResults(result);
  const manifest = buildManifest({
    configText: inputs.configText,
    files: [...inputs.files.values()].map((f) => ({ path: f.name, bytes: f.bytes })),
    packageVersion: packageVersion(),
    nodeVersion: process.version,
    results,
  });
  const next = nextVersion(manifest, archive);
  const date = buildDate(result);
  const snapshot = buildSnapshot(result, next.version, date);
  const previous = archive.find((a) => a.version === next.previous);
  const report = buildReportModel(inputs.config, result, { version: next.version, date, toolVersion: packageVersion() });
  report.sections.changes = previous ? diffSnapshots(previous.snapshot, snapshot) : firstVersionChanges(snapshot);
  report.pages.push('changes.html');
  const extras = await reportExtras(report, result, inputs.config, prettyJson(results), log);
  const out = options.out ?? join(project.dir, '_site');
  try {
    await writeSite(report, [...extras, ...archivedSiteFiles(project.dir, next.version)], out);
    writeArchiveVersion(project.dir, next.version, { manifest, snapshot, results, siteDir: out });
  } catch (error) {
    if (error instanceof ArchiveError) {
      log(error.message);
      return { code: 1, report, result };
    }
    log(`cannot write the site to ${out}: ${error instanceof Error ? error.message : String(error)}`);
    return { code: 3, report, result };
  }
  for (const line of summaryLines(result)) log(line);
  log(`wrote version ${next.version} to ${out}${next.changed ? '' : ' (inputs unchanged)'}`);
  return { code: 0, report, result };
}
