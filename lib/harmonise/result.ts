import type * as aq from 'arquero';

/** How a column was converted, for the Inventory and Methods pages. */
export type ConversionMethod = 'factor' | 'eos80-density' | 'default-density' | 'molar-mass' | 'depth-from-pressure';

/** Rows of one file converted one way, e.g. "nmol/L → nmol/kg with EOS-80 density: 412 rows". */
export interface ConversionCount {
  /** Canonical column. */
  column: string;
  /** Unit as written by the user ('dbar' for depth from pressure). */
  from: string;
  /** Canonical unit. */
  to: string;
  /** How it was converted. */
  method: ConversionMethod;
  /** Rows (kept rows with a finite value) converted this way. */
  rows: number;
}

/** Per-file summary of the harmonise stage. */
export interface HarmoniseSummary {
  /** Ledger table name ('samples' or 'cells'). */
  table: string;
  /** Input file. */
  file: string;
  /** Rows in the input table. */
  rowsIn: number;
  /** Rows in the output table; rowsIn = rowsOut + excluded. */
  rowsOut: number;
  /** Rows excluded (one 'excluded' ledger row each). */
  excluded: number;
  /** Non-identity conversions, sorted by column then method. */
  conversions: ConversionCount[];
  /** Below-detection values replaced by DL/2 or DL. */
  belowDetectionSubstituted: number;
}

/** What harmoniseSamples and harmoniseCells return: the harmonised table and its summary. */
export interface HarmoniseResult {
  /** Harmonised rows in canonical units, excluded rows removed, input column order kept, quality columns appended. */
  table: aq.ColumnTable;
  /** Counts for the report pages. */
  summary: HarmoniseSummary;
}

/** Sort conversion counts by column, then method, then unit (stable report order). */
export function sortConversions(list: ConversionCount[]): ConversionCount[] {
  const key = (c: ConversionCount) => `${c.column}\u0000${c.method}\u0000${c.from}`;
  return list.filter((c) => c.rows > 0).sort((a, b) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0));
}
