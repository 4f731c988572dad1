import type { DatasetVariable, NetcdfType } from './dataset.js';
import { numberAttribute } from './dataset.js';

/** Default fill values by type (NetCDF User Guide, "Fill values", netcdf.h NC_FILL_*); byte has none by convention. */
export const DEFAULT_FILL: Partial<Record<NetcdfType, number>> = {
  short: -32767,
  ushort: 65535,
  int: -2147483647,
  uint: 4294967295,
  float: Math.fround(9.969209968386869e36),
  double: 9.969209968386869e36,
};

/** How to turn packed values into physical ones: test raw values against fills and the valid range, then raw·scale + offset. */
export interface Unpacking {
  /** Up to two raw values that mean missing (NaN when unused, so never equal). */
  fill1: number;
  /** Second missing value. */
  fill2: number;
  /** Smallest valid raw value (inclusive). */
  validMin: number;
  /** Largest valid raw value (inclusive). */
  validMax: number;
  /** scale_factor, 1 when absent. */
  scale: number;
  /** add_offset, 0 when absent. */
  offset: number;
}

/**
 * Reads _FillValue, missing_value, valid_min/valid_max/valid_range, scale_factor and add_offset
 * (CF Conventions 1.10 §2.5.1 and §8.1: fill and valid range are in packed units); without _FillValue
 * the type's default fill counts as missing (NetCDF User Guide, "Fill values").
 */
export function unpackingOf(v: DatasetVariable): Unpacking {
  // Fill values of a float variable are compared in float32, as the file stores them.
  const asType = (x: number): number => (v.type === 'float' ? Math.fround(x) : x);
  const fill = numberAttribute(v.attributes, '_FillValue')?.[0] ?? DEFAULT_FILL[v.type];
  const missing = numberAttribute(v.attributes, 'missing_value')?.[0];
  const range = numberAttribute(v.attributes, 'valid_range');
  const validMin = range?.[0] ?? numberAttribute(v.attributes, 'valid_min')?.[0] ?? -Infinity;
  const validMax = range?.[1] ?? numberAttribute(v.attributes, 'valid_max')?.[0] ?? Infinity;
  return {
    fill1: fill === undefined ? NaN : asType(fill),
    fill2: missing === undefined ? NaN : asType(missing),
    validMin: Number.isFinite(validMin) ? asType(validMin) : validMin,
    validMax: Number.isFinite(validMax) ? asType(validMax) : validMax,
    scale: numberAttribute(v.attributes, 'scale_factor')?.[0] ?? 1,
    offset: numberAttribute(v.attributes, 'add_offset')?.[0] ?? 0,
  };
}

/** One value unpacked: NaN when missing or outside the valid range, else raw·scale_factor + add_offset (CF Conventions 1.10 §8.1). */
export function unpackValue(raw: number, u: Unpacking): number {
  if (raw !== raw || raw === u.fill1 || raw === u.fill2 || raw < u.validMin || raw > u.validMax) return NaN;
  return raw * u.scale + u.offset;
}
