// The part of a build's results that versions are compared on: plain JSON, stable key order.

/** One fitted parameter with its interval. */
export interface SnapshotParameter {
  /** Phytoplankton class id, or 'all' for the pooled fit. */
  class: string;
  /** Model: ols, sma, york, saturating. */
  model: string;
  /** Parameter name: slope, intercept, qmax, k. */
  parameter: string;
  /** Estimate. */
  estimate: number;
  /** Lower end of its confidence interval (NaN when none). */
  lower: number;
  /** Upper end of its confidence interval (NaN when none). */
  upper: number;
}

/** One tested region × class group and its flag. */
export interface SnapshotRegion {
  /** Region id. */
  region: string;
  /** Class id. */
  class: string;
  /** 'lower-than-fit' | 'higher-than-fit' | 'none' | 'not-tested'. */
  flag: string;
  /** Fold difference 10^mean (NaN when not tested). */
  fold: number;
}

/** What a version is compared on. */
export interface VersionSnapshot {
  /** Report version number. */
  version: number;
  /** Build date (ISO). */
  date: string;
  /** Per cruise: stations, samples, cells. */
  cruises: { cruise: string; stations: string[]; samples: number; cells: number }[];
  /** Cell ids in the merged table, sorted. */
  cellIds: string[];
  /** Fit parameters, sorted by class, model, parameter. */
  parameters: SnapshotParameter[];
  /** Region × class flags, sorted by region, class. */
  regions: SnapshotRegion[];
  /** Ledger counts by table/action/reason, sorted. */
  ledger: { table: string; action: string; reason: string; count: number }[];
}
