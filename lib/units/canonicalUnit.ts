import { ELEMENTS, SAMPLE_QUANTITIES } from '../load/canonical.js';
import {
  AMOUNT_PER_CELL,
  AMOUNT_PER_MASS,
  AMOUNT_PER_VOLUME,
  DIMENSIONLESS,
  LENGTH,
  MASS_PER_CELL,
  PRESSURE,
  TEMPERATURE,
  VOLUME,
  type Dimension,
} from './dimension.js';

/** How a column's values convert: the family of units it accepts. */
export type UnitKind =
  | 'concentration'
  | 'content'
  | 'carbon'
  | 'volume'
  | 'length'
  | 'pressure'
  | 'temperature'
  | 'dimensionless';

/** The canonical unit of one canonical column (DESIGN.md, "Canonical units and names"). */
export interface CanonicalUnit {
  /** Canonical unit as written in reports, e.g. "nmol/kg". */
  unit: string;
  /** Family of accepted units. */
  kind: UnitKind;
  /** Dimension of the canonical unit. */
  dimension: Dimension;
  /** Factor of the canonical unit to base units (mol, kg, m, cell, dbar, °C). */
  factor: number;
  /** Other dimensions accepted (converted with density or molar mass). */
  alsoAccepted: Dimension[];
  /** What the column expects, for messages. */
  expected: string;
}

const CONCENTRATION = (unit: string, factor: number): CanonicalUnit => ({
  unit,
  kind: 'concentration',
  dimension: AMOUNT_PER_MASS,
  factor,
  alsoAccepted: [AMOUNT_PER_VOLUME],
  expected: 'amount per mass or per volume',
});

const CONTENT: CanonicalUnit = {
  unit: 'mol/cell',
  kind: 'content',
  dimension: AMOUNT_PER_CELL,
  factor: 1,
  alsoAccepted: [],
  expected: 'amount per cell',
};

const CARBON: CanonicalUnit = {
  unit: 'mol/cell',
  kind: 'carbon',
  dimension: AMOUNT_PER_CELL,
  factor: 1,
  alsoAccepted: [MASS_PER_CELL],
  expected: 'amount per cell or carbon mass per cell',
};

function simple(unit: string, kind: UnitKind, dimension: Dimension, factor: number, expected: string): CanonicalUnit {
  return { unit, kind, dimension, factor, alsoAccepted: [], expected };
}

const TABLE: Record<string, CanonicalUnit> = {
  depth: simple('m', 'length', LENGTH, 1, 'length'),
  pressure: simple('dbar', 'pressure', PRESSURE, 1, 'pressure'),
  temperature: simple('degC', 'temperature', TEMPERATURE, 1, 'temperature in °C'),
  salinity: simple('1', 'dimensionless', DIMENSIONLESS, 1, 'a dimensionless practical salinity'),
  biovolume: simple('µm3', 'volume', VOLUME, 1e-18, 'volume'),
  cell_length: simple('µm', 'length', LENGTH, 1e-6, 'length'),
  cell_width: simple('µm', 'length', LENGTH, 1e-6, 'length'),
  cell_height: simple('µm', 'length', LENGTH, 1e-6, 'length'),
  carbon: CARBON,
  carbon_sigma: CARBON,
};
for (const q of SAMPLE_QUANTITIES) {
  const c = q === 'dissolved_fe' ? CONCENTRATION('nmol/kg', 1e-9) : CONCENTRATION('µmol/kg', 1e-6);
  TABLE[q] = c;
  TABLE[`${q}_dl`] = c;
}
for (const el of ELEMENTS) {
  TABLE[el] = CONTENT;
  TABLE[`${el}_sigma`] = CONTENT;
  TABLE[`${el}_dl`] = CONTENT;
}

/** Canonical unit of a canonical column name (dissolved_fe → nmol/kg, fe → mol/cell, depth → m); undefined for unitless columns. */
export function canonicalUnit(column: string): CanonicalUnit | undefined {
  return Object.hasOwn(TABLE, column) ? TABLE[column] : undefined;
}

/** Canonical column names that carry a unit, sorted. */
export function unitColumns(): string[] {
  return Object.keys(TABLE).sort();
}
