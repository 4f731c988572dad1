// Property: on quote-free text the line-splitting shortcut and csv-parse give identical tables, counts, problems and ledgers.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { readTable, type ReadTableOptions } from '../../lib/load/index.js';
import { splitQuoteFree } from '../../lib/load/split-quote-free.js';

const SEED = 20261201;
const HEADER = ['cruise', 'station', 'lat', 'lon', 'depth', 'time', 'dissolved_fe', 'nitrate'];
const field = fc.oneof(
  fc.constantFrom('X1', ' S 2 ', '', '0.21', '-30', '.5', '7.', '1e-3', '<0.02', 'bdl', 'NA', 'high', '0,25', '2021-03-01', '2021-03-01T06:30', '2021-02-30', '12345678901234567', '-0'),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
  fc.integer({ min: -1000, max: 1000 }).map(String),
);
const row = fc.array(field, { minLength: 6, maxLength: 9 });
const lineBreak = fc.constantFrom('\n', '\r\n', '\r');
/** A quote-free CSV: header, rows (some ragged), blank lines and a random mix of line breaks. */
const quoteFreeCsv = fc
  .tuple(fc.boolean(), fc.array(fc.tuple(fc.oneof(row, fc.constant([] as string[])), lineBreak), { maxLength: 25 }), lineBreak, fc.boolean())
  .map(([bom, rows, first, trailing]) => {
    const body = rows.map(([fields, br]) => `${fields.join(',')}${br}`).join('');
    const text = `${bom ? '\uFEFF' : ''}${HEADER.join(',')}${first}${body}`;
    return trailing ? text : text.replace(/[\r\n]+$/, '');
  });

const OPTIONS: ReadTableOptions = { table: 'samples', columns: {} };
const readWith = (text: string, splitter: 'auto' | 'csv-parse', options = OPTIONS) => {
  const ledger = new Ledger();
  const result = readTable({ name: 'bottles.csv', text }, options, ledger, splitter);
  return { objects: result.table.objects(), columns: result.table.columnNames(), rowsRead: result.rowsRead, problems: result.problems, ledger: ledger.entries };
};

describe('splitQuoteFree(text) agrees with csv-parse', () => {
  it('readTable(quote-free text) gives the same table, rows read, problems and ledger with the shortcut as with csv-parse', () => {
    fc.assert(
      fc.property(quoteFreeCsv, (text) => {
        expect(splitQuoteFree(text, ',', 100_000)).not.toBeNull();
        expect(readWith(text, 'auto')).toEqual(readWith(text, 'csv-parse'));
      }),
      { seed: SEED, numRuns: 300 },
    );
  });

  it('readTable(quote-free text, short maxFieldLength) falls back and reports the over-long record as csv-parse does', () => {
    fc.assert(
      fc.property(quoteFreeCsv, fc.integer({ min: 5, max: 60 }), (text, max) => {
        const options = { ...OPTIONS, maxFieldLength: max };
        expect(readWith(text, 'auto', options)).toEqual(readWith(text, 'csv-parse', options));
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('splitQuoteFree(text with a quote) declines, so csv-parse reads it', () => {
    expect(splitQuoteFree('a,b\n"1",2\n', ',', 100)).toBeNull();
  });
});
