// What `basinquota check` prints: every problem and excluded row as file:line, then counts of values converted or flagged.
import type { Ledger } from '../ledger/index.js';
import type { Problem } from '../types.js';
import { formatProblem } from './format-problem.js';
import * as msg from './messages.js';

/** The printed lines of a check and its exit code (1 when any problem is an error). */
export function checkReport(readProblems: readonly Problem[], ledger?: Ledger): { lines: string[]; exit: number } {
  const problems = [...readProblems];
  for (const e of ledger?.entries ?? []) {
    if (e.action === 'excluded') problems.push({ file: e.file, line: e.line, col: 0, message: `${e.reason}: ${e.detail} (row excluded)`, severity: 'warning' });
  }
  problems.sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line);
  const lines = problems.map(formatProblem);
  for (const c of ledger?.countsByReason() ?? []) {
    if (c.action !== 'excluded') lines.push(msg.ledgerCount(c.table, c.action, c.reason, c.count));
  }
  const errors = problems.filter((p) => p.severity === 'error').length;
  lines.push(msg.checkSummary(errors, problems.length - errors));
  return { lines, exit: errors > 0 ? 1 : 0 };
}
