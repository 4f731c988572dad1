// Property tests: random valid tables with injected faults never throw from readTable, and rows read = rows kept + rows excluded.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { readTable } from '../../lib/load/index.js';
import { cellsTable, samplesTable, type GeneratedTable } from './arbitraries.js';

const SEED = 20240317;

function check(table: 'samples' | 'cells', name: string, g: GeneratedTable): void {
  const ledger = new Ledger();
  const result = readTable({ name, text: g.text }, { table, columns: {} }, ledger);
  expect(result.problems.filter((p) => p.severity === 'error')).toEqual([]);
  expect(result.rowsRead).toBe(g.rows);
  const excluded = new Set(ledger.excluded(table, name).map((e) => e.line)).size;
  expect(result.table.numRows() + excluded).toBe(result.rowsRead);
  expect(excluded).toBe(g.faults.filter((f) => f !== 'none').length);
}

describe('readTable(random CSV with faults)', () => {
  it('readTable(samples) never throws and keeps rows read = rows kept + rows excluded', () => {
    fc.assert(fc.property(samplesTable, (g) => check('samples', 'samples.csv', g)), { seed: SEED, numRuns: 50 });
  });

  it('readTable(cells) never throws and keeps rows read = rows kept + rows excluded', () => {
    fc.assert(fc.property(cellsTable, (g) => check('cells', 'cells.csv', g)), { seed: SEED, numRuns: 50 });
  });
});
