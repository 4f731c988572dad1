export { landMask, type LandMask, type LandMaskOptions } from './land.js';
export { haversineKm, EARTH_RADIUS_KM } from './haversine.js';
export { sampleGrid, type GridPoint, type GridSample, type SampleOptions } from './interpolate-grid.js';
