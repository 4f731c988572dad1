/** Dimension model of unit strings: integer exponents over a few base dimensions of the trade. */

/** Base dimensions: amount (mol), mass (kg), length (m), cell count, pressure (dbar), temperature (°C). */
export const BASE_DIMENSIONS = ['amount', 'mass', 'length', 'cell', 'pressure', 'temperature'] as const;

/** One base dimension. */
export type BaseDimension = (typeof BASE_DIMENSIONS)[number];

/** Exponents over the base dimensions; a missing key is exponent 0. */
export type Dimension = Partial<Record<BaseDimension, number>>;

/** Product of two dimensions raised to `power` for the second: a·b^power. */
export function combineDimensions(a: Dimension, b: Dimension, power: number): Dimension {
  const out: Dimension = {};
  for (const key of BASE_DIMENSIONS) {
    const e = (a[key] ?? 0) + (b[key] ?? 0) * power;
    if (e !== 0) out[key] = e;
  }
  return out;
}

/** True when both dimensions have the same exponents. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return BASE_DIMENSIONS.every((key) => (a[key] ?? 0) === (b[key] ?? 0));
}

/** Amount per mass, e.g. nmol/kg. */
export const AMOUNT_PER_MASS: Dimension = { amount: 1, mass: -1 };
/** Amount per volume, e.g. nmol/L. */
export const AMOUNT_PER_VOLUME: Dimension = { amount: 1, length: -3 };
/** Amount per cell, e.g. fmol/cell. */
export const AMOUNT_PER_CELL: Dimension = { amount: 1, cell: -1 };
/** Mass per cell, e.g. pg C/cell. */
export const MASS_PER_CELL: Dimension = { mass: 1, cell: -1 };
/** Volume, e.g. µm³. */
export const VOLUME: Dimension = { length: 3 };
/** Length, e.g. m, µm. */
export const LENGTH: Dimension = { length: 1 };
/** Pressure, e.g. dbar. */
export const PRESSURE: Dimension = { pressure: 1 };
/** Temperature, °C. */
export const TEMPERATURE: Dimension = { temperature: 1 };
/** Dimensionless, e.g. practical salinity. */
export const DIMENSIONLESS: Dimension = {};
