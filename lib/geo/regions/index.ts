// Public names of the region schemes.
export type { RegionCollection, RegionFeature, RegionProperties } from './region-types.js';
export { builtinBasins, builtinBasinRules, builtinBasinBoundaries, BASIN_DENSIFY_DEG } from './builtin-basins.js';
export type { BasinRule } from './builtin-basins.js';
export { latLonBoxes, BOX_DENSIFY_DEG } from './lat-lon-boxes.js';
export { regionsFromGeoJson, RegionInputError } from './regions-from-geojson.js';
export { rewindPolygon } from './rewind.js';
export { assignRegion, regionIndex } from './region-index.js';
export type { RegionIndex } from './region-index.js';
export type { LonLat } from './densify.js';
