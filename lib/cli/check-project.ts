// `basinquota check`: validate the config and run every stage in memory; print problems; write nothing.
import { decodeColumnarInputs, hasErrors, runPipeline, silentProgress } from '../pipeline/index.js';
import { checkReport } from './check-report.js';
import { readProject } from './read-project.js';

/** Check a project; returns the exit code (0 ok, 1 errors). */
export async function checkProject(dir: string, config: string | undefined, log: (line: string) => void): Promise<number> {
  const project = readProject(dir, config);
  const problems = [...project.problems];
  if (project.inputs) problems.push(...(await decodeColumnarInputs(project.inputs)));
  const result = project.inputs && !hasErrors(problems) ? runPipeline(project.inputs, silentProgress) : undefined;
  if (result) problems.push(...result.problems);
  const { lines, exit } = checkReport(problems, result?.ledger);
  for (const line of lines) log(line);
  return exit;
}
