import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { cfGrid } from '../../lib/grids/index.js';
import { coordinate, memoryDataset, memoryVariable } from './memory-dataset.js';

const lonAttrs = { units: 'degrees_east' };
const latAttrs = { units: 'degrees_north' };

describe('cfGrid', () => {
  it('cfGrid(12 monthly steps in one year) reads a month climatology and notes it in the ledger', () => {
    const ledger = new Ledger();
    const days = [15, 45, 74, 105, 135, 166, 196, 227, 258, 288, 319, 349];
    const ds = memoryDataset([
      coordinate('t', days, { units: 'days since 2005-01-01' }),
      coordinate('lat', [0], latAttrs),
      coordinate('lon', [0, 1], lonAttrs),
      memoryVariable('v', [['t', 12], ['lat', 1], ['lon', 2]], Float32Array.from({ length: 24 }, (_, i) => i), { units: 'umol/kg' }),
    ]);
    const g = cfGrid(ds, { quantity: 'nitrate', variable: 'v', ledger });
    expect(g.timeKind).toBe('month');
    expect([...g.time]).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(ledger.entries.map((e) => e.detail)).toEqual(['time axis t has 12 monthly steps within 2005; read as a month-of-year climatology']);
  });

  it('cfGrid(month-of-year units in any order) sorts months and keeps values with them', () => {
    const ds = memoryDataset([
      coordinate('m', [12, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11], { units: 'month' }),
      coordinate('lat', [0], latAttrs),
      coordinate('lon', [0], lonAttrs),
      memoryVariable('v', [['m', 12], ['lat', 1], ['lon', 1]], Float32Array.of(12, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11), { units: 'nmol/kg' }),
    ]);
    const g = cfGrid(ds, { quantity: 'dissolved_fe', variable: 'v' });
    expect([...g.values]).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
  });

  it('cfGrid(nM dFe) converts with the fixed density and drops a 360° duplicate lon column', () => {
    const ledger = new Ledger();
    const ds = memoryDataset([
      coordinate('lat', [0], latAttrs),
      coordinate('lon', [0, 120, 240, 360], lonAttrs),
      memoryVariable('v', [['lat', 1], ['lon', 4]], Float64Array.of(1.025, 2.05, 3.075, 1.025), { units: 'nM' }),
    ]);
    const g = cfGrid(ds, { quantity: 'dissolved_fe', variable: 'v', ledger });
    expect([...g.lon]).toEqual([-120, 0, 120]);
    // 1 nmol/L ÷ 1.025 kg/L = 1 nmol/kg at the default density 1025 kg/m³ (common practice).
    expect([...g.values].map((v) => Number(v.toFixed(5)))).toEqual([3, 1, 2]);
    expect(g.periodicLon).toBe(true);
    expect(ledger.entries[0].detail).toBe('converted nM to nmol/kg with a fixed seawater density of 1025 kg/m³');
  });

  it('cfGrid(unknown units, missing units, extra dimension) says what was expected', () => {
    const base = [coordinate('lat', [0, 1], latAttrs), coordinate('lon', [0, 1], lonAttrs)];
    const bad = memoryDataset([...base, memoryVariable('v', [['lat', 2], ['lon', 2]], new Float32Array(4), { units: 'ppm' })]);
    expect(() => cfGrid(bad, { quantity: 'nitrate', variable: 'v' })).toThrow(
      'memory.nc: variable v attribute units: unknown unit "ppm"; expected an amount per kg, per litre or per cubic metre convertible to µmol/kg',
    );
    const none = memoryDataset([...base, memoryVariable('v', [['lat', 2], ['lon', 2]], new Float32Array(4))]);
    expect(() => cfGrid(none, { quantity: 'nitrate', variable: 'v' })).toThrow('memory.nc: variable v has no units attribute; give the units in the config');
    expect(cfGrid(none, { quantity: 'nitrate', variable: 'v', units: 'umol/kg' }).units).toBe('µmol/kg');
    const extra = memoryDataset([...base, memoryVariable('v', [['ens', 3], ['lat', 2], ['lon', 2]], new Float32Array(12), { units: 'umol/kg' })]);
    expect(() => cfGrid(extra, { quantity: 'nitrate', variable: 'v' })).toThrow(
      'memory.nc: variable v has an unsupported layout: dimension ens (length 3) is not a longitude, latitude, vertical or time axis',
    );
  });

  // Speed is measured by `npm run bench`, not by timed unit tests.
  it('cfGrid(a 1°×1°×33 depths×12 months field) unpacks, rotates and flips every value into one Float32Array', () => {
    const nx = 360;
    const ny = 180;
    const nz = 33;
    const nt = 12;
    const lon = Array.from({ length: nx }, (_, i) => i + 0.5);
    const lat = Array.from({ length: ny }, (_, i) => 89.5 - i);
    const depth = Array.from({ length: nz }, (_, i) => i * 150);
    const data = new Int16Array(nx * ny * nz * nt);
    for (let i = 0; i < data.length; i++) data[i] = i % 30000;
    const ds = memoryDataset([
      coordinate('time', [15, 45, 75, 106, 136, 167, 197, 228, 259, 289, 320, 350], { units: 'days since 2000-01-01', climatology: 'climatology_bounds' }),
      coordinate('depth', depth, { units: 'm', positive: 'down' }),
      coordinate('lat', lat, latAttrs),
      coordinate('lon', lon, lonAttrs),
      memoryVariable('v', [['time', nt], ['depth', nz], ['lat', ny], ['lon', nx]], data, { units: 'nmol/kg', scale_factor: [0.001], _FillValue: [-1] }),
    ]);
    const g = cfGrid(ds, { quantity: 'dissolved_fe', variable: 'v' });
    expect(g.values).toBeInstanceOf(Float32Array);
    expect(g.values.length).toBe(nx * ny * nz * nt);
    // lon 180.5 → −179.5 becomes x = 0; lat 89.5 (input row 0) becomes y = 179.
    const input = (((5 * nz + 7) * ny + 0) * nx + 180) % 30000;
    expect(g.values[((5 * nz + 7) * ny + 179) * nx + 0]).toBe(Math.fround(input * 0.001));
  });
});
