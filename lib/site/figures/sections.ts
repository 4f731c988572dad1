// Table data of the Nutrient fields, Quotas and Anomalies pages, built from the pipeline results (pure).
import type { Config } from '../../config/index.js';
import type { ModelFit, ParameterEstimate } from '../../fits/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import { regionNames } from './region-names.js';

/** A parameter with its analytic interval and (when run) its station-bootstrap interval. */
export interface ParameterRow {
  /** Point estimate. */
  estimate: number;
  /** Analytic interval, lower end. */
  lower: number;
  /** Analytic interval, upper end. */
  upper: number;
  /** Bootstrap percentile interval, or null when the bootstrap is off. */
  bootstrap: { lower: number; upper: number } | null;
}

/** One model of one class in the quotas table. */
export interface ModelRow {
  /** Model name: ols, sma, york or saturating. */
  model: string;
  /** False when the model could not be fitted (see reason). */
  fitted: boolean;
  /** Why not fitted, else null. */
  reason: string | null;
  /** Power-law exponent b (dimensionless), or null. */
  exponent: ParameterRow | null;
  /** Power-law log10 coefficient (log10 µmol mol⁻¹ at dFe = 1 nmol kg⁻¹), or null. */
  log10Coefficient: ParameterRow | null;
  /** Saturating Qmax, µmol mol⁻¹, or null. */
  qmax: ParameterRow | null;
  /** Saturating half-saturation K, nmol kg⁻¹, or null. */
  k: ParameterRow | null;
  /** AICc on log10 Fe:C, or null (sma, york). */
  aicc: number | null;
  /** True for the class's primary model. */
  primary: boolean;
}

/** One class in the quotas table. */
export interface ClassRow {
  /** Class name ('all' for the pool). */
  phytoClass: string;
  /** Cells. */
  nCells: number;
  /** Stations. */
  nStations: number;
  /** False when the class was not fitted. */
  fitted: boolean;
  /** Why not fitted, else null. */
  reason: string | null;
  /** Primary model and why it was chosen, or null. */
  primary: { model: string; reason: string } | null;
  /** Each model's result. */
  models: ModelRow[];
}

/** report.sections.quotas: fits per class and the class-difference tests. */
export interface QuotasSection {
  /** Confidence level of every interval. */
  level: number;
  /** Classes sorted by name, then the pool. */
  classes: ClassRow[];
  /** ANCOVA of log10 Fe:C on log10 dFe, or null. */
  ancova: { equalSlopes: FTest; equalIntercepts: FTest; commonSlope: number } | null;
  /** Pairwise slope differences. */
  pairwise: { classA: string; classB: string; difference: number; lower: number; upper: number; p: number }[];
  /** Caveats of the tests. */
  notes: string[];
}

/** An F test. */
export interface FTest {
  /** F statistic. */
  f: number;
  /** Numerator df. */
  df1: number;
  /** Denominator df. */
  df2: number;
  /** p value. */
  p: number;
}

/** One region × class row of the anomalies table. */
export interface AnomalyRow {
  /** Region id. */
  region: string;
  /** Region display name. */
  regionName: string;
  /** Class. */
  phytoClass: string;
  /** 'tested' or 'not-tested'. */
  status: string;
  /** Stations. */
  nStations: number;
  /** Cells. */
  nCells: number;
  /** Mean residual (log10), or null. */
  meanResidual: number | null;
  /** Fold from the fit with its interval, or nulls. */
  fold: number | null;
  foldLow: number | null;
  foldHigh: number | null;
  /** t-test p and BH-adjusted p. */
  pValue: number | null;
  pAdjusted: number | null;
  /** Flag: lower-than-fit, higher-than-fit, none, not-tested. */
  flag: string;
  /** True when flagged lower or higher. */
  flagged: boolean;
  /** Leave-one-station-out: flag unchanged by removing any one station; null when untested. */
  looStable: boolean | null;
  /** Most influential station as 'cruise / station', or null. */
  mostInfluential: string | null;
  /** Smallest detectable fold with the current stations, or null. */
  minDetectableFold: number | null;
  /** Stations needed for the target fold, or null. */
  stationsNeeded: number | null;
}

/** report.sections.anomalies: settings and the sorted table (flagged first, then by adjusted p, region, class). */
export interface AnomaliesSection {
  /** BH false discovery rate. */
  fdrQ: number;
  /** Fewest stations tested. */
  minStations: number;
  /** Target fold of the sampling-gap columns. */
  targetFold: number;
  /** Interval level. */
  level: number;
  /** Rows. */
  rows: AnomalyRow[];
}

/** report.sections.fields: the grids used. */
export interface FieldsSection {
  /** One row per grid. */
  grids: { file: string; variable: string; quantity: string; units: string; nLon: number; nLat: number; nDepth: number; nTime: number }[];
}

/** What pageSections returns: one entry per page key. */
export interface PageSections {
  /** Nutrient fields page tables. */
  fields: FieldsSection;
  /** Quotas page tables, or null when the fits did not run. */
  quotas: QuotasSection | null;
  /** Anomalies page tables, or null when the anomalies stage did not run. */
  anomalies: AnomaliesSection | null;
}

function param(p: ParameterEstimate): ParameterRow {
  return { estimate: p.estimate, lower: p.interval.lower, upper: p.interval.upper, bootstrap: p.bootstrapInterval ? { lower: p.bootstrapInterval.lower, upper: p.bootstrapInterval.upper } : null };
}

function modelRow(m: ModelFit, primary: string | null): ModelRow {
  const base = { model: m.model, primary: m.model === primary, exponent: null, log10Coefficient: null, qmax: null, k: null, aicc: null };
  if (!m.fitted) return { ...base, fitted: false, reason: m.reason };
  if (m.model === 'saturating') return { ...base, fitted: true, reason: null, qmax: param(m.parameters.qmax), k: param(m.parameters.k), aicc: m.aicc };
  return { ...base, fitted: true, reason: null, exponent: param(m.parameters.exponent), log10Coefficient: param(m.parameters.log10Coefficient), aicc: m.aicc };
}

/** The three pages' table data from the pipeline result (config reserved for page settings; not mutated). */
export function pageSections(result: PipelineResult, config: Config): PageSections {
  void config;
  const fields: FieldsSection = {
    grids: result.grids.map((g) => ({ file: g.grid.source, variable: g.grid.variable, quantity: g.quantity, units: g.grid.units, nLon: g.grid.lon.length, nLat: g.grid.lat.length, nDepth: g.grid.depth.length, nTime: g.grid.time.length })),
  };
  const fits = result.fits;
  const quotas: QuotasSection | null = fits
    ? {
        level: fits.options.level,
        classes: [...fits.classes, fits.pooled].map((c) =>
          c.fitted
            ? { phytoClass: c.class, nCells: c.nCells, nStations: c.nStations, fitted: true, reason: null, primary: { model: c.primary, reason: c.primaryReason }, models: c.models.map((m) => modelRow(m, c.primary)) }
            : { phytoClass: c.class, nCells: c.nCells, nStations: c.nStations, fitted: false, reason: c.reason, primary: null, models: [] },
        ),
        ancova: fits.classDifferences.ancova
          ? { equalSlopes: { ...fits.classDifferences.ancova.equalSlopes }, equalIntercepts: { ...fits.classDifferences.ancova.equalIntercepts }, commonSlope: fits.classDifferences.ancova.commonSlope }
          : null,
        pairwise: fits.classDifferences.pairwise.map((d) => ({ classA: d.classA, classB: d.classB, difference: d.difference, lower: d.interval.lower, upper: d.interval.upper, p: d.p })),
        notes: [...fits.classDifferences.notes],
      }
    : null;
  const an = result.anomalies;
  const name = regionNames(result.regions);
  const anomalies: AnomaliesSection | null = an
    ? {
        fdrQ: an.settings.fdrQ,
        minStations: an.settings.minStations,
        targetFold: an.settings.targetFold,
        level: an.settings.level,
        rows: an.groups
          .map((g) => ({
            region: g.region,
            regionName: name(g.region),
            phytoClass: g.phytoClass,
            status: g.status,
            nStations: g.nStations,
            nCells: g.nCells,
            meanResidual: g.meanResidual,
            fold: g.fold,
            foldLow: g.foldLow,
            foldHigh: g.foldHigh,
            pValue: g.pValue,
            pAdjusted: g.pAdjusted,
            flag: g.flag,
            flagged: g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit',
            looStable: g.leaveOneOut ? g.leaveOneOut.flagStable : null,
            mostInfluential: g.leaveOneOut ? `${g.leaveOneOut.mostInfluential.cruise} / ${g.leaveOneOut.mostInfluential.station}` : null,
            minDetectableFold: g.samplingGap.minDetectableFold,
            stationsNeeded: g.samplingGap.stationsForTargetFold,
          }))
          .sort((a, b) => Number(b.flagged) - Number(a.flagged) || (a.pAdjusted ?? 2) - (b.pAdjusted ?? 2) || (a.region < b.region ? -1 : a.region > b.region ? 1 : 0) || (a.phytoClass < b.phytoClass ? -1 : a.phytoClass > b.phytoClass ? 1 : 0)),
      }
    : null;
  return { fields, quotas, anomalies };
}
