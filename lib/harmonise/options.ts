import type { QualityFlag } from '../types.js';
import type { SampleQuantity } from './sampleQuantity.js';
import type { FlagScheme } from './flags.js';

/** What to do with values below the detection limit. */
export type DetectionLimitPolicy = 'half' | 'limit' | 'exclude';

/** Fill values treated as missing in numeric columns unless configured otherwise (common practice in CSV exports and NetCDF _FillValue defaults). */
export const DEFAULT_FILL_VALUES: readonly number[] = [-999, -9999, -99, 9.9e36, 9.96921e36];

/** Seawater density used when temperature, salinity or pressure is missing, kg m⁻³ (common practice; the ledger says so per row). */
export const DEFAULT_DENSITY = 1025;

/** Options shared by the sample and cell stages; one input file each. */
export interface CommonHarmoniseOptions {
  /** Input file relative to the project folder, for messages and the ledger. Required. */
  file: string;
  /** Ledger table name; default 'samples' for samples, 'cells' for cells. */
  table?: string;
  /** User unit per canonical column, e.g. { dissolved_fe: 'nmol/L' }; default: every column already in its canonical unit. */
  units?: Record<string, string>;
  /** Numeric values that mean "missing"; default DEFAULT_FILL_VALUES (matched to 1e-6 relative). */
  fillValues?: readonly number[];
  /** Exclude positions on land; default true. */
  landCheck?: boolean;
  /** Distance from the coastline within which a point on land still counts as at sea, km; default 10. */
  coastToleranceKm?: number;
  /** Land outline resolution for the land check; default '50m'. */
  landResolution?: '50m' | '110m';
}

/** Options of harmoniseSamples. */
export interface SampleHarmoniseOptions extends CommonHarmoniseOptions {
  /** Flag scheme of the `<q>_flag` columns: 'ioc', 'woce', 'none' or a user map {raw: internal}; default 'none'. */
  flags?: FlagScheme;
  /** Internal qualities whose values enter; default ['good', 'questionable', 'below_detection'] (questionable stays marked in `<q>_quality`; below-detection values enter as substituted by the policy). */
  accept?: readonly QualityFlag[];
  /** Below-detection policy: 'half' (DL/2, common practice), 'limit' (DL) or 'exclude'; default 'half'. */
  detectionLimitPolicy?: DetectionLimitPolicy;
  /** Detection limit per quantity in canonical units, used when a row gives none; default none. */
  defaultDetectionLimits?: Partial<Record<SampleQuantity, number>>;
  /** Density when temperature, salinity or pressure is missing, kg m⁻³; default DEFAULT_DENSITY (1025). */
  defaultDensity?: number;
  /** Temperature scale of the file: 'its90' (default, common practice since 1990; converted to IPTS-68 for EOS-80) or 'ipts68'. */
  temperatureScale?: 'its90' | 'ipts68';
  /** Largest allowed difference between the given depth and the depth computed from pressure, m; default 10. */
  depthPressureToleranceM?: number;
}

/** Options of harmoniseCells. */
export type CellHarmoniseOptions = CommonHarmoniseOptions;
