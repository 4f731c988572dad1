// What the Changes page and `basinquota diff` show: plain JSON, every list in a stable order.

/** A version named on the page. */
export interface VersionRef {
  /** Version number. */
  version: number;
  /** Its build date (ISO). */
  date: string;
}

/** A fitted value; null where the snapshot had NaN (no interval) or JSON turned NaN into null. */
export interface ParameterValue {
  /** Estimate. */
  estimate: number | null;
  /** Lower end of the confidence interval. */
  lower: number | null;
  /** Upper end of the confidence interval. */
  upper: number | null;
}

/** One fit parameter, old → new. */
export interface ParameterChange {
  /** Phytoplankton class id, or 'all'. */
  class: string;
  /** Model id. */
  model: string;
  /** Parameter name. */
  parameter: string;
  /** In the previous version; null when the parameter appeared. */
  before: ParameterValue | null;
  /** In this version; null when the parameter disappeared. */
  after: ParameterValue | null;
  /** The new estimate lies outside the old [lower, upper]; false when either is missing or the old interval is unknown. */
  outsideOldInterval: boolean;
}

/** How a region × class flag changed. */
export type RegionChangeKind = 'newly-flagged' | 'cleared' | 'reversed';

/** One region × class whose flag changed. */
export interface RegionChange {
  /** Region id. */
  region: string;
  /** Class id. */
  class: string;
  /** newly-flagged, cleared, or reversed (lower ↔ higher than the fit). */
  change: RegionChangeKind;
  /** Previous flag; null when the group was absent. */
  before: string | null;
  /** Current flag; null when the group is absent. */
  after: string | null;
  /** Previous fold difference. */
  foldBefore: number | null;
  /** Current fold difference. */
  foldAfter: number | null;
}

/** Per-cruise station differences (cruises present in both versions). */
export interface StationChange {
  /** Cruise id. */
  cruise: string;
  /** Stations new in this version, sorted. */
  added: string[];
  /** Stations gone from this version, sorted. */
  removed: string[];
}

/** Per-cruise sample and cell counts that differ (0 for a cruise absent on one side). */
export interface HoldingChange {
  /** Cruise id. */
  cruise: string;
  /** Samples before. */
  samplesBefore: number;
  /** Samples now. */
  samplesAfter: number;
  /** Cells before. */
  cellsBefore: number;
  /** Cells now. */
  cellsAfter: number;
}

/** Ledger count by table/action/reason that differs (0 when absent on one side). */
export interface LedgerChange {
  /** Logical table. */
  table: string;
  /** excluded, converted or flagged. */
  action: string;
  /** Reason code. */
  reason: string;
  /** Count before. */
  before: number;
  /** Count now. */
  after: number;
}

/** Everything that changed between two versions; `previous` is null for the first version (all lists empty). */
export interface ChangesSection {
  /** The version compared with, or null when there is none. */
  previous: VersionRef | null;
  /** This version. */
  current: VersionRef;
  /** Cruises added and removed, sorted. */
  cruises: { added: string[]; removed: string[] };
  /** Station differences per cruise, sorted by cruise. */
  stations: StationChange[];
  /** Sample and cell counts per cruise that differ, sorted by cruise. */
  holdings: HoldingChange[];
  /** Merged cell table: totals, and added/removed ids (count and the first few, sorted). */
  cells: { before: number; after: number; added: number; removed: number; addedIds: string[]; removedIds: string[] };
  /** Every fit parameter in either version, sorted by class, model, parameter. */
  parameters: ParameterChange[];
  /** Region × class groups whose flag changed, sorted by region, class. */
  regions: RegionChange[];
  /** Ledger counts that differ, sorted by table, action, reason. */
  ledger: LedgerChange[];
}
