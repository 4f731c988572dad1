// fast-check arbitraries: valid sample and cell tables written as CSV text with random quoting, line ends and blank lines,
// and faults injected into some rows.
import fc from 'fast-check';

/** A typed cell of a table before it is written. */
export type Field = { text: string; numeric: boolean };

/** Which fault, if any, a row carries. */
export type Fault = 'none' | 'ragged-long' | 'ragged-short' | 'text-in-number' | 'bad-date';

const num = (min: number, max: number, digits: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true }).map((v) => v.toFixed(digits));
const word = fc.stringMatching(/^[A-Za-z][A-Za-z0-9 _-]{0,6}$/);
const isoDate = fc.date({ min: new Date('1990-01-01T00:00:00Z'), max: new Date('2030-12-31T00:00:00Z'), noInvalidDate: true }).map((d) => d.toISOString().replace('.000', ''));

/** Sample header (canonical names) and its data rows as fields. */
export const SAMPLE_HEADER = ['cruise', 'station', 'time', 'lat', 'lon', 'depth', 'temperature', 'salinity', 'dissolved_fe', 'nitrate'];
const sampleRow = fc.tuple(word, word, isoDate, num(-60, 60, 3), num(-179, 179, 3), num(0, 5000, 1), num(-1, 30, 2), num(30, 38, 3), num(0.01, 2, 3), num(0, 40, 2));

/** Cell header (canonical names). */
export const CELL_HEADER = ['cell_id', 'cruise', 'station', 'depth', 'phyto_class', 'fe', 'fe_sigma', 'carbon'];
const cellRow = (i: number) => fc.tuple(fc.constant(`c${i}`), fc.constant('CR1'), fc.constantFrom('S1', 'S2', 'S3'), fc.constantFrom('10', '50'), fc.constantFrom('diatom', 'Bacillariophyceae'), num(0.1, 50, 3), num(0.01, 2, 3), num(0.1, 5, 3));

const fault = fc.oneof({ weight: 6, arbitrary: fc.constant<Fault>('none') }, { weight: 1, arbitrary: fc.constantFrom<Fault>('ragged-long', 'ragged-short', 'text-in-number', 'bad-date') });

/** Apply a fault to the fields of one row (numeric columns are those from `firstNumber` on; the date is `dateColumn`, or none). */
export function injectFault(fields: string[], f: Fault, firstNumber: number, dateColumn: number): string[] {
  const out = [...fields];
  if (f === 'ragged-long') out.push('extra');
  if (f === 'ragged-short') out.splice(2);
  if (f === 'text-in-number') out[firstNumber] = 'n/a?';
  if (f === 'bad-date' && dateColumn >= 0) out[dateColumn] = '2021-02-30T00:00:00Z';
  return out;
}

/** How a table is written: quote each field or not, line end, blank lines after some rows. */
const layout = fc.record({ quoteAll: fc.boolean(), quoteSome: fc.boolean(), crlf: fc.boolean(), mixed: fc.boolean(), blankEvery: fc.integer({ min: 0, max: 4 }) });

/** Write rows as CSV text under a layout (fields never hold quotes or commas, so quoting is optional per field). */
function writeCsv(rows: string[][], l: { quoteAll: boolean; quoteSome: boolean; crlf: boolean; mixed: boolean; blankEvery: number }): string {
  const lines: string[] = [];
  rows.forEach((fields, r) => {
    lines.push(fields.map((f, j) => (l.quoteAll || (l.quoteSome && (r + j) % 2 === 0) ? `"${f}"` : f)).join(','));
    if (l.blankEvery > 0 && r > 0 && r % l.blankEvery === 0) lines.push('');
  });
  return lines.map((line, i) => `${line}${l.crlf || (l.mixed && i % 2 === 1) ? '\r\n' : '\n'}`).join('');
}

/** A generated table file: its text, how many data rows, and which rows carry which fault. */
export interface GeneratedTable {
  /** CSV text. */
  text: string;
  /** Data rows written. */
  rows: number;
  /** Fault per data row. */
  faults: Fault[];
}

/** Random samples CSV with injected faults. */
export const samplesTable: fc.Arbitrary<GeneratedTable> = fc
  .tuple(fc.array(fc.tuple(sampleRow, fault), { minLength: 0, maxLength: 25 }), layout)
  .map(([rows, l]) => ({
    text: writeCsv([SAMPLE_HEADER, ...rows.map(([fields, f]) => injectFault([...fields], f, 3, 2))], l),
    rows: rows.length,
    faults: rows.map(([, f]) => f),
  }));

/** Random cells CSV with injected faults (cells have no date column: 'bad-date' leaves the row valid). */
export const cellsTable: fc.Arbitrary<GeneratedTable> = fc
  .tuple(fc.integer({ min: 0, max: 25 }).chain((n) => fc.tuple(...Array.from({ length: n }, (_, i) => fc.tuple(cellRow(i), fault)))), layout)
  .map(([rows, l]) => ({
    text: writeCsv([CELL_HEADER, ...rows.map(([fields, f]) => injectFault([...fields], f === 'text-in-number' ? 'none' : f, 5, -1))], l),
    rows: rows.length,
    faults: rows.map(([, f]) => (f === 'text-in-number' || f === 'bad-date' ? 'none' : f)),
  }));
