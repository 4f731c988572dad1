import type { Problem } from '../types.js';

/** `file:line:col message` (line and column left out when unknown), prefixed "warning:" for warnings. */
export function formatProblem(p: Problem): string {
  const where = p.line > 0 ? (p.col > 0 ? `${p.file}:${p.line}:${p.col}` : `${p.file}:${p.line}`) : p.file;
  return `${where} ${p.severity === 'warning' ? 'warning: ' : ''}${p.message}`;
}
