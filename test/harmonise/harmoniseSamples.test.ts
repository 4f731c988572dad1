import { describe, expect, it } from 'vitest';
import type * as aq from 'arquero';
import { Ledger } from '../../lib/ledger/index.js';
import { harmoniseSamples } from '../../lib/harmonise/harmoniseSamples.js';
import type { SampleHarmoniseOptions } from '../../lib/harmonise/options.js';
import { sampleTable } from '../fixtures/harmonise/tables.js';

const FILE = 'data/bottles.csv';

/** Every quantity in its canonical unit unless a test says otherwise (the stage never assumes a unit). */
const CANONICAL_UNITS = { dissolved_fe: 'nmol/kg', nitrate: 'µmol/kg', phosphate: 'µmol/kg', silicate: 'µmol/kg' };

function run(table: aq.ColumnTable, options: Partial<SampleHarmoniseOptions> = {}) {
  const ledger = new Ledger();
  const result = harmoniseSamples(table, { file: FILE, ...options, units: { ...CANONICAL_UNITS, ...options.units } }, ledger);
  // Ledger invariant (DESIGN.md): rows in = rows out + excluded rows, one 'excluded' entry each.
  expect(result.table.numRows() + ledger.excluded('samples', FILE).length).toBe(table.numRows());
  expect(result.summary.rowsIn).toBe(result.summary.rowsOut + result.summary.excluded);
  const lines = ledger.excluded('samples', FILE).map((e) => e.line);
  expect(new Set(lines).size).toBe(lines.length);
  return { ...result, ledger, entries: ledger.entries };
}

const col = (t: aq.ColumnTable, c: string) => Array.from(t.array(c) as ArrayLike<unknown>);

describe('harmoniseSamples(table, options, ledger): units and density', () => {
  it('converts a per-litre dFe with the EOS-80 density of its own T, S, p (surface, S 35, T68 5 °C)', () => {
    // ρ(35, 5, 0) = 1027.67547 kg m⁻³, Fofonoff & Millard (1983) check value; T90 = 5/1.00024 so that T68 = 5 (Saunders 1990).
    // Hand computation: 1 nmol/L × 1000 L/m³ / 1027.67547 kg/m³ = 0.973068… nmol/kg.
    const t = sampleTable([{ dissolved_fe: 1, temperature: 5 / 1.00024, salinity: 35, depth: NaN, pressure: 0 }]);
    const { table, summary, entries } = run(t, { units: { dissolved_fe: 'nmol/L' } });
    expect(col(table, 'dissolved_fe')[0] as number).toBeCloseTo(1000 / 1027.67547, 7);
    expect(summary.conversions).toContainEqual({ column: 'dissolved_fe', from: 'nmol/L', to: 'nmol/kg', method: 'eos80-density', rows: 1 });
    expect(entries.filter((e) => e.reason === 'default-density')).toEqual([]);
  });

  it('uses in-situ pressure: 10000 dbar, S 35, T68 25 °C gives ρ = 1062.53817', () => {
    // Fofonoff & Millard (1983) check value; µM = µmol/L, so 30 µM → 30 × 1000 / 1062.53817 µmol/kg.
    const t = sampleTable([{ nitrate: 30, temperature: 25 / 1.00024, salinity: 35, depth: NaN, pressure: 10000, lat: 30 }]);
    const { table } = run(t, { units: { nitrate: 'µM' } });
    expect(col(table, 'nitrate')[0] as number).toBeCloseTo((30 * 1000) / 1062.53817, 6);
    // Depth from pressure: 10000 dbar at 30° → 9712.653 m (Fofonoff & Millard 1983).
    expect(col(table, 'depth')[0] as number).toBeCloseTo(9712.653, 3);
  });

  it('falls back to the default density 1025 when temperature is missing, and says so', () => {
    const t = sampleTable([{ dissolved_fe: 2, temperature: NaN }]);
    const { table, summary, entries } = run(t, { units: { dissolved_fe: 'nM' } });
    expect(col(table, 'dissolved_fe')[0] as number).toBeCloseTo(2000 / 1025, 12);
    expect(entries).toEqual([
      {
        table: 'samples',
        file: FILE,
        line: 2,
        stage: 'harmonise',
        action: 'converted',
        reason: 'default-density',
        detail: 'dissolved_fe converted per volume → per mass with default density 1025 kg/m3 (temperature missing)',
      },
    ]);
    expect(summary.conversions).toContainEqual({ column: 'dissolved_fe', from: 'nM', to: 'nmol/kg', method: 'default-density', rows: 1 });
  });

  it('converts pmol/kg by a plain factor and the detection limit with it', () => {
    const t = sampleTable([{ dissolved_fe: 250, dissolved_fe_dl: 40 }]);
    const { table, summary } = run(t, { units: { dissolved_fe: 'pmol/kg' } });
    expect(col(table, 'dissolved_fe')[0]).toBeCloseTo(0.25, 12);
    expect(col(table, 'dissolved_fe_dl')[0]).toBeCloseTo(0.04, 12);
    expect(summary.conversions.find((c) => c.column === 'dissolved_fe')).toEqual({ column: 'dissolved_fe', from: 'pmol/kg', to: 'nmol/kg', method: 'factor', rows: 1 });
  });

  it('throws naming the file and column for an unknown unit and for a unit of the wrong dimension', () => {
    const t = sampleTable([{ dissolved_fe: 1 }]);
    expect(() => run(t, { units: { dissolved_fe: 'nmol/kgg' } })).toThrow('data/bottles.csv: unknown unit "nmol/kgg" for column dissolved_fe');
    expect(() => run(t, { units: { dissolved_fe: 'm' } })).toThrow(
      'data/bottles.csv: unit "m" has the wrong dimension for dissolved_fe (expected amount per mass or per volume)',
    );
  });

  it('throws when the loader gave no source_line', () => {
    const t = sampleTable([{ dissolved_fe: 1 }]).select('cruise', 'lat', 'lon');
    expect(() => harmoniseSamples(t, { file: FILE }, new Ledger())).toThrow(
      'data/bottles.csv: column source_line is missing from the loaded table (expected from the loader)',
    );
  });
});

describe('harmoniseSamples: flags and detection limits', () => {
  it('maps IOC flags to <q>_quality and drops bad values with a ledger row', () => {
    const t = sampleTable([
      { nitrate: 10, nitrate_flag: '1' },
      { nitrate: 11, nitrate_flag: '3' },
      { nitrate: 12, nitrate_flag: '4' },
    ]);
    const { table, entries } = run(t, { flags: 'ioc' });
    expect(col(table, 'nitrate_quality')).toEqual(['good', 'questionable', 'bad']);
    expect(col(table, 'nitrate')).toEqual([10, 11, NaN]);
    expect(entries).toEqual([
      { table: 'samples', file: FILE, line: 4, stage: 'harmonise', action: 'flagged', reason: 'flag-not-accepted', detail: 'nitrate has quality bad, which is not accepted; the value is not used' },
    ]);
  });

  it('ledgers an unknown flag and a missing flag, never guessing', () => {
    const t = sampleTable([
      { nitrate: 10, nitrate_flag: 'Z' },
      { nitrate: 11, nitrate_flag: null },
    ]);
    const { table, entries } = run(t, { flags: 'woce' });
    expect(col(table, 'nitrate_quality')).toEqual([null, 'questionable']);
    expect(col(table, 'nitrate')).toEqual([NaN, 11]);
    expect(entries.map((e) => [e.line, e.action, e.reason, e.detail])).toEqual([
      [2, 'flagged', 'unknown-flag', 'nitrate_flag = "Z" is not a flag of the woce scheme; the value is not used'],
      [3, 'flagged', 'missing-flag', 'nitrate_flag is empty while the value is present; the value is marked questionable'],
    ]);
  });

  it('accept: ["good"] drops questionable values', () => {
    const t = sampleTable([{ nitrate: 11, nitrate_flag: '3' }]);
    const { table, entries } = run(t, { flags: 'woce', accept: ['good'] });
    expect(col(table, 'nitrate')).toEqual([NaN]);
    expect(entries[0].detail).toBe('nitrate has quality questionable, which is not accepted; the value is not used');
  });

  it('substitutes DL/2 by default from the row limit, the reported value (IOC 6) or the default limit', () => {
    const t = sampleTable([
      { dissolved_fe: NaN, dissolved_fe_below_dl: true, dissolved_fe_dl: 0.05 },
      { dissolved_fe: 0.08, dissolved_fe_flag: '6' },
      { dissolved_fe: NaN, dissolved_fe_below_dl: true },
    ]);
    const { table, summary, entries } = run(t, { flags: 'ioc', defaultDetectionLimits: { dissolved_fe: 0.02 } });
    expect(col(table, 'dissolved_fe')).toEqual([0.025, 0.04, 0.01]);
    expect(col(table, 'dissolved_fe_quality')).toEqual(['below_detection', 'below_detection', 'below_detection']);
    expect(summary.belowDetectionSubstituted).toBe(3);
    expect(entries.map((e) => [e.action, e.reason, e.detail])).toEqual([
      ['converted', 'below-detection-substituted', 'dissolved_fe below detection limit 0.05: set to 0.025 (policy half)'],
      ['converted', 'below-detection-substituted', 'dissolved_fe below detection limit 0.08: set to 0.04 (policy half)'],
      ['converted', 'below-detection-substituted', 'dissolved_fe below detection limit 0.02: set to 0.01 (policy half)'],
    ]);
  });

  it('detectionLimitPolicy "limit" uses DL and "exclude" drops the value', () => {
    const t = sampleTable([{ dissolved_fe: NaN, dissolved_fe_below_dl: true, dissolved_fe_dl: 0.05 }]);
    expect(col(run(t, { detectionLimitPolicy: 'limit' }).table, 'dissolved_fe')).toEqual([0.05]);
    const excluded = run(t, { detectionLimitPolicy: 'exclude' });
    expect(col(excluded.table, 'dissolved_fe')).toEqual([NaN]);
    expect(excluded.entries.map((e) => [e.action, e.reason, e.detail])).toEqual([
      ['flagged', 'below-detection-excluded', 'dissolved_fe below detection limit: not used (policy exclude)'],
    ]);
  });

  it('ledgers a below-detection value with no known limit', () => {
    const t = sampleTable([{ phosphate: NaN, phosphate_below_dl: true }]);
    const { table, entries } = run(t);
    expect(col(table, 'phosphate')).toEqual([NaN]);
    expect(entries.map((e) => [e.reason, e.detail])).toEqual([
      ['below-detection-no-limit', 'phosphate below detection limit but no limit is known (no phosphate_dl, no value, no default): not used'],
    ]);
  });
});

describe('harmoniseSamples: fill values, positions, depth, duplicates, land', () => {
  it('reads fill values as missing with one ledger row per input row', () => {
    const t = sampleTable([{ dissolved_fe: -999, nitrate: 9.96921e36, silicate: 4 }]);
    const { table, entries } = run(t);
    expect(col(table, 'dissolved_fe')).toEqual([NaN]);
    expect(col(table, 'nitrate')).toEqual([NaN]);
    expect(col(table, 'silicate')).toEqual([4]);
    expect(entries.map((e) => [e.action, e.reason, e.detail])).toEqual([
      ['converted', 'fill-value', 'fill value read as missing: dissolved_fe = -999, nitrate = 9.96921e+36'],
    ]);
  });

  it('honours configured fill values instead of the defaults', () => {
    const t = sampleTable([{ nitrate: -999 }, { nitrate: -1 }]);
    expect(col(run(t, { fillValues: [-1] }).table, 'nitrate')).toEqual([-999, NaN]);
  });

  it('excludes positions out of range and normalises longitudes to [-180, 180)', () => {
    const t = sampleTable([{ lat: 91 }, { lon: 361 }, { lon: 180 }, { lon: 200 }, { lon: -190 }, { lon: 359.5 }]);
    const { table, entries } = run(t, { landCheck: false });
    expect(col(table, 'lon')).toEqual([-180, -160, 170, -0.5]);
    expect(entries.map((e) => [e.line, e.action, e.reason, e.detail])).toEqual([
      [2, 'excluded', 'position-out-of-range', 'position out of range: lat 91 (expected −90 to 90), lon 150 (expected −360 to 360)'],
      [3, 'excluded', 'position-out-of-range', 'position out of range: lat -50 (expected −90 to 90), lon 361 (expected −360 to 360)'],
    ]);
  });

  it('flags a missing position but keeps the row', () => {
    const { table, entries } = run(sampleTable([{ lat: NaN }]));
    expect(table.numRows()).toBe(1);
    expect(entries.map((e) => [e.action, e.reason, e.detail])).toEqual([
      ['flagged', 'position-missing', 'position missing (lat NaN, lon 150); the row is kept but cannot be mapped or checked against land'],
    ]);
  });

  it('excludes negative depths, also when computed from a negative pressure', () => {
    const t = sampleTable([{ depth: -3 }, { depth: NaN, pressure: -5 }, { depth: 0 }]);
    const { table, entries } = run(t);
    expect(table.numRows()).toBe(1);
    expect(entries.map((e) => [e.line, e.reason])).toEqual([
      [2, 'negative-depth'],
      [3, 'negative-depth'],
    ]);
    expect(entries[0].detail).toBe('negative depth -3 m (depth is positive down)');
  });

  it('flags depth and pressure that disagree beyond the tolerance, keeping the given depth', () => {
    // 1000 dbar at 50°S is about 990 m (Saunders & Fofonoff via UNESCO 1983).
    const t = sampleTable([{ depth: 990, pressure: 1000 }, { depth: 500, pressure: 1000 }]);
    const { table, entries } = run(t);
    expect(col(table, 'depth')).toEqual([990, 500]);
    expect(entries.map((e) => [e.line, e.action, e.reason])).toEqual([[3, 'flagged', 'depth-pressure-mismatch']]);
    expect(entries[0].detail).toMatch(/^depth 500 m differs from 98\d\.\d+ m computed from pressure 1000 dbar by more than 10 m; the given depth is kept$/);
  });

  it('excludes the later of two identical cruise/station/cast/bottle rows, naming both lines', () => {
    const t = sampleTable([{ bottle: '4' }, { bottle: '5' }, { bottle: '4' }, { bottle: null }, { bottle: null }]);
    const { table, entries } = run(t);
    expect(table.numRows()).toBe(4);
    expect(entries.map((e) => [e.line, e.action, e.reason, e.detail])).toEqual([
      [4, 'excluded', 'duplicate-bottle', 'duplicate bottle KX01/1/1/4 on line 4 (first on line 2); the later row is excluded'],
    ]);
  });

  it('excludes a position on land, hinting when lat and lon look swapped', () => {
    // 30°S 20°E is inland South Africa; swapped, 20°N 30°W is the open Atlantic (common knowledge).
    // 25°S 134°E is central Australia; swapped it is not a valid latitude, so no hint.
    const t = sampleTable([{ lat: -30, lon: 20 }, { lat: -25, lon: 134 }, { lat: 0, lon: -160 }]);
    const { table, entries } = run(t);
    expect(table.numRows()).toBe(1);
    expect(entries.map((e) => [e.line, e.reason, e.detail])).toEqual([
      [2, 'position-on-land', 'position lat -30, lon 20 is on land; swapping latitude and longitude would put it at sea (columns swapped?)'],
      [3, 'position-on-land', 'position lat -25, lon 134 is on land'],
    ]);
    expect(run(t, { landCheck: false }).table.numRows()).toBe(3);
  });

  it('gives each excluded row exactly one exclusion even when several reasons apply', () => {
    const t = sampleTable([{ lat: 95, depth: -1, bottle: '1' }, { lat: 95, depth: -1, bottle: '1' }]);
    const { entries } = run(t);
    expect(entries.filter((e) => e.action === 'excluded').map((e) => e.reason)).toEqual(['position-out-of-range', 'position-out-of-range']);
  });
});

describe('harmoniseSamples: purity', () => {
  it('does not mutate its input and gives the same output twice', () => {
    const t = sampleTable([{ dissolved_fe: 1, lon: 200, nitrate: -999 }, { dissolved_fe: NaN, dissolved_fe_below_dl: true, dissolved_fe_dl: 0.1 }]);
    const before = JSON.stringify(t.objects());
    const a = run(t, { units: { dissolved_fe: 'nmol/L' } });
    const b = run(t, { units: { dissolved_fe: 'nmol/L' } });
    expect(JSON.stringify(t.objects())).toBe(before);
    expect(JSON.stringify(a.table.objects())).toBe(JSON.stringify(b.table.objects()));
    expect(a.entries).toEqual(b.entries);
    expect(a.summary).toEqual(b.summary);
  });

  it('adds a <q>_quality column for every sample quantity and keeps the input columns first', () => {
    const t = sampleTable([{ nitrate: 1 }]);
    const names = run(t).table.columnNames();
    expect(names.slice(0, t.columnNames().length)).toEqual(t.columnNames());
    expect(names.slice(t.columnNames().length)).toEqual(['dissolved_fe_quality', 'nitrate_quality', 'phosphate_quality', 'silicate_quality']);
  });
});

describe('harmoniseSamples: accepted qualities and per-litre limits', () => {
  it('accept without below_detection drops below-detection values with a ledger row', () => {
    const t = sampleTable([{ dissolved_fe: NaN, dissolved_fe_below_dl: true, dissolved_fe_dl: 0.05 }]);
    const { table, entries } = run(t, { accept: ['good', 'questionable'] });
    expect(col(table, 'dissolved_fe')).toEqual([NaN]);
    expect(entries.map((e) => [e.reason, e.detail])).toEqual([
      ['below-detection-excluded', 'dissolved_fe below detection limit: not used (below_detection is not an accepted quality)'],
    ]);
  });

  it('converts a per-litre detection limit with the same density before halving it', () => {
    // ρ(35, 5, 0) = 1027.67547 kg m⁻³ (Fofonoff & Millard 1983); DL 0.1 nmol/L → 100/1027.67547 nmol/kg, halved.
    const t = sampleTable([{ dissolved_fe: NaN, dissolved_fe_below_dl: true, dissolved_fe_dl: 0.1, temperature: 5 / 1.00024, salinity: 35, depth: NaN, pressure: 0 }]);
    const { table } = run(t, { units: { dissolved_fe: 'nmol/L' } });
    expect(col(table, 'dissolved_fe_dl')[0] as number).toBeCloseTo(100 / 1027.67547, 8);
    expect(col(table, 'dissolved_fe')[0] as number).toBeCloseTo(50 / 1027.67547, 8);
  });
});

describe('harmoniseSamples: temperature scale', () => {
  it('temperatureScale "ipts68" feeds the temperature to EOS-80 unchanged', () => {
    // ρ(35, 25, 0) = 1023.34306 kg m⁻³ with T68 = 25 (Fofonoff & Millard 1983 check value).
    const t = sampleTable([{ dissolved_fe: 1, temperature: 25, salinity: 35, depth: NaN, pressure: 0 }]);
    expect(col(run(t, { units: { dissolved_fe: 'nmol/L' }, temperatureScale: 'ipts68' }).table, 'dissolved_fe')[0] as number).toBeCloseTo(1000 / 1023.34306, 8);
    // Read as ITS-90, 25 °C is T68 = 25.006, a slightly lighter water: the result differs.
    expect(col(run(t, { units: { dissolved_fe: 'nmol/L' } }).table, 'dissolved_fe')[0] as number).not.toBeCloseTo(1000 / 1023.34306, 8);
  });
});

describe('harmoniseSamples(table, options, ledger): stated units', () => {
  it('refuses a concentration column with values but no unit in the config, naming file and column', () => {
    const t = sampleTable([{ dissolved_fe: 0.4 }]);
    expect(() => harmoniseSamples(t, { file: FILE, units: { nitrate: 'µmol/kg', phosphate: 'µmol/kg', silicate: 'µmol/kg' } }, new Ledger())).toThrow(
      'data/bottles.csv: no unit given for column dissolved_fe; add it to the file\'s units in the config (e.g. dissolved_fe: nmol/kg) — units are never assumed',
    );
  });
});
