// Public names of the figures stage: rendering, look, maps, plot builders and the Figure record.
export { createRenderer, type Renderer, type RendererOptions } from './render.js';
export { createTextMeasure, type TextMeasure } from './text-measure.js';
export { roundSvgNumbers, formatNumber } from './svg-precision.js';
export { SINGLE_COLUMN_MM, DOUBLE_COLUMN_MM, PNG_DPIS, mmToCssPx, pngWidthPx } from './sizes.js';
export { OKABE_ITO, SEQUENTIAL_SCHEME, SEQUENTIAL_ALT_SCHEME, DIVERGING_SCHEME, NEUTRALS, categoricalColour } from './palettes.js';
export { themeConfig, THEME_SIZES, THEME_STROKES } from './theme.js';
export { figureCsv, type Figure, type CsvColumn, type CsvValue } from './figure.js';
export * from './maps/index.js';
export * from './plots/index.js';
export { gridLevel, sampleNearest, sampleBilinear, type LatticeField, type LevelChoice } from './raster-sample.js';
