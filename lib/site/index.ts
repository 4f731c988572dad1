export { buildReportModel, type BuildFacts } from './build-report-model.js';
export type { ReportModel, ReportMeta, ReportCounts, FileAccount } from './report-model.js';
export { inventoryByCruise, groupLedger, countBy, type CruiseInventory, type LedgerGroup } from './inventory.js';
export { toCsv, csvField, neutraliseCell } from './csv.js';
export type { ExtraFile } from './extra-file.js';
export type { FigureEntry, FigurePage } from './figure-entry.js';
export { buildResults, type BuildResults } from './build-results.js';
export { buildSnapshot } from './build-snapshot.js';
