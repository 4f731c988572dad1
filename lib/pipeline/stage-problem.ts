// Errors a stage throws for bad input become problems with a location; anything else is a bug and is rethrown.
import type { Problem } from '../types.js';

/** An error that already names its file and line, thrown by a stage for input it cannot accept. */
export class InputError extends Error {
  constructor(
    readonly file: string,
    readonly line: number,
    readonly col: number,
    message: string,
    options?: { cause?: unknown },
  ) {
    super(message, options);
    this.name = 'InputError';
  }
}

/** Turn a thrown stage error into a Problem: InputError keeps its location; other errors with a message name the config file. */
export function stageProblem(error: unknown, fallbackFile: string): Problem {
  if (error instanceof InputError) return { file: error.file, line: error.line, col: error.col, message: error.message, severity: 'error' };
  const e = error as { file?: unknown; line?: unknown; col?: unknown; message?: unknown };
  if (typeof e?.file === 'string' && typeof e.message === 'string') {
    return { file: e.file, line: typeof e.line === 'number' ? e.line : 0, col: typeof e.col === 'number' ? e.col : 0, message: e.message, severity: 'error' };
  }
  if (error instanceof Error && error.name !== 'Error' && error.name !== 'TypeError' && error.name !== 'RangeError') {
    return { file: fallbackFile, line: 0, col: 0, message: error.message, severity: 'error' };
  }
  throw error;
}
