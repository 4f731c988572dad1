// Everything the build adds to the report model and writes beside the pages: figures, method notes, supplement.
import type { Config } from '../config/index.js';
import type { PipelineResult } from '../pipeline/index.js';
import { toCsv, type ExtraFile, type ReportModel } from '../site/index.js';
import { methodsFiles, methodsSection } from '../site/methods/index.js';
import { supplementPack } from '../site/supplement/index.js';

const LEDGER_COLUMNS = ['table', 'file', 'line', 'stage', 'action', 'reason', 'detail'];

/** Fill the model's later sections (methods, supplement) and return the files to write with the site. */
export async function reportExtras(report: ReportModel, result: PipelineResult, config: Config, resultsJson: string): Promise<ExtraFile[]> {
  const ledgerCsv = toCsv(result.ledger.entries.map((e) => ({ ...e })), LEDGER_COLUMNS);
  const methods = methodsSection(result, config);
  report.sections.methods = methods;
  const pack = supplementPack({ figures: [], figureInfo: [], result, resultsJson, ledgerCsv, extra: methodsFiles(methods), date: report.meta.date });
  report.sections.supplement = pack.section;
  report.pages.push('methods.html', 'supplement.html');
  return pack.files;
}
