// Public names of the statistics library.
export { tQuantile, tCdf, tTwoSidedP, fQuantile, fUpperP, normalQuantile, normalCdf, noncentralTCdf } from './distributions.js';
export type { Interval } from './interval.js';
export { ols } from './ols.js';
export type { OlsFit, OlsOptions } from './ols.js';
export { olsBand } from './ols-band.js';
export type { OlsBand, OlsBandOptions } from './ols-band.js';
export { olsOnIndices } from './ols-on-indices.js';
export type { LineCoefficients } from './ols-on-indices.js';
export { sma } from './sma.js';
export type { SmaFit, SmaOptions } from './sma.js';
export { york } from './york.js';
export type { YorkFit, YorkOptions } from './york.js';
