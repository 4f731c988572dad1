// Files of the supplement written beside the pages: the ledger and the tables as CSV.
import type { PipelineResult } from '../pipeline/index.js';
import { toCsv } from '../site/index.js';
import type { ExtraFile } from './write-site.js';

const LEDGER_COLUMNS = ['table', 'file', 'line', 'stage', 'action', 'reason', 'detail'];

/** The supplement's data files for one build. */
export function supplementFiles(result: PipelineResult): ExtraFile[] {
  const ledgerRows = result.ledger.entries.map((e) => ({ ...e }));
  return [{ path: 'supplement/ledger.csv', data: toCsv(ledgerRows, LEDGER_COLUMNS) }];
}
