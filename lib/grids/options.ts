import type { Ledger } from '../ledger/index.js';

/** Result of a unit conversion: multiply file values by `factor`; `note` goes to the ledger. */
export interface UnitFactor {
  /** Multiplier from the file's unit to the canonical unit. */
  factor: number;
  /** What was assumed (e.g. a fixed density), recorded as a 'converted' ledger row. */
  note?: string;
}

/** Converts a unit text to the canonical unit: a factor, or an error message. */
export type ToCanonical = (unitsText: string) => UnitFactor | string;

/** Depth in m (positive down) from pressure in dbar at a latitude in degrees north. */
export type PressureToDepth = (pressureDbar: number, latDeg: number) => number;

/** Options of readNetcdfGrid and readCsvGrid. */
export interface GridReadOptions {
  /** Canonical quantity the grid holds: dissolved_fe, nitrate, phosphate, silicate. */
  quantity: string;
  /** Variable name in the file; default: found by `standardName`. */
  variable?: string;
  /** CF standard_name of the variable, used when `variable` is not given. */
  standardName?: string;
  /** Canonical unit of the values; default from `quantity` (nmol/kg for dFe, µmol/kg for nutrients). */
  canonicalUnits?: string;
  /** Units of the values when the file has no units attribute (CSV grids always need it). */
  units?: string;
  /** Unit converter; default: defaultToCanonical(canonicalUnits), a small built-in table. */
  toCanonical?: ToCanonical;
  /** Pressure-to-depth formula; default: 1 dbar ≈ 1 m (within about 1 % in the upper 1000 m; common practice). */
  pressureToDepth?: PressureToDepth;
  /** Sink for 'converted' notes (density assumed, pressure as depth, climatology read from monthly steps). */
  ledger?: Ledger;
}

/** Canonical units of the gridded quantities (DESIGN.md, "Canonical units"). */
export const CANONICAL_GRID_UNITS: Record<string, string> = {
  dissolved_fe: 'nmol/kg',
  nitrate: 'µmol/kg',
  phosphate: 'µmol/kg',
  silicate: 'µmol/kg',
};
