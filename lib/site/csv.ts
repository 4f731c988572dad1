// CSV export safe to open in spreadsheets.

const FORMULA_START = /^[=+\-@\t\r]/;

/** Neutralise a text cell that a spreadsheet would run as a formula (OWASP CSV injection mitigation: prefix a single quote). */
export function neutraliseCell(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** Quote a CSV field per RFC 4180 when it holds a delimiter, quote or line break. */
function quote(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

/** Format one value: numbers as shortest round-trip text, NaN/null as empty, text neutralised and quoted. */
export function csvField(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  return quote(neutraliseCell(String(value)));
}

/** Rows of records to RFC 4180 CSV with a header line and CRLF-free `\n` line ends. */
export function toCsv(rows: readonly Record<string, unknown>[], columns: readonly string[]): string {
  const lines = [columns.map((c) => quote(neutraliseCell(c))).join(',')];
  for (const row of rows) lines.push(columns.map((c) => csvField(row[c])).join(','));
  return `${lines.join('\n')}\n`;
}
