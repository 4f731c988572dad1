// Run one corpus case in-process: the `check` output and exit code, the pipeline result for the ledger invariant.
import { checkProject } from '../../lib/cli/check-project.js';
import { checkReport } from '../../lib/cli/check-report.js';
import { readProject } from '../../lib/cli/read-project.js';
import { decodeColumnarInputs, hasErrors, runPipeline, type PipelineResult } from '../../lib/pipeline/index.js';
import type { LedgerEntry, Problem } from '../../lib/types.js';
import type { CorpusCase } from './cases.js';
import { makeProject } from './make-project.js';

/** What a case produced. */
export interface CaseRun {
  /** Exit code of `check`. */
  exit: number;
  /** Lines `check` printed. */
  lines: string[];
  /** Pipeline result when the project could be read. */
  result?: PipelineResult;
}

/** Write the case's project. */
export function writeCase(c: CorpusCase): string {
  const dir = makeProject(c.patch);
  c.setup?.(dir);
  return dir;
}

/** Run `check` on the case's project through checkProject itself (slower: the pipeline result is not kept). */
export async function checkCase(c: CorpusCase): Promise<{ exit: number; lines: string[] }> {
  const lines: string[] = [];
  const exit = await checkProject(writeCase(c), undefined, (l) => lines.push(l));
  return { exit, lines };
}

/**
 * Run the case once and print what `check` prints, keeping the pipeline result: the same steps as checkProject
 * (lib/cli/check-project.ts), so one pipeline run gives both; `checkCase` confirms they agree.
 */
export async function runCase(c: CorpusCase): Promise<CaseRun> {
  const project = readProject(writeCase(c));
  const problems: Problem[] = [...project.problems];
  if (project.inputs) problems.push(...(await decodeColumnarInputs(project.inputs)));
  const result = project.inputs && !hasErrors(problems) ? runPipeline(project.inputs) : undefined;
  if (result) problems.push(...result.problems);
  const { lines, exit } = checkReport(problems, result?.ledger);
  return { exit, lines, result };
}

/** One ledger row as `file:line action reason: detail`. */
export function formatEntry(e: LedgerEntry): string {
  return `${e.file}:${e.line} ${e.action} ${e.reason}: ${e.detail}`;
}

/** Load and harmonise ledger rows that `check` does not print (converted or flagged values). */
export function valueNotes(result: PipelineResult | undefined): string[] {
  if (!result) return [];
  return result.ledger.entries.filter((e) => (e.stage === 'load' || e.stage === 'harmonise') && e.action !== 'excluded').map(formatEntry);
}

/** Per file: rows read, rows in the final tables, rows ledgered as excluded (distinct lines). */
export function ledgerBalance(result: PipelineResult): { file: string; read: number; used: number; excluded: number }[] {
  const byFile = new Map<string, { read: number; table: string }>();
  for (const c of result.counts) {
    const prev = byFile.get(c.file);
    byFile.set(c.file, { read: (prev?.read ?? 0) + c.rowsRead, table: c.table });
  }
  return [...byFile.entries()].map(([file, { read, table }]) => {
    const t = table === 'samples' ? result.samples : result.cells;
    const files = t.numRows() > 0 ? (t.array('source_file') as ArrayLike<string>) : [];
    let used = 0;
    for (let i = 0; i < files.length; i++) if (files[i] === file) used++;
    const excluded = new Set(result.ledger.entries.filter((e) => e.action === 'excluded' && e.file === file && e.table === table).map((e) => e.line)).size;
    return { file, read, used, excluded };
  });
}
