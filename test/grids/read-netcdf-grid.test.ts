import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { readNetcdfGrid } from '../../lib/grids/index.js';

const dir = fileURLToPath(new URL('../fixtures/grids/', import.meta.url));
const input = (name: string) => ({ name: `grids/${name}`, bytes: new Uint8Array(readFileSync(dir + name)) });
const f32 = Math.fround;

describe('readNetcdfGrid', () => {
  it('readNetcdfGrid(classic) unpacks scale_factor and add_offset, applies fills and valid_range, rotates 0–360 lon and flips lat', () => {
    const g = readNetcdfGrid(input('packed.nc'), { quantity: 'dissolved_fe', standardName: 'mole_concentration_of_dissolved_iron_in_sea_water' });
    expect(g.variable).toBe('dfe');
    expect(g.units).toBe('nmol/kg');
    expect([...g.lon]).toEqual([-180, -90, 0, 90]);
    expect([...g.lat]).toEqual([-10, 0, 10]);
    expect([...g.depth]).toEqual([10, 100]);
    expect(g.timeKind).toBe('none');
    expect(g.periodicLon).toBe(true);
    // CF Conventions 1.10 §8.1: unpacked = packed·scale_factor + add_offset; 100·0.001 + 0.5 = 0.6 (hand-computed).
    // Row lat −10 at 10 m: packed 31000 > valid_max, −501 < valid_min, −999 = missing_value, 1000 → 1.5.
    // Row lat 0: packed (700, 800, _FillValue, 600) after the lon rotation.
    const expected = [NaN, NaN, NaN, 1.5, 1.2, 1.3, NaN, 1.1, 0.8, 0.9, 0.6, 0.7, 2.6, 2.7, 2.4, 2.5, 2.2, 2.3, 2.0, 2.1, 1.8, 1.9, 1.6, 1.7];
    expect([...g.values]).toEqual(expected.map(f32));
  });

  it('readNetcdfGrid(64-bit offset) transposes (lon, lat, depth, time), negates positive="up", decodes "days since 1990-1-1 0:0:0"', () => {
    const ledger = new Ledger();
    const g = readNetcdfGrid(input('transposed.nc'), { quantity: 'nitrate', variable: 'field', ledger });
    expect([...g.lon]).toEqual([-20, -10, 0]);
    expect([...g.lat]).toEqual([40, 50]);
    expect([...g.depth]).toEqual([0, 50]);
    expect(g.timeKind).toBe('time');
    // CF Conventions 1.10 §4.4 example units "days since 1990-1-1 0:0:0"; 31.5 days later is 1990-02-01T12:00Z (hand-computed).
    expect([...g.time]).toEqual([Date.UTC(1990, 0, 1), Date.UTC(1990, 1, 1, 12)]);
    expect(g.periodicLon).toBe(false);
    const [nx, ny, nz] = [3, 2, 2];
    for (let t = 0; t < 2; t++)
      for (let z = 0; z < nz; z++)
        for (let y = 0; y < ny; y++)
          for (let x = 0; x < nx; x++) {
            const v = g.values[((t * nz + z) * ny + y) * nx + x];
            // Fixture value 1000·x + 100·y + 10·z + t + 1 in mmol m-3; ÷ 1.025 kg/L to µmol/kg (default density 1025 kg/m³).
            if (x === 2 && y === 1 && z === 1 && t === 1) expect(v).toBeNaN(); // default float fill 9.96921e36 (NetCDF User Guide, "Fill values")
            else expect(v).toBe(f32(f32(1000 * x + 100 * y + 10 * z + t + 1) / 1.025));
          }
    expect(ledger.entries).toEqual([
      { table: 'grid', file: 'grids/transposed.nc', line: 0, stage: 'load', action: 'converted', reason: 'unit-assumption', detail: 'converted mmol m-3 to µmol/kg with a fixed seawater density of 1025 kg/m³' },
    ]);
  });

  it('readNetcdfGrid(netCDF-4) reads a 12-month climatology with climatology bounds as months 1..12', () => {
    const g = readNetcdfGrid(input('climatology.nc'), { quantity: 'dissolved_fe', standardName: 'mole_concentration_of_dissolved_iron_in_sea_water' });
    expect(g.timeKind).toBe('month');
    expect([...g.time]).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect([...g.depth]).toEqual([0, 100, 500]);
    expect(g.periodicLon).toBe(true);
    const at = (m: number, z: number, y: number, x: number) => g.values[(((m - 1) * 3 + z) * 4 + y) * 6 + x];
    // Fixture value month·100 + z·10 + y + x/10.
    expect(at(3, 1, 2, 4)).toBe(f32(300 + 10 + 2 + 0.4));
    expect(at(6, 2, 3, 5)).toBeNaN(); // _FillValue -1
    expect(at(12, 2, 3, 5)).toBe(f32(1200 + 20 + 3 + 0.5));
  });

  it('readNetcdfGrid(classic) decodes a noleap record time axis and reads dbar as m (1 dbar ≈ 1 m) with a ledger note', () => {
    const ledger = new Ledger();
    const g = readNetcdfGrid(input('noleap.nc'), { quantity: 'phosphate', variable: 'po4', ledger });
    // CF Conventions 1.10 §4.4.1: noleap has no 29 February, so day 59 after 2000-01-01 is 1 March and day 365 is 2001-01-01 (hand-computed).
    expect([...g.time]).toEqual([Date.UTC(2000, 0, 1), Date.UTC(2000, 2, 1), Date.UTC(2001, 0, 1), Date.UTC(2002, 0, 1, 12)]);
    expect([...g.depth]).toEqual([0, 1000]);
    expect(g.values[((3 * 2 + 1) * 2 + 1) * 2 + 1]).toBe(3 + 0.5 + 0.25 + 0.125);
    expect(ledger.entries.map((e) => e.detail)).toEqual(['vertical axis pres is pressure in dbar; converted to depth in m as 1 dbar ≈ 1 m']);
  });

  it('readNetcdfGrid(classic) uses a supplied pressureToDepth at the central latitude', () => {
    const calls: [number, number][] = [];
    const g = readNetcdfGrid(input('noleap.nc'), {
      quantity: 'phosphate',
      variable: 'po4',
      pressureToDepth: (p, lat) => {
        calls.push([p, lat]);
        return p * 0.99;
      },
    });
    expect([...g.depth]).toEqual([0, 990]);
    expect(calls).toEqual([
      [0, 0],
      [1000, 0],
    ]);
  });

  it('readNetcdfGrid(no latitude axis) names the variable, its dims and what was looked for', () => {
    expect(() => readNetcdfGrid(input('no-lat.nc'), { quantity: 'nitrate', variable: 'no3' })).toThrow(
      'grids/no-lat.nc: variable no3(y, x) has no recognisable latitude axis; looked for a coordinate variable with axis = "Y", standard_name = "latitude" or units = "degrees_north"',
    );
  });

  it('readNetcdfGrid(unknown variable) lists the variables with their standard_names', () => {
    expect(() => readNetcdfGrid(input('no-lat.nc'), { quantity: 'nitrate', standardName: 'mole_concentration_of_nitrate_in_sea_waters' })).toThrow(
      'grids/no-lat.nc: no variable with standard_name "mole_concentration_of_nitrate_in_sea_waters"; the file has: y (projection_y_coordinate), x (longitude), no3 (mole_concentration_of_nitrate_in_sea_water)',
    );
    expect(() => readNetcdfGrid(input('packed.nc'), { quantity: 'dissolved_fe', variable: 'fe' })).toThrow(
      'grids/packed.nc: no variable named "fe"; the file has: lon (longitude), lat, depth, dfe (mole_concentration_of_dissolved_iron_in_sea_water)',
    );
  });

  it('readNetcdfGrid(truncated files) gives a clear message and keeps the library error as cause', () => {
    expect(() => readNetcdfGrid(input('truncated.nc'), { quantity: 'dissolved_fe', variable: 'dfe' })).toThrow(
      'grids/truncated.nc: file is truncated: variable depth needs 772 bytes but the file has 760',
    );
    let caught: unknown;
    try {
      readNetcdfGrid(input('truncated-header.nc'), { quantity: 'dissolved_fe', variable: 'dfe' });
    } catch (error) {
      caught = error;
    }
    expect((caught as Error).message).toBe(
      'grids/truncated-header.nc: not a readable NetCDF file (Offset is outside the bounds of the DataView); expected a complete classic, 64-bit offset or netCDF-4 file',
    );
    expect((caught as Error).cause).toBeInstanceOf(Error);
    expect(() => readNetcdfGrid(input('truncated-nc4.nc'), { quantity: 'dissolved_fe', variable: 'dfe' })).toThrow(
      'grids/truncated-nc4.nc: file is truncated: the HDF5 superblock says 16062 bytes but the file has 3000',
    );
  });

  it('readNetcdfGrid(text file) says it is not NetCDF and shows the first bytes', () => {
    expect(() => readNetcdfGrid(input('not-netcdf.nc'), { quantity: 'dissolved_fe', variable: 'dfe' })).toThrow(
      'grids/not-netcdf.nc: not a NetCDF file: it starts with bytes [6c 6f 6e 2c]; expected "CDF" followed by 0x01 or 0x02 (classic, 64-bit offset) or "\\x89HDF" (netCDF-4)',
    );
  });

  it('readNetcdfGrid(bytes) does not mutate its input', () => {
    const i = input('packed.nc');
    const copy = i.bytes.slice();
    readNetcdfGrid(i, { quantity: 'dissolved_fe', variable: 'dfe' });
    expect(i.bytes).toEqual(copy);
  });
});
