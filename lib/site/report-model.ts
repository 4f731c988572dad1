// The plain-data model every page template reads; built from pipeline results, never from disk.
import type { CruiseInventory, LedgerGroup } from './inventory.js';
import type { KeyFinding } from './key-findings.js';

/** Report metadata shown on every page. */
export interface ReportMeta {
  /** Report title. */
  title: string;
  /** Authors in citation order. */
  authors: string[];
  /** Programme or working group, if any. */
  programme: string | null;
  /** Licence of the report. */
  licence: string;
  /** Contact, if any. */
  contact: string | null;
  /** Report version number (1, 2, …). */
  version: number;
  /** Build date, ISO 8601 (from SOURCE_DATE_EPOCH or the newest input). */
  date: string;
  /** basinquota package version. */
  toolVersion: string;
}

/** Headline counts on the Overview page. */
export interface ReportCounts {
  /** Distinct cruises. */
  cruises: number;
  /** Distinct cruise/station pairs. */
  stations: number;
  /** Bottle rows used. */
  samples: number;
  /** Cell rows used. */
  cells: number;
  /** Cells per phytoplankton class. */
  cellsByClass: { value: string; count: number }[];
}

/** Rows read per input file and how many the ledger excluded. */
export interface FileAccount {
  /** Logical table. */
  table: string;
  /** File path in the project. */
  file: string;
  /** Data rows read. */
  rowsRead: number;
  /** Rows used downstream. */
  rowsUsed: number;
  /** Rows excluded in the ledger. */
  rowsExcluded: number;
}

/** One unit conversion performed by the harmonise stage, for the Inventory and Methods pages. */
export interface ConversionRow {
  /** Input file. */
  file: string;
  /** Canonical column. */
  column: string;
  /** Unit as written. */
  from: string;
  /** Canonical unit. */
  to: string;
  /** How (factor, eos80-density, default-density, molar-mass, depth-from-pressure). */
  method: string;
  /** Rows converted this way. */
  rows: number;
}

/** One cruise pair of the cross-cruise dFe comparison. */
export interface CrossoverRow {
  /** First cruise (sorted). */
  cruiseA: string;
  /** Second cruise. */
  cruiseB: string;
  /** Mean dFe difference a − b below the comparison depth, nmol/kg. */
  offset: number;
  /** Its standard error, nmol/kg. */
  se: number;
  /** Common depths compared. */
  nDepths: number;
  /** Station pairs compared. */
  nPairs: number;
  /** Beyond the threshold and 2 SE. */
  flagged: boolean;
}

/** Everything the page templates need. Sections that a stage did not produce are absent. */
export interface ReportModel {
  /** Metadata. */
  meta: ReportMeta;
  /** Headline counts. */
  counts: ReportCounts;
  /** Key findings written from the results, each linked to its figure. */
  findings: KeyFinding[];
  /** Per-cruise holdings. */
  inventory: CruiseInventory[];
  /** Per-file accounting (rows read = used + excluded). */
  files: FileAccount[];
  /** Ledger grouped by reason. */
  ledger: LedgerGroup[];
  /** Unit conversions performed. */
  conversions: ConversionRow[];
  /** Cells by the source of their ambient dFe (bottle, bottle-interpolated, grid, none). */
  matchSources: { value: string; count: number }[];
  /** Cross-cruise dFe offsets. */
  crossover: CrossoverRow[];
  /** Crossover comparison settings shown with the table. */
  crossoverSettings: { maxDistanceKm: number; minDepthM: number; thresholdNmolKg: number };
  /** Pages this build has (hrefs), for the navigation. */
  pages: string[];
  /** Further sections added by later stages, keyed by page. */
  sections: Record<string, unknown>;
}
