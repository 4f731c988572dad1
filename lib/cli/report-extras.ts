// Everything the build adds to the report model and writes beside the pages: figures, method notes, supplement.
import type { Config } from '../config/index.js';
import { createRenderer } from '../figures/index.js';
import type { PipelineResult } from '../pipeline/index.js';
import { toCsv, type ExtraFile, type ReportModel } from '../site/index.js';
import { buildFigures, pageSections } from '../site/figures/index.js';
import { methodsFiles, methodsSection } from '../site/methods/index.js';
import { supplementPack } from '../site/supplement/index.js';
import { loadFigureFont } from './fonts.js';

const LEDGER_COLUMNS = ['table', 'file', 'line', 'stage', 'action', 'reason', 'detail'];

/** Fill the model's figure, page, methods and supplement sections and return the files to write with the site. */
export async function reportExtras(report: ReportModel, result: PipelineResult, config: Config, resultsJson: string, log: (line: string) => void): Promise<ExtraFile[]> {
  const warnings = new Set<string>();
  const renderer = createRenderer({ ...loadFigureFont(), onWarning: (m) => warnings.add(m) });
  const started = performance.now();
  const figures = await buildFigures(result, config, renderer);
  log(`  figures    ${String(figures.entries.length).padStart(8)} figures, ${figures.files.length} files  ${((performance.now() - started) / 1000).toFixed(2)} s`);
  for (const w of [...warnings].sort()) log(`  figure warning: ${w}`);
  const sections = pageSections(result, config);
  report.sections.figures = figures.entries;
  report.sections.fields = sections.fields;
  report.sections.quotas = sections.quotas;
  report.sections.anomalies = sections.anomalies;
  const ledgerCsv = toCsv(result.ledger.entries.map((e) => ({ ...e })), LEDGER_COLUMNS);
  const methods = methodsSection(result, config);
  report.sections.methods = methods;
  const pack = supplementPack({ figures: figures.files, figureInfo: figures.entries, result, resultsJson, ledgerCsv, extra: methodsFiles(methods), date: report.meta.date });
  report.sections.supplement = pack.section;
  report.pages.push('fields.html', 'quotas.html', 'anomalies.html', 'methods.html', 'supplement.html');
  return [...figures.files, ...pack.files];
}
