// Public names of the map builders.
export { buildMap, type MapLayers, type MapOptions, type MapResult, type RasterLayer, type StationPoint, type CellSitePoint, type RegionShape, type OutlineLayer } from './build-map.js';
export { makeProjection, type MapProjection, type MapProjectionKind, type ProjectionOptions } from './projection.js';
export { colourScale, schemeLut, valueExtent, type ColourScale, type ColourScaleOptions } from './colour-scale.js';
export { rasterImage, type RasterImage, type RasterOptions } from './raster.js';
export { landFeature, graticuleLines } from './land.js';
export { thresholdOutline, type ThresholdOutline } from './threshold-outline.js';
export { densify } from './densify.js';
export { rewind } from './rewind.js';
export { feStarGrid } from './fe-star.js';
export { colourBar, swatchRow, tickLabel, type LegendText, type SwatchItem } from './legend.js';
export { base64 } from './base64.js';
