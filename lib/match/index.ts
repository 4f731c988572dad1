export { matchCells, AMBIENT_SUFFIXES } from './match-cells.js';
export type { AmbientSource } from './match-cells.js';
export {
  defaultDepthTolerance,
  DEFAULT_MAX_BRACKET_GAP_M,
  DEFAULT_MAX_GRID_DISTANCE_KM,
  DEFAULT_MIN_TOLERANCE_M,
  DEFAULT_TOLERANCE_FRACTION,
  MATCH_QUANTITIES,
  REQUIRED_QUANTITIES,
} from './match-options.js';
export type { GridSampler, MatchOptions } from './match-options.js';
export { meanLongitude } from './bottle-index.js';
export { crossoverOffsets } from './crossover.js';
export type { CrossoverOptions, CruiseOffset, StationPairDifference } from './crossover.js';
export { applyOffsets } from './apply-offsets.js';
export type { ApprovedOffset } from './apply-offsets.js';
