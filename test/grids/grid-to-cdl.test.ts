import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { Grid } from '../../lib/types.js';
import { readNetcdfGrid } from '../../lib/grids/index.js';
import { gridToCdl } from '../../data/tools/grid-to-cdl.js';

const hasNcgen = spawnSync('ncgen', ['-version']).error === undefined;
const work = mkdtempSync(join(tmpdir(), 'grid-to-cdl-'));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function grid(extra: Partial<Grid>): Grid {
  const lon = Float64Array.from({ length: 8 }, (_, i) => -180 + 45 * i);
  const lat = Float64Array.of(-45, 0, 45);
  const depth = Float64Array.of(0, 25.5, 1000);
  const nt = extra.time?.length ?? 1;
  const values = Float32Array.from({ length: nt * 3 * 3 * 8 }, (_, i) => (i % 11 === 3 ? NaN : Math.sqrt(i) * 0.1));
  return { quantity: 'dissolved_fe', units: 'nmol/kg', lon, lat, depth, timeKind: 'none', time: Float64Array.of(0), values, periodicLon: true, source: 'demo.nc', variable: 'dfe', ...extra };
}

const meta = { title: 'Invented dFe field', variableName: 'dfe', standardName: 'mole_concentration_of_dissolved_iron_in_sea_water', units: 'nmol/kg' };

function roundTrip(g: Grid, kind: 'nc3' | 'nc4'): Grid {
  const cdl = join(work, `g-${kind}-${g.timeKind}.cdl`);
  const nc = cdl.replace(/\.cdl$/, '.nc');
  writeFileSync(cdl, gridToCdl(g, meta));
  const run = spawnSync('ncgen', ['-k', kind, '-o', nc, cdl], { encoding: 'utf8' });
  expect(run.stderr).toBe('');
  return readNetcdfGrid({ name: 'demo.nc', bytes: new Uint8Array(readFileSync(nc)) }, { quantity: 'dissolved_fe', standardName: meta.standardName });
}

describe('gridToCdl', () => {
  it('gridToCdl(grid, meta) writes CF-1.10 attributes and a climatology bounds variable for months', () => {
    const cdl = gridToCdl(grid({ timeKind: 'month', time: Float64Array.from({ length: 12 }, (_, i) => i + 1) }), meta);
    expect(cdl).toContain('\t\t:Conventions = "CF-1.10" ;');
    expect(cdl).toContain('\t\ttime:climatology = "climatology_bounds" ;');
    expect(cdl).toContain('\tfloat dfe(time, depth, lat, lon) ;');
    expect(cdl).toContain('\t\tdfe:_FillValue = 9.96921e+36f ;');
    // Mid-month of January and December 2000 in days since 2000-01-01 (2000 is a leap year; hand-computed).
    expect(cdl).toMatch(/ time = \n {4}15\.5, 45\.5, 75\.5, 106, 136\.5, 167, 197\.5, 228\.5, 259, 289\.5,\n {4}320, 350\.5 ;/);
    expect(() => gridToCdl(grid({}), { ...meta, variableName: 'd fe' })).toThrow('gridToCdl: variable name "d fe" is not a valid NetCDF name');
  });

  for (const kind of ['nc3', 'nc4'] as const) {
    it.skipIf(!hasNcgen)(`gridToCdl → ncgen -k ${kind} → readNetcdfGrid gives the grid back (skipped when ncgen is not installed)`, () => {
      const cases = [
        grid({}),
        grid({ timeKind: 'month', time: Float64Array.from({ length: 12 }, (_, i) => i + 1) }),
        grid({ timeKind: 'time', time: Float64Array.of(Date.UTC(2019, 4, 3, 12), Date.UTC(2020, 1, 29)) }),
      ];
      for (const g of cases) {
        const back = roundTrip(g, kind);
        expect(back.lon).toEqual(g.lon);
        expect(back.lat).toEqual(g.lat);
        expect(back.depth).toEqual(g.depth);
        expect(back.timeKind).toBe(g.timeKind);
        expect(back.time).toEqual(g.time);
        expect(back.values).toEqual(g.values);
        expect(back.periodicLon).toBe(true);
      }
    });
  }
});
