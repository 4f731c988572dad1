// Plain-text tables for the terminal: columns padded to their widest cell, numbers right-aligned.

/** Lines of a table indented by two spaces, two spaces between columns, no trailing blanks. `right[i]` right-aligns column i. */
export function formatTable(headers: string[], rows: string[][], right: boolean[] = []): string[] {
  const widths = headers.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
  const line = (cells: string[]) => `  ${cells.map((c, i) => (right[i] ? c.padStart(widths[i]) : c.padEnd(widths[i]))).join('  ')}`.trimEnd();
  return [line(headers), ...rows.map(line)];
}
