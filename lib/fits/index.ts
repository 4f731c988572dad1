// Public names of the fits stage.
export { fitQuotas, resolveFitOptions, POOLED } from './fit-quotas.js';
export { residualsFromFit } from './residuals-from-fit.js';
export { predictLog10 } from './predict-log10.js';
export { logGrid } from './log-grid.js';
export type {
  ClassDifferences,
  ClassFit,
  ExcludedCell,
  FitBands,
  FitInput,
  FitOptions,
  FitResults,
  ModelFit,
  ModelName,
  ModelNotFitted,
  ParameterEstimate,
  PowerLawFit,
  ResolvedFitOptions,
  SaturatingFit,
} from './types.js';
