import { describe, expect, it } from 'vitest';
import { DEFAULT_FILL, unpackingOf, unpackValue } from '../../lib/grids/index.js';
import { memoryVariable } from './memory-dataset.js';

describe('unpackingOf', () => {
  it('unpackValue(raw, unpackingOf(v)) is raw·scale_factor + add_offset', () => {
    // CF Conventions 1.10 §8.1: unpacked_data_value = packed_data_value * scale_factor + add_offset.
    const v = memoryVariable('x', [['n', 1]], Int16Array.of(0), { scale_factor: [0.01], add_offset: [20] });
    expect(unpackValue(250, unpackingOf(v))).toBe(250 * 0.01 + 20);
  });

  it('unpackingOf(v) applies valid_range, valid_min/valid_max and missing_value to packed values', () => {
    // CF Conventions 1.10 §8.1: the valid range is in the units of the packed data.
    const ranged = unpackingOf(memoryVariable('x', [['n', 1]], Int16Array.of(0), { scale_factor: [0.1], valid_range: [0, 100] }));
    expect(unpackValue(100, ranged)).toBeCloseTo(10, 12);
    expect(unpackValue(101, ranged)).toBeNaN();
    const minMax = unpackingOf(memoryVariable('x', [['n', 1]], Int16Array.of(0), { valid_min: [5], valid_max: [7], missing_value: [6] }));
    expect([4, 5, 6, 7, 8].map((r) => unpackValue(r, minMax))).toEqual([NaN, 5, NaN, 7, NaN]);
  });

  it('unpackingOf(float variable) without _FillValue treats 9.969209968386869e36 as missing', () => {
    // NetCDF User Guide, "Fill values": NC_FILL_FLOAT = 9.9692099683868690e+36f, NC_FILL_DOUBLE the same in double.
    expect(DEFAULT_FILL.float).toBe(Math.fround(9.969209968386869e36));
    expect(DEFAULT_FILL.double).toBe(9.969209968386869e36);
    // NetCDF User Guide: NC_FILL_SHORT = -32767, NC_FILL_INT = -2147483647.
    expect(DEFAULT_FILL.short).toBe(-32767);
    expect(DEFAULT_FILL.int).toBe(-2147483647);
    const u = unpackingOf(memoryVariable('x', [['n', 1]], Float32Array.of(0)));
    expect(unpackValue(Math.fround(9.969209968386869e36), u)).toBeNaN();
    expect(unpackValue(1.5, u)).toBe(1.5);
  });

  it('unpackingOf(v) with an explicit _FillValue uses it instead of the default', () => {
    const u = unpackingOf(memoryVariable('x', [['n', 1]], Float32Array.of(0), { _FillValue: [-1] }));
    expect(unpackValue(-1, u)).toBeNaN();
    expect(unpackValue(Math.fround(9.969209968386869e36), u)).toBe(Math.fround(9.969209968386869e36));
  });
});
