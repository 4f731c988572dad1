import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { readTable, type ReadTableOptions } from '../../lib/load/index.js';

const SAMPLES: ReadTableOptions = { table: 'samples', columns: { dissolved_fe: 'dFe' } };
const read = (text: string, options: ReadTableOptions = SAMPLES, name = 'bottles.csv') => {
  const ledger = new Ledger();
  const result = readTable({ name, text }, options, ledger);
  return { ...result, ledger };
};
const HEADER = 'cruise,station,lat,lon,depth,time,dFe';

describe('readTable', () => {
  it('readTable(csv with BOM and CRLF) reads canonical typed columns and physical lines', () => {
    const { table, rowsRead, ledger } = read(`\uFEFF${HEADER}\r\nX1,1,10.5,-30,5,2021-03-01,0.21\r\nX1,1,10.5,-30,50,2021-03-01T06:30:00Z,0.3\r\n`);
    expect(rowsRead).toBe(2);
    expect(ledger.entries).toEqual([]);
    expect(table.columnNames()).toContain('cruise');
    expect(table.array('dissolved_fe')).toEqual([0.21, 0.3]);
    expect(table.array('lat')).toEqual([10.5, 10.5]);
    expect(table.array('time')).toEqual([Date.UTC(2021, 2, 1), Date.UTC(2021, 2, 1, 6, 30)]);
    expect(table.array('source_line')).toEqual([2, 3]);
    expect(table.array('source_file')).toEqual(['bottles.csv', 'bottles.csv']);
  });

  it('readTable(quoted delimiter and newline) keeps the field whole and counts the record from its first line', () => {
    const { table } = read(`${HEADER}\n"X1","st, 1\nnorth",10,-30,5,2021-03-01,0.2\nX1,2,10,-30,5,2021-03-01,0.2\n`);
    expect(table.array('station')).toEqual(['st, 1\nnorth', '2']);
    expect(table.array('source_line')).toEqual([2, 4]);
  });

  it('readTable(blank lines and mixed line endings) skips blanks but keeps physical line numbers', () => {
    const { table } = read(`${HEADER}\r\n\r\nX1,1,10,-30,5,2021-03-01,0.2\n\nX1,2,10,-30,5,2021-03-01,0.2\rX1,3,10,-30,5,,0.2\n`);
    expect(table.array('source_line')).toEqual([3, 5, 6]);
    expect(Number.isNaN(table.get('time', 2))).toBe(true);
  });

  it('readTable(ragged rows) ledgers too many and too few fields without crashing', () => {
    const { table, ledger, rowsRead } = read(`${HEADER}\nX1,1,10,-30,5,2021-03-01,0.2,extra\nX1,2,10,-30\nX1,3,10,-30,5,2021-03-01,0.2\n`);
    expect(rowsRead).toBe(3);
    expect(table.numRows()).toBe(1);
    expect(ledger.entries.map((e) => [e.line, e.reason, e.detail])).toEqual([
      [2, 'ragged-row', 'expected 7 fields as in the header, found 8'],
      [3, 'ragged-row', 'expected 7 fields as in the header, found 4'],
    ]);
  });

  it('readTable(text in a numeric column) ledgers the row naming the column', () => {
    const { ledger } = read(`${HEADER}\nX1,1,10,-30,5,2021-03-01,high\nX1,1,10,-30,5,2021-03-01,"0,25"\nX1,1,10,-30,5,2021-03-01,"1,250.5"\n`);
    expect(ledger.entries.map((e) => `${e.file}:${e.line} ${e.reason} ${e.detail}`)).toEqual([
      'bottles.csv:2 not-a-number column "dFe" (dissolved_fe): "high" is not a number',
      'bottles.csv:3 not-a-number column "dFe" (dissolved_fe): "0,25" is not a number (use a decimal point, not a decimal comma)',
      'bottles.csv:4 not-a-number column "dFe" (dissolved_fe): "1,250.5" is not a number (thousands separators are not accepted)',
    ]);
  });

  it('readTable(below-detection markers) sets the value missing, marks it and keeps the written limit', () => {
    const { table, ledger } = read(`${HEADER}\nX1,1,10,-30,5,2021-03-01,<0.02\nX1,1,10,-30,10,2021-03-01,bdl\nX1,1,10,-30,15,2021-03-01,nd\n`);
    expect(ledger.entries).toEqual([]);
    expect(table.array('dissolved_fe_below_dl')).toEqual([true, true, true]);
    expect(table.get('dissolved_fe_dl', 0)).toBe(0.02);
    expect(Number.isNaN(table.get('dissolved_fe_dl', 1))).toBe(true);
    expect(Number.isNaN(table.get('dissolved_fe', 0))).toBe(true);
  });

  it('readTable(impossible date) ledgers it; a zone-less date-time is flagged and read as UTC', () => {
    const { table, ledger } = read(`${HEADER}\nX1,1,10,-30,5,2021-02-30,0.2\nX1,1,10,-30,5,2021-03-01T12:00,0.2\n`);
    expect(ledger.entries.map((e) => [e.line, e.action, e.reason])).toEqual([
      [2, 'excluded', 'bad-time'],
      [3, 'flagged', 'time-without-zone'],
    ]);
    expect(table.array('time')).toEqual([Date.UTC(2021, 2, 1, 12)]);
  });

  it('readTable(tsv) reads tab-separated files by extension', () => {
    const { table } = read(`${HEADER.replaceAll(',', '\t')}\nX1\t1\t10\t-30\t5\t2021-03-01\t0.2\n`, SAMPLES, 'bottles.tsv');
    expect(table.numRows()).toBe(1);
  });

  it('readTable(missing required column) is a file-level error listing the header', () => {
    const { problems } = read('cruise,station,lat,depth\nX1,1,10,5\n', { table: 'samples', columns: {} });
    expect(problems).toEqual([{ file: 'bottles.csv', line: 1, col: 1, severity: 'error', message: 'missing required column "lon"; the header has: cruise, station, lat, depth' }]);
  });

  it('readTable(semicolon file read as CSV) hints at the delimiter', () => {
    const { problems } = read('cruise;station;lat;lon;depth\nX1;1;10;-30;5\n');
    expect(problems[0].message).toBe('the header has a single column but contains semicolons: expected fields separated by commas (set "delimiter" in the config)');
  });

  it('readTable(duplicate header) names both columns', () => {
    const { problems } = read('cruise,station,lat,lon,depth,lat\nX1,1,10,-30,5,10\n');
    expect(problems[0]).toMatchObject({ line: 1, col: 6, message: 'duplicate column header "lat" (first at column 3)' });
  });

  it('readTable(empty file and header only) give an error and a warning', () => {
    expect(read('').problems[0].message).toBe('file is empty; expected a header line naming the columns');
    expect(read(`${HEADER}\n`).problems[0]).toMatchObject({ severity: 'warning', message: 'file has a header but no data rows' });
  });

  it('readTable(file-level cruise) fills the cruise column', () => {
    const { table } = read('cell_id,station,depth,phyto_class,fe\nc1,1,5,diatom,1e-18\n', { table: 'cells', columns: {}, cruise: 'X9' }, 'cells.csv');
    expect(table.array('cruise')).toEqual(['X9']);
    expect(table.array('fe')).toEqual([1e-18]);
  });

  it('readTable keeps the ledger invariant: rows read = rows kept + rows excluded', () => {
    const { table, ledger, rowsRead } = read(`${HEADER}\nX1,1,10,-30,5,2021-03-01,0.2,x\nX1,1,10,-30,5,2021-13-01,0.2\nX1,1,10,-30,5,2021-03-01,abc\nX1,1,10,-30,5,2021-03-01,0.2\n`);
    expect(rowsRead).toBe(table.numRows() + ledger.excluded('samples', 'bottles.csv').length);
  });
});
