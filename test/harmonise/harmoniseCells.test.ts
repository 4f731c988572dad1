import { describe, expect, it } from 'vitest';
import type * as aq from 'arquero';
import { Ledger } from '../../lib/ledger/index.js';
import { harmoniseCells } from '../../lib/harmonise/harmoniseCells.js';
import type { CellHarmoniseOptions } from '../../lib/harmonise/options.js';
import { cellTable } from '../fixtures/harmonise/tables.js';
import { ELEMENTS } from '../../lib/load/canonical.js';

const FILE = 'data/cells.csv';

/** Contents and carbon in their canonical unit unless a test says otherwise (the stage never assumes a unit). */
const CANONICAL_UNITS = Object.fromEntries([...ELEMENTS, 'carbon'].map((c) => [c, 'mol/cell']));

function run(table: aq.ColumnTable, options: Partial<CellHarmoniseOptions> = {}) {
  const ledger = new Ledger();
  const result = harmoniseCells(table, { file: FILE, ...options, units: { ...CANONICAL_UNITS, ...options.units } }, ledger);
  // Ledger invariant (DESIGN.md): rows in = rows out + excluded rows.
  expect(result.table.numRows() + ledger.excluded('cells', FILE).length).toBe(table.numRows());
  expect(result.summary.rowsIn).toBe(result.summary.rowsOut + result.summary.excluded);
  return { ...result, entries: ledger.entries };
}

const col = (t: aq.ColumnTable, c: string) => Array.from(t.array(c) as ArrayLike<unknown>);

describe('harmoniseCells(table, options, ledger)', () => {
  it('converts amol/cell contents and their sigmas to mol/cell', () => {
    const t = cellTable([{ cell_id: 'a', fe: 250, fe_sigma: 20, p: 3e6 }]);
    const { table, summary } = run(t, { units: { fe: 'amol/cell', p: 'amol/cell' } });
    expect(col(table, 'fe')[0]).toBeCloseTo(250e-18, 30);
    expect(col(table, 'fe_sigma')[0]).toBeCloseTo(20e-18, 30);
    expect(col(table, 'p')[0]).toBeCloseTo(3e-12, 24);
    expect(summary.conversions).toEqual([
      { column: 'fe', from: 'amol/cell', to: 'mol/cell', method: 'factor', rows: 1 },
      { column: 'fe_sigma', from: 'amol/cell', to: 'mol/cell', method: 'factor', rows: 1 },
      { column: 'p', from: 'amol/cell', to: 'mol/cell', method: 'factor', rows: 1 },
    ]);
  });

  it('converts pg C/cell to mol C/cell with 12.011 g/mol', () => {
    // IUPAC conventional atomic weight of carbon 12.011 (Meija et al. 2016): 24.022 pg C = 2e-12 mol C.
    const t = cellTable([{ cell_id: 'a', carbon: 24.022, carbon_sigma: 1.2011 }]);
    const { table, summary } = run(t, { units: { carbon: 'pg C/cell' } });
    expect(col(table, 'carbon')[0]).toBeCloseTo(2e-12, 24);
    expect(col(table, 'carbon_sigma')[0]).toBeCloseTo(1e-13, 25);
    expect(summary.conversions[0]).toEqual({ column: 'carbon', from: 'pg C/cell', to: 'mol/cell', method: 'molar-mass', rows: 1 });
  });

  it('throws naming both lines when a cell id repeats', () => {
    const t = cellTable([{ cell_id: 'c-1' }, { cell_id: 'c-2' }, { cell_id: 'c-1' }]);
    expect(() => run(t)).toThrow('data/cells.csv:4: duplicate cell id "c-1" (first on line 2); cell ids must be unique within a file');
  });

  it('throws naming the file and column for a content unit of the wrong dimension', () => {
    const t = cellTable([{ cell_id: 'a', fe: 1 }]);
    expect(() => run(t, { units: { fe: 'pg C/cell' } })).toThrow('data/cells.csv: unit "pg C/cell" has the wrong dimension for fe (expected amount per cell)');
  });

  it('excludes out-of-range, negative-depth and on-land cells, reads fill values and leaves a zero content to the quotas stage', () => {
    const t = cellTable([
      { cell_id: 'a', lat: -91 },
      { cell_id: 'b', depth: -2 },
      { cell_id: 'c', lat: -25, lon: 134 },
      { cell_id: 'd', lon: 190, fe: -9999 },
      { cell_id: 'e', fe: 0 },
    ]);
    const { table, entries } = run(t);
    expect(col(table, 'cell_id')).toEqual(['d', 'e']);
    expect(col(table, 'lon')).toEqual([-170, 150]);
    expect(col(table, 'fe')).toEqual([NaN, 0]);
    expect(entries.map((e) => [e.line, e.action, e.reason])).toEqual([
      [5, 'converted', 'fill-value'],
      [2, 'excluded', 'position-out-of-range'],
      [3, 'excluded', 'negative-depth'],
      [4, 'excluded', 'position-on-land'],
    ]);
  });

  it('does not mutate its input and keeps the input column order', () => {
    const t = cellTable([{ cell_id: 'a', fe: 5, lon: 200 }]);
    const before = JSON.stringify(t.objects());
    const { table } = run(t, { units: { fe: 'fmol/cell' } });
    expect(JSON.stringify(t.objects())).toBe(before);
    expect(table.columnNames()).toEqual(t.columnNames());
  });
});

describe('harmoniseCells: detection limits of contents', () => {
  it('converts <el>_dl with the content unit and leaves below-detection contents to the quotas stage', () => {
    const t = cellTable([{ cell_id: 'a', fe: NaN, fe_dl: 30, fe_below_dl: true }]);
    const { table } = run(t, { units: { fe: 'amol/cell' } });
    expect(col(table, 'fe_dl')[0]).toBeCloseTo(30e-18, 30);
    expect(col(table, 'fe')).toEqual([NaN]);
    expect(col(table, 'fe_below_dl')).toEqual([true]);
  });
});
