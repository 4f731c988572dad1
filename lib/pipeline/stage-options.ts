// Config → the option objects of the match, quotas and fits stages (one place that knows both shapes).
import type { Config } from '../config/index.js';
import type { FitOptions } from '../fits/index.js';
import { sampleGrid } from '../geo/index.js';
import type { CrossoverOptions, MatchOptions } from '../match/index.js';
import type { ClassSpec, QuotaOptions } from '../quotas/index.js';

/** Our default relative 1-sigma error of a carbon estimate, by method (documented in the config schema). */
const DEFAULT_CARBON_ERROR: Record<string, number> = {
  measured: 0,
  'biovolume-diatom': 0.3,
  'biovolume-protist': 0.3,
  'biovolume-factor': 0.3,
  phosphorus: 0.2,
};

/** Options of matchCells from the `match` block. */
export function matchOptions(config: Config): MatchOptions {
  const m = config.match;
  return {
    depthToleranceM: m.depth_tolerance_m,
    interpolateBracketing: m.interpolate_bracketing,
    maxBracketGapM: m.max_bracket_gap_m,
    maxGridDistanceKm: m.max_grid_distance_km,
    sampleGrid,
  };
}

/** Options of computeQuotas from the `classes` and `carbon` blocks. */
export function quotaOptions(config: Config): QuotaOptions {
  const classes: Record<string, ClassSpec> = {};
  for (const [name, c] of Object.entries(config.classes)) {
    classes[name] = {
      aliases: c.aliases,
      carbon: c.carbon,
      relativeError: c.relative_error ?? DEFAULT_CARBON_ERROR[c.carbon],
      ...(c.min_fe_c ? { minFeC: { value: c.min_fe_c.value, citation: c.min_fe_c.citation } } : {}),
    };
  }
  const factor = config.carbon.factor_fg_per_um3;
  return {
    classes,
    biovolume: { form: config.carbon.biovolume_form === 'rounded' ? 'power' : 'log', largeDiatoms: config.carbon.large_diatom_relation },
    ...(factor ? { carbonFactor: { fgCPerUm3: factor.value, citation: factor.citation } } : {}),
    carbonToPhosphorus: config.carbon.redfield_c_p,
  };
}

/** Options of crossoverOffsets from the `crossover` block. */
export function crossoverOptions(config: Config): CrossoverOptions {
  const c = config.crossover;
  return { maxDistanceKm: c.max_distance_km, maxDaysApart: c.max_days_apart, minDepthM: c.min_depth_m, thresholdNmolKg: c.threshold_nmol_kg, maxGapM: c.max_gap_m };
}

/** Options of fitQuotas from the `fits` block. */
export function fitOptions(config: Config): FitOptions {
  const f = config.fits;
  return {
    models: f.models,
    primary: f.primary,
    bootstrap: { n: f.bootstrap.n, seed: f.bootstrap.seed },
    level: f.level,
    minCells: f.min_cells,
    weighting: f.weighting,
    dFeRelativeSigma: f.dfe_relative_sigma,
  };
}
