/** Plain-data types of the anomalies stage; one doc line per field, defaults stated. */

/** One cell entering the anomaly tests. */
export interface AnomalyCell {
  /** Phytoplankton class, e.g. 'diatom'. */
  phytoClass: string;
  /** Station identifier within its cruise. */
  stationKey: string;
  /** Cruise identifier; stations are keyed by cruise and station together. */
  cruise: string;
  /** Longitude, degrees east. */
  lon: number;
  /** Latitude, degrees north. */
  lat: number;
  /** Residual of log10 Fe:C from the primary fit, observed − predicted (log10 units); NaN if not fitted. */
  residual: number;
  /** Region id from assignRegion / assignRegions; null when the cell lies in no region. */
  regionId: string | null;
  /** Input file of the cell (ledger entries); default ''. */
  sourceFile?: string;
  /** Input line of the cell (ledger entries); default 0. */
  sourceLine?: number;
}

/** The cells of one run. */
export type AnomalyInput = readonly AnomalyCell[];

/** Settings of the anomalies stage (config `anomalies:`). */
export interface AnomalyOptions {
  /** Fewest stations for a region × class group to be tested (config min_stations); default 5. */
  minStations?: number;
  /** Benjamini–Hochberg false discovery rate across all tested groups (config fdr_q); default 0.1. */
  fdrQ?: number;
  /** Fold difference the sampling-gap table asks for (lower or higher by this factor); default 1.5. */
  targetFold?: number;
  /** Power of the sampling-gap calculation; default 0.8. */
  power?: number;
  /** Confidence level of the mean and fold intervals; default 0.95. */
  level?: number;
}

/** Settings as used, defaults filled in. */
export interface AnomalySettings {
  /** Fewest stations for a group to be tested. */
  minStations: number;
  /** False discovery rate of the BH procedure. */
  fdrQ: number;
  /** Target fold difference of the sampling-gap table. */
  targetFold: number;
  /** Power of the sampling-gap table. */
  power: number;
  /** Significance used in the power calculation: fdrQ (an optimistic stand-in for BH's per-test threshold q·k/m). */
  alphaForPower: number;
  /** Confidence level of the intervals. */
  level: number;
}

/** Direction of a flagged group, or why it has none. */
export type AnomalyFlag = 'lower-than-fit' | 'higher-than-fit' | 'none' | 'not-tested';

/** One station of a group: the mean residual of its cells. */
export interface StationResidual {
  /** Cruise. */
  cruise: string;
  /** Station identifier. */
  station: string;
  /** Cells averaged. */
  nCells: number;
  /** Mean residual of the cells (log10 units). */
  meanResidual: number;
  /** Mean longitude of the cells, degrees east. */
  lon: number;
  /** Mean latitude of the cells, degrees north. */
  lat: number;
}

/** A station named by the leave-one-station-out check. */
export interface StationInfluence {
  /** Cruise of the station. */
  cruise: string;
  /** Station identifier. */
  station: string;
  /** The station's mean residual (log10 units). */
  meanResidual: number;
  /** Group mean residual without the station. */
  meanWithout: number | null;
  /** Two-sided t-test p without the station (null when too few stations remain). */
  pWithout: number | null;
  /** Flag the group gets without the station (other groups' p fixed in the BH step). */
  flagWithout: AnomalyFlag;
}

/** Leave-one-station-out robustness of a tested group's flag. */
export interface LeaveOneOut {
  /** True when removing any single station leaves the flag unchanged. */
  flagStable: boolean;
  /** Number of single-station removals that change the flag. */
  flagChanges: number;
  /** Station whose removal moves the group mean most (largest |residual − mean|; Belsley, Kuh & Welsch 1980 DFBETA for a mean). */
  mostInfluential: StationInfluence;
  /** Station whose removal leaves the weakest evidence (largest p without it): the one the flag leans on. */
  weakestRemoval: StationInfluence;
}

/** How far the current sampling is from resolving a target fold difference. */
export interface SamplingGap {
  /** Smallest shift |mean| in log10 units detectable with the current stations (null below 2 stations). */
  minDetectableLog10: number | null;
  /** 10^minDetectableLog10: detectable fold difference (lower by 1/fold or higher by fold). */
  minDetectableFold: number | null;
  /** Stations needed to detect targetFold (at least minStations; null if the pooled SD is unknown). */
  stationsForTargetFold: number | null;
  /** Additional stations needed beyond the current number (0 when already enough). */
  additionalStations: number | null;
}

/** The test result of one region × class group. */
export interface AnomalyGroup {
  /** Region id. */
  region: string;
  /** Phytoplankton class. */
  phytoClass: string;
  /** Stations in the group. */
  nStations: number;
  /** Cells in the group. */
  nCells: number;
  /** 'tested' when nStations ≥ minStations, else 'not-tested'. */
  status: 'tested' | 'not-tested';
  /** BH-controlled direction: residual mean below 0 is 'lower-than-fit' (less iron than the fit predicts). */
  flag: AnomalyFlag;
  /** Mean of the station mean residuals (log10 units). */
  meanResidual: number | null;
  /** Between-station standard deviation (log10 units). */
  sd: number | null;
  /** Standard error of the mean. */
  se: number | null;
  /** Lower end of the level interval of the mean. */
  ciLow: number | null;
  /** Upper end of the level interval of the mean. */
  ciHigh: number | null;
  /** Fold difference from the fit, 10^mean. */
  fold: number | null;
  /** 10^ciLow. */
  foldLow: number | null;
  /** 10^ciHigh. */
  foldHigh: number | null;
  /** One-sample t statistic against 0. */
  t: number | null;
  /** Degrees of freedom, nStations − 1. */
  df: number | null;
  /** Two-sided t-test p. */
  pValue: number | null;
  /** BH-adjusted p across all tested groups. */
  pAdjusted: number | null;
  /** Wilcoxon signed-rank test on the station means (robust check). */
  wilcoxon: { statistic: number; p: number | null; method: 'exact' | 'normal-approx' } | null;
  /** 'agrees' when the Wilcoxon p ≤ fdrQ in the same direction as the mean, else 'disagrees'; null if untested. */
  robustCheck: 'agrees' | 'disagrees' | null;
  /** Leave-one-station-out check; null for untested groups. */
  leaveOneOut: LeaveOneOut | null;
  /** Detectable fold and stations needed. */
  samplingGap: SamplingGap;
  /** Station means, sorted by cruise then station. */
  stations: StationResidual[];
}

/** Output of the anomalies stage: plain JSON, stable key order, groups sorted by region then class. */
export interface AnomalyResults {
  /** Settings as used. */
  settings: AnomalySettings;
  /** Counts of cells, stations and groups. */
  counts: {
    cellsIn: number;
    cellsUsed: number;
    cellsNoResidual: number;
    cellsNoRegion: number;
    stations: number;
    groups: number;
    groupsTested: number;
    groupsFlagged: number;
  };
  /** Between-station SD pooled over all groups with ≥ 2 stations (log10 units) and its degrees of freedom. */
  pooled: { sd: number | null; df: number };
  /** One entry per region × class. */
  groups: AnomalyGroup[];
}
