import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generateDemo, hasNcgen } from '../../data/generate-demo.js';
import { parseConfig } from '../../lib/config/index.js';
import { landMask } from '../../lib/geo/index.js';
import { readCsvGrid, readNetcdfGrid } from '../../lib/grids/index.js';
import { harmoniseSamples } from '../../lib/harmonise/index.js';
import { Ledger } from '../../lib/ledger/index.js';
import { readTable } from '../../lib/load/index.js';
import { validateUnit } from '../../lib/units/index.js';
import { truthField } from '../../data/demo-gen/truth-fields.js';

const committed = fileURLToPath(new URL('../../data/demo/', import.meta.url));
const ncgen = hasNcgen();
let out = '';
let written: string[] = [];

interface Truth {
  faults: { file: string; line: number; lines?: number[]; kind: string; expected_reason: string; expected_action: string }[];
  counts: { cruises: Record<string, { stations: number; stations_at_sea: number; sample_file: string; sample_rows: number; sample_rows_excluded: number; cell_file: string; cell_rows: number; cells_excluded: number; cells_by_class: Record<string, number>; held_back: boolean }> };
  cruises: { id: string; held_back: boolean; stations: { station: string; lat: number; lon: number }[] }[];
  low_iron_region: { lat_min: number; lat_max: number; lon_min: number; lon_max: number; stations: string[] };
  crossover: { pairs: { a: string; b: string; distance_km: number }[] };
}

const truth = (): Truth => JSON.parse(readFileSync(join(committed, 'truth.json'), 'utf8')) as Truth;
const text = (path: string) => readFileSync(join(committed, path), 'utf8');
const dataLines = (path: string) => text(path).split('\n').slice(1).filter((l) => l !== '');

function listFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    return statSync(full).isDirectory() ? listFiles(full) : [full];
  });
}

beforeAll(() => {
  out = mkdtempSync(join(tmpdir(), 'basinquota-demo-'));
  written = generateDemo(out);
});

afterAll(() => {
  if (out) rmSync(out, { recursive: true, force: true });
});

describe('generateDemo(dir)', () => {
  it('generateDemo(dir) reproduces every committed text file byte for byte', () => {
    const texts = written.filter((p) => !p.endsWith('.nc'));
    expect(texts.length).toBeGreaterThan(15);
    for (const path of texts) expect(readFileSync(join(out, path), 'utf8'), path).toBe(text(path));
    // Nothing committed under data/demo is left over from an earlier generator, except the hand-written README.
    const generated = new Set(listFiles(out).map((f) => relative(out, f)));
    for (const f of listFiles(committed).map((f) => relative(committed, f))) if (f !== 'README.md') expect(generated.has(f), f).toBe(true);
  });

  it.skipIf(!ncgen)('generateDemo(dir) reproduces the committed .nc files byte for byte (needs ncgen from netcdf-bin)', () => {
    const ncs = written.filter((p) => p.endsWith('.nc'));
    expect(ncs).toHaveLength(3);
    for (const path of ncs) expect(Buffer.compare(readFileSync(join(out, path)), readFileSync(join(committed, path))), path).toBe(0);
  });
  if (!ncgen) console.warn('ncgen not found: .nc files not compared (apt-get install netcdf-bin)');
});

describe('demo configs', () => {
  for (const name of ['basinquota.yaml', 'basinquota.v1.yaml']) {
    it(`parseConfig(${name}) accepts the demo project with its units`, () => {
      const parsed = parseConfig(name, text(name), { validateUnit: (q, u) => validateUnit(q, u) });
      expect(parsed.problems).toEqual([]);
      expect(parsed.config?.fits.bootstrap.n).toBe(500);
      expect(parsed.config?.figures.polar).toEqual(['south-polar']);
    });
  }

  it('basinquota.v1.yaml lists every cruise except the held-back one', () => {
    const v1 = parseConfig('v1', text('basinquota.v1.yaml')).config!;
    const v2 = parseConfig('v2', text('basinquota.yaml')).config!;
    const held = truth().cruises.filter((c) => c.held_back).map((c) => c.id);
    expect(held).toHaveLength(1);
    expect(v2.inputs.samples.length - v1.inputs.samples.length).toBe(1);
    expect(v1.inputs.samples.some((s) => s.path.includes(held[0]))).toBe(false);
    expect(v1.inputs.cells.some((s) => s.path.includes(held[0]))).toBe(false);
  });
});

describe('truth.json', () => {
  it('truth counts match the rows of the bottle, cell and truth-cell files', () => {
    const t = truth();
    const cellTruth = dataLines('truth-cells.csv').map((l) => l.split(','));
    for (const [cruise, c] of Object.entries(t.counts.cruises)) {
      expect(dataLines(c.sample_file), c.sample_file).toHaveLength(c.sample_rows);
      expect(dataLines(c.cell_file), c.cell_file).toHaveLength(c.cell_rows);
      const mine = cellTruth.filter((r) => r[1] === cruise);
      expect(mine).toHaveLength(c.cell_rows);
      const byClass: Record<string, number> = {};
      for (const r of mine) if (r[10] === '') byClass[r[4]] = (byClass[r[4]] ?? 0) + 1;
      expect(byClass).toEqual(c.cells_by_class);
      expect(mine.filter((r) => r[10] !== '')).toHaveLength(c.cells_excluded);
      const stations = new Set(dataLines(c.sample_file).map((l) => l.split(/[,\t]/)[1]));
      expect(stations.size).toBe(c.stations);
    }
  });

  it('every intended station is at sea, farther than 150 km from a coast (Natural Earth 50m)', () => {
    const land = landMask({ resolution: '50m' });
    for (const cruise of truth().cruises) {
      for (const s of cruise.stations) {
        expect(land.insideLand(s.lon, s.lat), s.station).toBe(false);
        expect(land.distanceToCoastKm(s.lon, s.lat, 150), s.station).toBe(Infinity);
      }
    }
  });

  it('the swapped-position station is on land as written and at sea as intended', () => {
    const fault = truth().faults.find((f) => f.kind === 'swapped-position')!;
    const row = text(fault.file).split('\n')[fault.line - 1].split(',');
    const land = landMask({ resolution: '50m' });
    const [lat, lon] = [Number(row[5]), Number(row[6])];
    expect(land.isOnLand(lon, lat)).toBe(true);
    expect(land.insideLand(lat, lon)).toBe(false);
  });

  it('the low-iron box and the crossover pairs are as described', () => {
    const t = truth();
    const box = t.low_iron_region;
    const stations = t.cruises.flatMap((c) => c.stations);
    for (const name of box.stations) {
      const s = stations.find((x) => x.station === name)!;
      expect(s.lat > box.lat_min && s.lat < box.lat_max && s.lon > box.lon_min && s.lon < box.lon_max).toBe(true);
    }
    expect(t.crossover.pairs.length).toBeGreaterThanOrEqual(2);
    for (const p of t.crossover.pairs) expect(p.distance_km).toBeLessThan(100);
  });

  it('the loader and the harmonise stage put every bottle fault in the ledger at its recorded line with its reason', () => {
    const t = truth();
    const v2 = parseConfig('v2', text('basinquota.yaml')).config!;
    const ledger = new Ledger();
    for (const input of v2.inputs.samples) {
      const read = readTable({ name: input.path, text: text(input.path) }, { table: 'samples', columns: input.columns }, ledger);
      expect(read.problems.filter((p) => p.severity === 'error')).toEqual([]);
      harmoniseSamples(read.table, { file: input.path, units: input.units, flags: typeof input.flags === 'string' ? input.flags : input.flags.map, accept: ['good', 'questionable', 'below_detection'], defaultDetectionLimits: input.detection_limits }, ledger);
    }
    for (const f of t.faults.filter((x) => x.file.startsWith('samples/'))) {
      for (const line of f.lines ?? [f.line]) {
        const hit = ledger.entries.find((e) => e.file === f.file && e.line === line && e.reason === f.expected_reason);
        expect(hit, `${f.file}:${line} ${f.expected_reason}`).toBeDefined();
        expect(hit!.action).toBe(f.expected_action);
      }
    }
    // No excluded sample rows beyond the injected ones.
    const excluded = new Set(ledger.entries.filter((e) => e.action === 'excluded').map((e) => `${e.file}:${e.line}`));
    const expected = Object.values(t.counts.cruises).reduce((n, c) => n + c.sample_rows_excluded, 0);
    expect(excluded.size).toBe(expected);
  });
});

describe('demo grids', () => {
  it.skipIf(!ncgen)('readNetcdfGrid reads the dFe climatology (0–360 longitudes rotated, land as NaN, 12 months)', () => {
    const g = readNetcdfGrid({ name: 'grids/dfe_climatology.nc', bytes: new Uint8Array(readFileSync(join(committed, 'grids/dfe_climatology.nc'))) }, { quantity: 'dissolved_fe', variable: 'dfe' });
    expect(g.lon[0]).toBe(-177.5);
    expect(g.lon).toHaveLength(72);
    expect(g.lat).toHaveLength(36);
    expect([...g.depth]).toEqual([0, 10, 25, 50, 100, 200, 500, 1000, 2000, 4000]);
    expect(g.timeKind).toBe('month');
    const nan = [...g.values].filter(Number.isNaN).length;
    expect(nan / g.values.length).toBeGreaterThan(0.2);
    expect(nan / g.values.length).toBeLessThan(0.45);
    // Node 30° W, 17.5° N, 100 m, May: written in nmol/L ×1.025 and read back with the reader's 1025 kg/m³.
    const [x, y, z, t] = [g.lon.indexOf(-27.5), g.lat.indexOf(17.5), 4, 4];
    const value = g.values[((t * 10 + z) * 36 + y) * 72 + x];
    expect(value).toBeCloseTo(truthField('dissolved_fe', -27.5, 17.5, 100, 5), 3);
  });

  it('readCsvGrid reads the silicate CSV grid', () => {
    const g = readCsvGrid({ name: 'grids/silicate_10deg.csv', text: text('grids/silicate_10deg.csv') }, { quantity: 'silicate', units: 'µmol/kg' });
    expect(g.lon).toHaveLength(36);
    expect(g.lat).toHaveLength(18);
    expect(g.depth).toHaveLength(4);
  });
});
