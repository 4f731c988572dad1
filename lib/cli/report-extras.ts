// Everything the build adds to the report model and writes beside the pages: figures, method notes, supplement.
import type { Config } from '../config/index.js';
import type { PipelineResult } from '../pipeline/index.js';
import { toCsv, type ExtraFile, type ReportModel } from '../site/index.js';

const LEDGER_COLUMNS = ['table', 'file', 'line', 'stage', 'action', 'reason', 'detail'];

/** Fill the model's later sections and return the files to write with the site. */
export async function reportExtras(report: ReportModel, result: PipelineResult, _config: Config, resultsJson: string): Promise<ExtraFile[]> {
  const ledgerCsv = toCsv(result.ledger.entries.map((e) => ({ ...e })), LEDGER_COLUMNS);
  void report;
  return [
    { path: 'supplement/ledger.csv', data: ledgerCsv },
    { path: 'supplement/results.json', data: resultsJson },
  ];
}
