// Method notes of the fits, regions, anomalies and Fe* steps.
import type { Config } from '../../config/index.js';
import { builtinBasinBoundaries, builtinBasinRules } from '../../geo/regions/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import { DEFAULT_FE_STAR_RATIO } from '../figures/messages.js';
import { sig3 } from './count-values.js';
import { FORMULA_TEX } from './formulas.js';
import { STATION_AGGREGATION_TEXT } from './messages.js';
import type { MethodFormula, MethodStage } from './methods-model.js';
import { formula } from './render-formula.js';

/** The fits stage from the options the fits actually used; null when the stage did not run. */
export function fitStage(result: PipelineResult): MethodStage | null {
  if (!result.fits) return null;
  const o = result.fits.options;
  const models = new Set(o.models);
  const formulas: MethodFormula[] = [];
  const references: string[] = [];
  if (models.has('ols') || models.has('sma') || models.has('york')) formulas.push(formula('power-law', 'Power law (OLS, SMA, York)', FORMULA_TEX['power-law']));
  if (models.has('saturating')) formulas.push(formula('saturating', 'Saturating (Michaelis–Menten form)', FORMULA_TEX.saturating));
  if (models.has('sma')) {
    formulas.push(formula('sma', 'Standardised major axis slope', FORMULA_TEX.sma));
    references.push('warton2006');
  }
  if (models.has('york')) {
    formulas.push(formula('york', 'York regression with errors in both variables (iterated)', FORMULA_TEX.york));
    references.push('york2004');
  }
  if (models.has('ols') || models.has('saturating')) {
    formulas.push(formula('aicc', 'Small-sample Akaike information criterion', FORMULA_TEX.aicc));
    references.push('burnham2002');
  }
  const primaries = result.fits.classes.filter((c) => c.fitted).map((c) => (c.fitted ? [c.class, c.primary, c.primaryReason] : []));
  return {
    id: 'fits',
    title: 'Fits of Fe:C against dFe',
    text: ['Per class, cellular Fe:C was fitted against ambient dFe; intervals are analytic and, where the bootstrap is on, percentile intervals from resampling stations.'],
    parameters: [
      { name: 'Models', value: o.models.join(', ') },
      { name: 'Primary model rule', value: o.primary === 'auto' ? 'auto (lowest AICc)' : o.primary },
      { name: 'Confidence level', value: String(o.level) },
      { name: 'Bootstrap', value: o.bootstrap.n > 0 ? `${o.bootstrap.n} station resamples, seed ${o.bootstrap.seed}` : 'off' },
      { name: 'Fewest cells to fit a class', value: String(o.minCells) },
      { name: 'OLS weighting', value: o.weighting },
      ...(models.has('york') ? [{ name: 'Relative 1σ of dFe (York)', value: String(o.dFeRelativeSigma) }] : []),
      ...(models.has('saturating') ? [{ name: 'Scale of the saturating fit', value: o.saturatingScale }] : []),
    ],
    tables: primaries.length ? [{ caption: 'Primary model per class', columns: ['Class', 'Primary model', 'Why'], rows: primaries }] : [],
    formulas,
    references,
  };
}

/** The region scheme: builtin rules, box size, or the GeoJSON file. */
export function regionStage(result: PipelineResult, config: Config): MethodStage | null {
  if (!result.regions) return null;
  const r = config.inputs.regions;
  const base = { id: 'regions', title: 'Regions', formulas: [], references: [] };
  const n = result.regions.features.length;
  if (r === 'builtin-basins') {
    return {
      ...base,
      text: ['Cells were assigned to the built-in partition of the ocean into basins (our own coarse partition, boundary edges densified).', ...builtinBasinBoundaries],
      parameters: [{ name: 'Scheme', value: `built-in basins (${n} regions)` }],
      tables: [{ caption: 'Basin rules', columns: ['Id', 'Basin', 'Rule'], rows: builtinBasinRules.map((b) => [b.id, b.name, b.rule]) }],
    };
  }
  if ('boxes_deg' in r) {
    return { ...base, text: ['Cells were assigned to regular longitude–latitude boxes tiling the globe from 90°S and 180°W.'], parameters: [{ name: 'Scheme', value: `${r.boxes_deg}° × ${r.boxes_deg}° boxes (${n} regions)` }], tables: [] };
  }
  return {
    ...base,
    text: ['Cells were assigned to the regions of the project’s GeoJSON file (first region containing the point).'],
    parameters: [{ name: 'Scheme', value: `GeoJSON file ${r.path} (${n} regions)` }],
    tables: [{ caption: 'Regions', columns: ['Id', 'Name'], rows: result.regions.features.map((f) => [f.properties.id, f.properties.name]) }],
  };
}

/** The anomaly tests with the settings they used. */
export function anomalyStage(result: PipelineResult): MethodStage | null {
  if (!result.anomalies) return null;
  const s = result.anomalies.settings;
  const c = result.anomalies.counts;
  return {
    id: 'anomalies',
    title: 'Regional anomalies',
    text: [
      STATION_AGGREGATION_TEXT,
      'Each tested group’s mean station residual was compared with zero by a one-sample t test, checked with a Wilcoxon signed-rank test; p values across all tested groups were controlled for the false discovery rate by the Benjamini–Hochberg procedure.',
      `${c.groupsTested} of ${c.groups} region × class groups were tested (${c.stations} stations); ${c.groupsFlagged} were flagged.`,
    ],
    parameters: [
      { name: 'Fewest stations per tested group', value: String(s.minStations) },
      { name: 'False discovery rate q', value: String(s.fdrQ) },
      { name: 'Confidence level', value: String(s.level) },
      { name: 'Sampling gap: target fold', value: String(s.targetFold) },
      { name: 'Sampling gap: power', value: String(s.power) },
      { name: 'Sampling gap: significance', value: `${s.alphaForPower} (q used as a stand-in for the BH per-test threshold)` },
      { name: 'Pooled between-station SD', value: `${sig3(result.anomalies.pooled.sd)} log10 units (${result.anomalies.pooled.df} df)` },
    ],
    tables: [],
    formulas: [
      formula('t-test', 'One-sample t on m station means', FORMULA_TEX['t-test']),
      formula('bh', 'Benjamini–Hochberg: reject the k smallest p values', FORMULA_TEX.bh),
      formula('min-detectable', 'Smallest detectable mean shift δ_min: power of the two-sided one-sample t test (non-central t)', FORMULA_TEX['min-detectable']),
    ],
    references: ['wilcoxon1945', 'benjamini1995', 'cohen1988'],
  };
}

/** Fe* (excess iron relative to phosphate), shown when the samples hold phosphate and dFe. */
export function feStarStage(result: PipelineResult, config: Config): MethodStage | null {
  const names = result.samples.columnNames();
  if (result.samples.numRows() === 0 || !names.includes('phosphate') || !names.includes('dissolved_fe')) return null;
  const ratio = config.figures.fe_star_ratio ?? DEFAULT_FE_STAR_RATIO;
  return {
    id: 'fe-star',
    title: 'Excess iron (Fe*)',
    text: ['Fe* is the dissolved iron in excess of what phosphate would carry at a fixed Fe:P uptake ratio.'],
    parameters: [
      { name: 'R Fe:P', value: `${ratio.value} mmol mol⁻¹ (${ratio.citation})` },
      { name: 'HNLC outline', value: `surface nitrate ≥ ${config.figures.hnlc_nitrate} µmol kg⁻¹` },
    ],
    tables: [],
    formulas: [formula('fe-star', 'Fe* (dFe in nmol kg⁻¹, PO₄ in µmol kg⁻¹, R in mmol mol⁻¹)', FORMULA_TEX['fe-star'])],
    references: ['parekh2005'],
  };
}
