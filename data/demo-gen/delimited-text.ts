/** Rows of text fields to CSV/TSV text: quoted only where a field needs it, LF line ends, final newline. */

/** One data row of a generated table, with an optional note kept for the truth file (never written). */
export interface TextRow {
  /** Fields in header order (a ragged row has fewer). */
  fields: string[];
}

/** Quote a field when it holds the delimiter, a quote or a line break (RFC 4180). */
function quote(field: string, delimiter: string): string {
  return field.includes(delimiter) || /["\r\n]/.test(field) ? `"${field.replace(/"/g, '""')}"` : field;
}

/** The file text of a header and rows. */
export function delimitedText(header: readonly string[], rows: readonly TextRow[], delimiter: string): string {
  const lines = [header, ...rows.map((r) => r.fields)].map((fields) => fields.map((f) => quote(f, delimiter)).join(delimiter));
  return `${lines.join('\n')}\n`;
}
