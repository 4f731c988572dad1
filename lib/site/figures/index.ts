// Public names of the report-figures stage: build every figure and the page tables from the pipeline results.
export { buildFigures, siteFigures, FIGURE_DIR, type BuildFiguresOptions } from './build-figures.js';
export { pageSections, type PageSections, type QuotasSection, type AnomaliesSection, type FieldsSection, type ClassRow, type ModelRow, type ParameterRow, type AnomalyRow, type FTest } from './sections.js';
export type { SiteFigure, FigureContext } from './site-figure.js';
export { CARBON_PER_IRON_CAUTION, DEFAULT_FE_STAR_RATIO } from './messages.js';
export { sig, pText, withInterval } from './format.js';
