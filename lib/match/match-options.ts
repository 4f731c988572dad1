/** Options of the match stage and the injected grid sampler type. */
import type { Grid } from '../types.js';

/** Samples a gridded field at a point; null when no value lies within `maxDistanceKm` (signature of lib/geo sampleGrid). */
export type GridSampler = (
  grid: Grid,
  point: { lon: number; lat: number; depth: number; month?: number; timeMs?: number },
  options: { maxDistanceKm: number },
) => { value: number; distanceKm: number } | null;

/** Quantities the match stage can attach; dissolved_fe and nitrate are always attempted. */
export const MATCH_QUANTITIES = ['dissolved_fe', 'nitrate', 'phosphate', 'silicate', 'temperature', 'salinity'] as const;

/** Quantities every cell is matched for, ledgered when missing. */
export const REQUIRED_QUANTITIES = ['dissolved_fe', 'nitrate'] as const;

/** Our default depth tolerance floor in m (our choice: bottle spacing in the upper ocean is rarely finer). */
export const DEFAULT_MIN_TOLERANCE_M = 10;

/** Our default relative depth tolerance (10 % of the cell's depth). */
export const DEFAULT_TOLERANCE_FRACTION = 0.1;

/** Our default largest gap (m) between two bracketing bottles that may be interpolated. */
export const DEFAULT_MAX_BRACKET_GAP_M = 100;

/** Our default largest distance (km) from a cell to the nearest usable grid value. */
export const DEFAULT_MAX_GRID_DISTANCE_KM = 100;

/** Default depth tolerance in m at a cell depth in m: max(10 m, 10 % of depth). Our choice, documented in the method notes. */
export function defaultDepthTolerance(depthM: number): number {
  return Math.max(DEFAULT_MIN_TOLERANCE_M, DEFAULT_TOLERANCE_FRACTION * Math.abs(depthM));
}

/** Options of `matchCells`. */
export interface MatchOptions {
  /** Depth tolerance in m: a fixed number, or a function of cell depth; default max(10 m, 10 % of depth). A bottle exactly at the tolerance matches. */
  depthToleranceM?: number | ((depthM: number) => number);
  /** Interpolate linearly between two bracketing bottles of one cast when the nearest bottle is outside the tolerance; default true. */
  interpolateBracketing?: boolean;
  /** Largest depth gap (m) between the bracketing bottles; default 100 m. */
  maxBracketGapM?: number;
  /** Largest distance (km) to a grid value, passed to the sampler; default 100 km. */
  maxGridDistanceKm?: number;
  /** Grid sampler; required when grids are given (the CLI passes lib/geo sampleGrid). */
  sampleGrid?: GridSampler;
  /** Quantities to match; default dissolved_fe and nitrate plus every other MATCH_QUANTITIES column present in samples or grids. */
  quantities?: string[];
  /** Logical table name in ledger entries; default 'cells'. */
  table?: string;
}
