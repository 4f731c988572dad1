/** Plain-data types of the fits stage; one doc line per field, defaults stated. */
import type { AncovaSlopes, Interval, SlopeDifference } from '../stats/index.js';

/** Model names the stage can fit. */
export type ModelName = 'ols' | 'sma' | 'york' | 'saturating';

/** Cells to fit, as parallel columns (one entry per cell). */
export interface FitInput {
  /** Phytoplankton class of each cell. */
  cellClass: readonly string[];
  /** Station key of each cell (the bootstrap resamples stations). */
  station: readonly string[];
  /** Ambient dissolved Fe, nmol kg⁻¹. */
  dFe: ArrayLike<number>;
  /** Cellular Fe:C, µmol mol⁻¹. */
  feC: ArrayLike<number>;
  /** 1-sigma uncertainty of Fe:C, µmol mol⁻¹; NaN when unknown. */
  feCSigma: ArrayLike<number>;
}

/** Options of the fits stage (mirrors the `fits` block of the config). */
export interface FitOptions {
  /** Models to fit; default all four. */
  models?: readonly ModelName[];
  /** Model whose curve and residuals are used downstream; 'auto' = lowest AICc; default 'ols'. */
  primary?: 'auto' | ModelName;
  /** Station bootstrap: replicates (0 = none) and seed; default { n: 1000, seed: 1 }. */
  bootstrap?: { n: number; seed: number };
  /** Confidence level of every interval and band; default 0.95. */
  level?: number;
  /** Classes with fewer valid cells are reported with fitted: false; default 10. */
  minCells?: number;
  /** 'inverse-variance' weights OLS (and the saturating fit) by 1/σ² of log10 Fe:C; default 'none'. */
  weighting?: 'none' | 'inverse-variance';
  /** Relative 1-sigma uncertainty of dFe for York, σ_log10 = rel/ln 10 (common practice for ICP-MS dFe, ~10 %); default 0.1. */
  dFeRelativeSigma?: number;
  /** Scale the saturating model is fitted on; 'log10' (default) matches the log-normal scatter of the power-law fits. */
  saturatingScale?: 'log10' | 'linear';
  /** Points of the log-spaced dFe grid of the bands; default 50. */
  gridPoints?: number;
}

/** Fully resolved options, echoed in the results. */
export interface ResolvedFitOptions {
  /** Models fitted. */
  models: ModelName[];
  /** Primary model rule. */
  primary: 'auto' | ModelName;
  /** Bootstrap replicates and seed. */
  bootstrap: { n: number; seed: number };
  /** Confidence level. */
  level: number;
  /** Minimum valid cells per class. */
  minCells: number;
  /** OLS weighting. */
  weighting: 'none' | 'inverse-variance';
  /** Relative dFe sigma for York. */
  dFeRelativeSigma: number;
  /** Scale of the saturating fit. */
  saturatingScale: 'log10' | 'linear';
  /** Points of the band grid. */
  gridPoints: number;
}

/** A cell left out of every fit, for the ledger. */
export interface ExcludedCell {
  /** Row index in the input columns. */
  index: number;
  /** Stable reason code. */
  reason: 'non-finite-dfe' | 'non-positive-dfe' | 'non-finite-fe-c' | 'non-positive-fe-c';
  /** Human-readable detail naming the value. */
  detail: string;
}

/** One parameter with its analytic and bootstrap intervals. */
export interface ParameterEstimate {
  /** Point estimate. */
  estimate: number;
  /** Standard error used by the analytic interval. */
  se: number;
  /** Analytic interval at the stage's level. */
  interval: Interval;
  /** Station-bootstrap percentile interval; null when the bootstrap is off. */
  bootstrapInterval: Interval | null;
}

/** A power law log10 FeC = log10Coefficient + exponent·log10 dFe (ols, sma or york). */
export interface PowerLawFit {
  /** Model name. */
  model: 'ols' | 'sma' | 'york';
  /** Always true here. */
  fitted: true;
  /** Exponent b (dimensionless) and log10 coefficient a (log10 µmol mol⁻¹ at dFe = 1 nmol kg⁻¹). */
  parameters: { exponent: ParameterEstimate; log10Coefficient: ParameterEstimate };
  /** Covariance of (log10Coefficient, exponent) behind the bands. */
  covariance: number;
  /** Vertical residual variance of log10 Fe:C about the line on n − 2 df (prediction bands). */
  residualVariance: number;
  /** Diagnostics. */
  diagnostics: {
    rSquared: number;
    residualSE: number;
    rssLog10: number;
    mswd: number | null;
    converged: boolean;
  };
  /** AICc on log10 Fe:C; null for sma and york, which are not least-squares fits of log10 Fe:C. */
  aicc: number | null;
  /** Bootstrap replicates that failed. */
  bootstrapFailed: number;
  /** How the fit was made, in words. */
  notes: string[];
}

/** A saturating fit FeC = qmax·dFe/(k + dFe). */
export interface SaturatingFit {
  /** Model name. */
  model: 'saturating';
  /** Always true here. */
  fitted: true;
  /** qmax (µmol mol⁻¹) and k (nmol kg⁻¹). */
  parameters: { qmax: ParameterEstimate; k: ParameterEstimate };
  /** Covariance of (qmax, k). */
  covariance: number;
  /** Scale the fit minimised on. */
  scale: 'log10' | 'linear';
  /** Residual variance on the fitted scale, n − 2 df. */
  residualVariance: number;
  /** Diagnostics. */
  diagnostics: { residualSE: number; rssLog10: number; converged: true };
  /** AICc on log10 Fe:C (the model's predictions logged). */
  aicc: number;
  /** Bootstrap replicates that failed. */
  bootstrapFailed: number;
  /** How the fit was made, in words. */
  notes: string[];
}

/** A model that could not be fitted for a class. */
export interface ModelNotFitted {
  /** Model name. */
  model: ModelName;
  /** Always false here. */
  fitted: false;
  /** Why not. */
  reason: string;
}

/** Any model result. */
export type ModelFit = PowerLawFit | SaturatingFit | ModelNotFitted;

/** Curve and bands of the primary fit on a log grid, original units. */
export interface FitBands {
  /** Model the bands belong to. */
  model: ModelName;
  /** dFe grid, nmol kg⁻¹, log-spaced over the class's range. */
  dFe: number[];
  /** Fitted Fe:C (µmol mol⁻¹; for log fits the back-transformed mean of log10, i.e. the median). */
  fit: number[];
  /** Confidence band of the curve. */
  confidenceLower: number[];
  /** Upper confidence band. */
  confidenceUpper: number[];
  /** Prediction band for one new cell. */
  predictionLower: number[];
  /** Upper prediction band. */
  predictionUpper: number[];
}

/** Results for one class (or the pool of all cells, class 'all'). */
export type ClassFit =
  | {
      class: string;
      fitted: true;
      nCells: number;
      nStations: number;
      dFeRange: Interval;
      models: ModelFit[];
      primary: ModelName;
      primaryReason: string;
      bands: FitBands;
    }
  | { class: string; fitted: false; nCells: number; nStations: number; reason: string };

/** Tests of whether the classes' log–log slopes and intercepts differ. */
export interface ClassDifferences {
  /** Classes compared (fitted classes, sorted). */
  classes: string[];
  /** ANCOVA on log10 Fe:C vs log10 dFe; null when fewer than 2 classes were fitted. */
  ancova: AncovaSlopes | null;
  /** Pairwise slope differences (unadjusted t intervals) labelled by class. */
  pairwise: (SlopeDifference & { classA: string; classB: string })[];
  /** Caveats of the tests. */
  notes: string[];
}

/** Everything the fits stage returns: plain JSON, stable key order. */
export interface FitResults {
  /** Options as resolved. */
  options: ResolvedFitOptions;
  /** Cells not fitted, with reasons, for the ledger. */
  excluded: ExcludedCell[];
  /** Per class, sorted by class name. */
  classes: ClassFit[];
  /** All valid cells pooled (class 'all'). */
  pooled: ClassFit;
  /** Class-difference tests. */
  classDifferences: ClassDifferences;
}
