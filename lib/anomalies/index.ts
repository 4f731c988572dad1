// Public names of the anomalies stage.
export { findAnomalies, ANOMALY_DEFAULTS } from './find-anomalies.js';
export { assignRegions } from './assign-regions.js';
export type { PositionedRow, RegionAssignment } from './assign-regions.js';
export { stationMeans } from './station-means.js';
export type { StationGroup } from './station-means.js';
export { leaveOneOut, flagOf } from './leave-one-out.js';
export { pooledSd, samplingGap } from './sampling-gap.js';
export type {
  AnomalyCell, AnomalyInput, AnomalyOptions, AnomalySettings, AnomalyFlag, AnomalyGroup, AnomalyResults,
  StationResidual, StationInfluence, LeaveOneOut, SamplingGap,
} from './anomaly-types.js';
