export { harmoniseSamples } from './harmoniseSamples.js';
export { harmoniseCells } from './harmoniseCells.js';
export {
  DEFAULT_DENSITY,
  DEFAULT_FILL_VALUES,
  type CellHarmoniseOptions,
  type CommonHarmoniseOptions,
  type DetectionLimitPolicy,
  type SampleHarmoniseOptions,
} from './options.js';
export { IOC_FLAGS, WOCE_FLAGS, flagTable, mapFlag, normaliseRawFlag, type FlagScheme } from './flags.js';
export { isFillValue } from './fillValues.js';
export { normaliseLongitude } from './positionChecks.js';
export type { ConversionCount, ConversionMethod, HarmoniseResult, HarmoniseSummary } from './result.js';
export type { SampleQuantity } from './sampleQuantity.js';
export * as harmoniseMessages from './messages.js';
