// The Figure record every builder hands to the site stage, and the CSV of the data behind it.

/** One published figure: what it shows, its rendered SVG, its spec and its data. */
export interface Figure {
  /** Stable identifier used in file names and links, e.g. 'fe-c-vs-dfe'. */
  id: string;
  /** Short title shown above the caption. */
  title: string;
  /** Caption text (plain text; the site may add numbering). */
  caption: string;
  /** Alternative text describing what the figure shows, for screen readers. */
  alt: string;
  /** The Vega-Lite / Vega spec as JSON data; undefined for hand-assembled SVG such as maps. */
  spec: Record<string, unknown> | undefined;
  /** Rendered SVG text. */
  svg: string;
  /** The data behind the figure as CSV text (see figureCsv). */
  csv: string;
  /** Nominal printed width in mm (85 single column, 180 double column). */
  widthMm: number;
}

/** A CSV column: the record key and an optional header (defaults to the key). */
export type CsvColumn = string | { key: string; header?: string };

/** Cell value types figureCsv writes. */
export type CsvValue = string | number | boolean | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

function csvCell(value: CsvValue): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  // Spreadsheet formula-injection mitigation: a text cell that a spreadsheet would evaluate gets a leading quote.
  let text = FORMULA_START.test(value) ? `'${value}` : value;
  if (/[",\n\r]/.test(text)) text = `"${text.replace(/"/g, '""')}"`;
  return text;
}

/** CSV text (RFC 4180 quoting, LF line ends) of `rows` in `columns` order; numbers are written as numbers, text cells starting with = + - @ tab or CR get a leading single quote. */
export function figureCsv(rows: readonly Record<string, CsvValue>[], columns: readonly CsvColumn[]): string {
  const cols = columns.map((c) => (typeof c === 'string' ? { key: c, header: c } : { key: c.key, header: c.header ?? c.key }));
  const lines = [cols.map((c) => csvCell(c.header)).join(',')];
  for (const row of rows) lines.push(cols.map((c) => csvCell(row[c.key])).join(','));
  return lines.join('\n') + '\n';
}
