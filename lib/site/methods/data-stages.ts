// Method notes of the load, harmonise and match stages.
import type { Config } from '../../config/index.js';
import type { PipelineResult } from '../../pipeline/index.js';
import { countValues, num } from './count-values.js';
import { FORMULA_TEX } from './formulas.js';
import { CONVERSION_METHOD_TEXT, detectionPolicyText, flagSchemeText } from './messages.js';
import type { MethodStage } from './methods-model.js';
import { formula } from './render-formula.js';

/** Fill values used when a file names none (lib/harmonise default). */
const DEFAULT_FILL_VALUES = [-999, -9999, -99, 9.9e36, 9.96921e36];

/** The load stage: files read and rows per file. */
export function loadStage(result: PipelineResult, config: Config): MethodStage {
  const references = config.inputs.grids.some((g) => g.path.toLowerCase().endsWith('.nc')) ? ['cf2022'] : [];
  return {
    id: 'load',
    title: 'Inputs read',
    text: [
      `${result.counts.length} table files and ${config.inputs.grids.length} gridded fields were read; every row keeps its source file and line.`,
      ...(references.length ? ['NetCDF fields were read following the CF conventions (variable by name or standard_name, units from the units attribute).'] : []),
    ],
    parameters: [],
    tables: [
      { caption: 'Rows read per file', columns: ['Table', 'File', 'Rows read'], rows: result.counts.map((c) => [c.table, c.file, String(c.rowsRead)]) },
      ...(config.inputs.grids.length
        ? [{ caption: 'Gridded fields', columns: ['File', 'Quantity', 'Variable'], rows: config.inputs.grids.map((g) => [g.path, g.quantity, g.variable ?? g.standard_name ?? '—']) }]
        : []),
    ],
    formulas: [],
    references,
  };
}

/** The harmonise stage: unit conversions with row counts, flag schemes, detection limits, fill values, position checks. */
export function harmoniseStage(result: PipelineResult, config: Config): MethodStage {
  const h = config.harmonise;
  const conversions = result.harmonise.flatMap((s) => s.conversions.map((c) => ({ file: s.file, ...c })));
  const usesEos = conversions.some((c) => c.method === 'eos80-density' || c.method === 'depth-from-pressure');
  const usesDensity = conversions.some((c) => c.method === 'eos80-density' || c.method === 'default-density');
  const schemes = [...new Set(config.inputs.samples.map((s) => (typeof s.flags === 'string' ? s.flags : 'map')))].sort();
  const substituted = result.harmonise.reduce((sum, s) => sum + s.belowDetectionSubstituted, 0);
  const fillFiles = [...config.inputs.samples, ...config.inputs.cells].filter((f) => f.fill_values !== undefined);
  const references = [...(schemes.includes('ioc') ? ['ioc2013'] : []), ...(schemes.includes('woce') ? ['joyce1994'] : []), ...(usesEos ? ['fofonoff1983'] : [])];
  return {
    id: 'harmonise',
    title: 'Harmonisation',
    text: [
      'Units were parsed from the config (never guessed) and converted to canonical units: dFe in nmol kg⁻¹, nutrients in µmol kg⁻¹, cell contents in mol cell⁻¹, depth in m.',
      `${conversions.reduce((s, c) => s + c.rows, 0)} values were converted in ${conversions.length} file × column conversions; ${substituted} below-detection values were substituted.`,
    ],
    parameters: [
      { name: 'Flag schemes', value: schemes.map(flagSchemeText).join('; ') },
      { name: 'Accepted flags', value: h.accept_flags.join(', ') },
      { name: 'Below detection limit', value: detectionPolicyText(h.detection_limit_policy) },
      { name: 'Below-detection substitutions', value: String(substituted) },
      { name: 'Default fill values', value: DEFAULT_FILL_VALUES.map(String).join(', ') },
      ...fillFiles.map((f) => ({ name: `Fill values of ${f.path}`, value: (f.fill_values ?? []).map(String).join(', ') })),
      { name: 'Default seawater density', value: `${h.default_density} kg m⁻³ (when T or S is missing)` },
      { name: 'Land check', value: h.land_check ? `on; up to ${h.coast_tolerance_km} km inland accepted` : 'off' },
    ],
    tables: conversions.length
      ? [{ caption: 'Unit conversions performed', columns: ['File', 'Column', 'From', 'To', 'Method', 'Rows'], rows: conversions.map((c) => [c.file, c.column, c.from, c.to, CONVERSION_METHOD_TEXT[c.method] ?? c.method, String(c.rows)]) }]
      : [],
    formulas: usesDensity ? [formula('eos80-conversion', 'Per litre to per kilogram (EOS-80 density)', FORMULA_TEX['eos80-conversion'])] : [],
    references,
  };
}

/** The match stage: tolerances and how many cells got their ambient dFe from which source. */
export function matchStage(result: PipelineResult, config: Config): MethodStage {
  const m = config.match;
  const bySource = countValues(result.cells, 'ambient_dissolved_fe_source');
  const sources = ['bottle', 'bottle-interpolated', 'grid', 'none'];
  return {
    id: 'match',
    title: 'Matching cells to ambient dFe and nitrate',
    text: ['Each cell takes the same station’s bottle nearest in depth within the tolerance; else the two bracketing bottles of the cast interpolated linearly in depth; else the gridded field at its position, depth and month.'],
    parameters: [
      { name: 'Depth tolerance', value: m.depth_tolerance_m !== undefined ? `${m.depth_tolerance_m} m` : 'max(10 m, 10 % of depth)' },
      { name: 'Interpolate between bracketing bottles', value: m.interpolate_bracketing ? `yes, gap up to ${m.max_bracket_gap_m} m` : 'no' },
      { name: 'Largest distance to a grid value', value: `${num(m.max_grid_distance_km)} km` },
    ],
    tables: [
      {
        caption: 'Cells by source of ambient dFe',
        columns: ['Source', 'Cells'],
        rows: [...sources, ...[...bySource.keys()].filter((k) => !sources.includes(k)).sort()].map((s) => [s, String(bySource.get(s) ?? 0)]),
      },
    ],
    formulas: [],
    references: [],
  };
}

/** The cross-cruise dFe comparison: settings and how many cruise pairs were compared and flagged. */
export function crossoverStage(result: PipelineResult, config: Config): MethodStage {
  const c = config.crossover;
  const offsets = result.crossover.offsets;
  return {
    id: 'crossover',
    title: 'Cross-cruise dFe comparison',
    text: [
      'Deep dFe profiles of stations of different cruises close in space were compared at common depths; a cruise pair is flagged when its mean offset exceeds the threshold and twice its standard error.',
      `${result.crossover.pairs.length} station pairs and ${offsets.length} cruise pairs were compared; ${offsets.filter((o) => o.flagged).length} cruise pairs were flagged.`,
    ],
    parameters: [
      { name: 'Largest station distance', value: `${c.max_distance_km} km` },
      { name: 'Largest time apart', value: c.max_days_apart !== undefined ? `${c.max_days_apart} days` : 'no limit' },
      { name: 'Compared below', value: `${c.min_depth_m} m` },
      { name: 'Flag threshold', value: `${c.threshold_nmol_kg} nmol kg⁻¹` },
    ],
    tables: [],
    formulas: [],
    references: [],
  };
}
