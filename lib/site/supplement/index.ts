// Public names of the supplementary pack.
export { supplementPack, mergedCellsCsv, SUPPLEMENT_PATHS, type SupplementInput } from './supplement-pack.js';
export { zipFiles } from './zip-files.js';
export type { SupplementSection, SupplementFigure, SupplementFile, SupplementFigureInfo } from './supplement-model.js';
