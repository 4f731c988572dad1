// `basinquota check`: validate the config and run every stage in memory; print problems; write nothing.
import { decodeColumnarInputs, hasErrors, runPipeline, silentProgress } from '../pipeline/index.js';
import { formatProblem } from './format-problem.js';
import * as msg from './messages.js';
import { readProject } from './read-project.js';

/** Check a project; returns the exit code (0 ok, 1 errors). */
export async function checkProject(dir: string, config: string | undefined, log: (line: string) => void): Promise<number> {
  const project = readProject(dir, config);
  const problems = [...project.problems];
  if (project.inputs) problems.push(...(await decodeColumnarInputs(project.inputs)));
  if (project.inputs && !hasErrors(problems)) {
    const result = runPipeline(project.inputs, silentProgress);
    problems.push(...result.problems);
    for (const e of result.ledger.entries) {
      if (e.action === 'excluded') problems.push({ file: e.file, line: e.line, col: 0, message: `${e.reason}: ${e.detail} (row excluded)`, severity: 'warning' });
    }
  }
  problems.sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line);
  for (const p of problems) log(formatProblem(p));
  const errors = problems.filter((p) => p.severity === 'error').length;
  log(msg.checkSummary(errors, problems.length - errors));
  return hasErrors(problems) ? 1 : 0;
}
