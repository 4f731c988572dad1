export { parseUnit, type ParsedUnit } from './parseUnit.js';
export { canonicalUnit, unitColumns, type CanonicalUnit, type UnitKind } from './canonicalUnit.js';
export { unitConversion, validateUnit, CARBON_MOLAR_MASS, type UnitConversion } from './unitConversion.js';
export { seawaterDensity, seawaterDensitySurface, secantBulkModulus, t68FromT90 } from './eos80.js';
export { depthFromPressure, pressureFromDepth } from './depth.js';
export { BASE_DIMENSIONS, type BaseDimension, type Dimension } from './dimension.js';
export * as unitMessages from './messages.js';
