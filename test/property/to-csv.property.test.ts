// Property test: toCsv output parsed back by csv-parse gives the original text cells, apart from the neutralising quote prefix.
import { parse } from 'csv-parse/sync';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toCsv } from '../../lib/site/csv.js';

const SEED = 20240317;
// Text that stresses quoting: delimiters, quotes, line breaks, formula starts, non-ASCII.
const cellText = fc.oneof(fc.string({ unit: fc.constantFrom('a', 'Z', '0', ',', '"', '\n', '\r', ' ', '=', '+', '-', '@', '\t', 'é', 'µ', ';') }), fc.string());

/** What a cell should read back as: the text, with a leading quote when toCsv neutralised a formula start. */
const expectedBack = (text: string): string => (/^[=+\-@\t\r]/.test(text) ? `'${text}` : text);

describe('toCsv(rows, columns)', () => {
  it('toCsv(rows) parsed by csv-parse gives back every text cell (neutralised formula starts keep their prefix)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.stringMatching(/^[a-z][a-z_]{0,5}$/), { minLength: 1, maxLength: 4 }), fc.array(fc.array(cellText, { minLength: 4, maxLength: 4 }), { maxLength: 8 }), (columns, values) => {
        const rows = values.map((v) => Object.fromEntries(columns.map((c, j) => [c, v[j]])));
        const back = parse(toCsv(rows, columns), { relax_column_count: false }) as string[][];
        expect(back[0]).toEqual(columns);
        expect(back.slice(1)).toEqual(rows.map((r) => columns.map((c) => expectedBack(String(r[c])))));
      }),
      { seed: SEED, numRuns: 50 },
    );
  });

  it('toCsv(rows) writes finite numbers that parse back to the same number', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 1, maxLength: 10 }), (xs) => {
        const back = parse(toCsv(xs.map((x) => ({ x })), ['x'])) as string[][];
        expect(back.slice(1).map((r) => Number(r[0]))).toEqual(xs.map((x) => (Object.is(x, -0) ? 0 : x)));
      }),
      { seed: SEED, numRuns: 50 },
    );
  });
});
