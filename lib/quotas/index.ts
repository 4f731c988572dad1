export { biovolumeFromShape, parseCellShape } from './biovolume-from-shape.js';
export type { CellDimensions, CellShape } from './biovolume-from-shape.js';
export {
  carbonFromBiovolume,
  carbonFromFactor,
  picogramsCarbonToMol,
  CARBON_MOLAR_MASS_G_PER_MOL,
  DEFAULT_PICOCYANOBACTERIA_FACTOR,
  LARGE_DIATOM_VOLUME_UM3,
} from './carbon-from-biovolume.js';
export type { BiovolumeRelation, CarbonFactor, CarbonVolumeOptions } from './carbon-from-biovolume.js';
export { carbonFromPhosphorus, REDFIELD_C_TO_P } from './carbon-from-phosphorus.js';
export { computeQuotas } from './compute-quotas.js';
export { classResolver } from './resolve-class.js';
export { ratioWithSigma } from './ratio-with-sigma.js';
export { summariseEfficiency } from './summarise-efficiency.js';
export type { SummariseOptions } from './summarise-efficiency.js';
export type { CarbonMethod, ClassSpec, MinimumFeC, QuotaOptions } from './quota-options.js';
