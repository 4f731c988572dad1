// Errors a stage throws for input it cannot accept become located problems; programming errors are rethrown.
import type { Problem } from '../types.js';

/** Error kinds that mean a bug in basinquota, never bad input. */
const BUG_ERRORS = new Set(['TypeError', 'RangeError', 'ReferenceError', 'SyntaxError']);

/**
 * Turn a thrown stage error into a Problem. Stage messages begin with the file they concern
 * (`file: …` or `file:line: …`); that prefix becomes the location. Anything else names `fallbackFile`.
 */
export function stageProblem(error: unknown, fallbackFile: string, knownFiles: readonly string[] = []): Problem {
  if (!(error instanceof Error) || BUG_ERRORS.has(error.name)) throw error;
  const message = error.message;
  for (const file of [...knownFiles, fallbackFile].sort((a, b) => b.length - a.length)) {
    if (!message.startsWith(`${file}:`)) continue;
    const rest = message.slice(file.length + 1);
    const m = /^(\d+)(?::(\d+))?:\s*/.exec(rest);
    if (m) return { file, line: Number(m[1]), col: m[2] ? Number(m[2]) : 0, message: rest.slice(m[0].length), severity: 'error' };
    return { file, line: 0, col: 0, message: rest.trimStart(), severity: 'error' };
  }
  return { file: fallbackFile, line: 0, col: 0, message, severity: 'error' };
}
