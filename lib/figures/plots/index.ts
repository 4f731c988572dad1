// Public names of the plot builders: each a pure function from plain arrays to a Vega-Lite spec.
export { feCVsDfeSpec, type FeCPoint, type FeCFitPoint, type FeCVsDfeOptions } from './fe-c-vs-dfe.js';
export { classComparisonSpec, type ClassValue, type ClassSummary } from './class-comparison.js';
export { residualsVsFittedSpec, normalQuantileSpec, normalQuantilePoints, residualByRegionSpec, type ResidualPoint } from './diagnostics.js';
export { profilesSpec, type ProfilePoint } from './profiles.js';
export { crossoverOffsetsSpec, type CrossoverOffset } from './crossover-offsets.js';
export { luxuryUptakeSpec, type ClassRegionEstimate, type LuxuryUptakeOptions } from './luxury-uptake.js';
export { logBin2d, type LogBin } from './log-bin.js';
export { FE_C_TITLE, DFE_TITLE, NITRATE_TITLE, DEPTH_TITLE } from './axis-titles.js';
