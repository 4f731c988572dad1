// A deliberately tiny reader for the demo's CSV/TSV files, independent of the tool's loader.

/** Physical non-blank lines of a delimited text file, with their 1-based line numbers (header = 1). */
export function physicalLines(text: string): { line: number; text: string }[] {
  return text
    .split(/\r?\n/)
    .map((t, i) => ({ line: i + 1, text: t }))
    .filter((l) => l.text.trim() !== '');
}

/** Number of data rows: non-blank physical lines minus the header. */
export function countDataRows(text: string): number {
  return Math.max(0, physicalLines(text).length - 1);
}

/** The delimiter for a file name: tab for .tsv, comma otherwise. */
export function delimiterFor(path: string): string {
  return path.endsWith('.tsv') ? '\t' : ',';
}

/** Rows as field arrays split on the delimiter (no quoting: the demo files write none), header first. */
export function splitRows(text: string, delimiter: string): { line: number; fields: string[] }[] {
  return physicalLines(text).map((l) => ({ line: l.line, fields: l.text.split(delimiter) }));
}

/** Parse a simple CSV with a header whose fields may be double-quoted (as the site's ledger.csv is). */
export function parseCsv(text: string): Record<string, string>[] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && text[i + 1] === '\n') i++;
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
    } else field += ch;
  }
  if (field !== '' || row.length > 0) {
    row.push(field);
    rows.push(row);
  }
  const [header, ...body] = rows.filter((r) => !(r.length === 1 && r[0] === ''));
  return body.map((r) => Object.fromEntries(header.map((h, i) => [h, r[i] ?? ''])));
}
