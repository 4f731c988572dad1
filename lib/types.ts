/** Shared plain-data types of the basinquota pipeline; one doc line per field. */

/** An input handed to a pure stage: the CLI reads the file, the core never touches disk. */
export interface InputText {
  /** Path as the user wrote it in the config, relative to the project folder (used in messages). */
  name: string;
  /** Whole file content decoded as UTF-8. */
  text: string;
}

/** A binary input (NetCDF, Parquet, Arrow) handed to a pure stage. */
export interface InputBytes {
  /** Path relative to the project folder (used in messages). */
  name: string;
  /** Whole file content. */
  bytes: Uint8Array;
}

/** Internal quality scale every published flag scheme maps onto. */
export type QualityFlag = 'good' | 'questionable' | 'bad' | 'missing' | 'below_detection';

/** What a ledger row says happened to an input row. */
export type LedgerAction = 'excluded' | 'converted' | 'flagged';

/** One ledger row: an input row a stage excluded, converted or flagged, with the reason. */
export interface LedgerEntry {
  /** Logical table: 'samples', 'cells', 'grid', 'regions', 'config'. */
  table: string;
  /** Input file, relative to the project folder. */
  file: string;
  /** Physical line in the file (header is line 1); 0 when not line-based. */
  line: number;
  /** Stage that wrote the entry: load, harmonise, match, quotas, fits, anomalies. */
  stage: string;
  /** What happened to the row. Only 'excluded' rows leave the pipeline. */
  action: LedgerAction;
  /** Stable machine-readable reason code, e.g. 'ragged-row', 'not-a-number'. */
  reason: string;
  /** Human-readable detail naming the column and value. */
  detail: string;
}

/** A problem that stops a build: shown as `file:line:col message`. */
export interface Problem {
  /** File relative to the project folder. */
  file: string;
  /** 1-based line, 0 when unknown. */
  line: number;
  /** 1-based column, 0 when unknown. */
  col: number;
  /** What is wrong and what was expected. */
  message: string;
  /** 'error' stops the build; 'warning' is reported only. */
  severity: 'error' | 'warning';
}

/** Kind of time axis of a gridded field. */
export type GridTimeKind = 'none' | 'month' | 'time';

/**
 * A gridded field on a regular (or irregular rectilinear) lon/lat/depth/time grid.
 * Values are in canonical units, missing as NaN, stored as one Float32Array.
 */
export interface Grid {
  /** Canonical quantity name, e.g. 'dissolved_fe', 'nitrate', 'phosphate'. */
  quantity: string;
  /** Canonical unit of `values` (nmol/kg for dFe, µmol/kg for nutrients). */
  units: string;
  /** Longitudes in degrees east, strictly ascending, within [-180, 180). */
  lon: Float64Array;
  /** Latitudes in degrees north, strictly ascending. */
  lat: Float64Array;
  /** Depths in metres, positive down, strictly ascending; length 1 for a single level. */
  depth: Float64Array;
  /** Time axis kind: none (length 1), 12-month climatology (values 1..12) or absolute time. */
  timeKind: GridTimeKind;
  /** Months 1..12 for 'month'; milliseconds since 1970-01-01T00:00Z for 'time'; [0] for 'none'. */
  time: Float64Array;
  /** Values indexed [t][z][y][x]: index = ((t*nz + z)*ny + y)*nx + x. NaN = missing. */
  values: Float32Array;
  /** True when longitudes wrap around the globe (span ≈ 360°), so interpolation crosses the dateline. */
  periodicLon: boolean;
  /** Input file the grid came from (messages, provenance). */
  source: string;
  /** Variable name in the file. */
  variable: string;
}
