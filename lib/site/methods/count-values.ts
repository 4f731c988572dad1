// Counting distinct values of a text column, for the method notes.
import type * as aq from 'arquero';

/** Rows per value of `column` (missing → "none"); an absent column or empty table gives an empty map. */
export function countValues(table: aq.ColumnTable, column: string): Map<string, number> {
  const counts = new Map<string, number>();
  if (table.numRows() === 0 || !table.columnNames().includes(column)) return counts;
  const values = table.array(column) as ArrayLike<string | null>;
  for (let i = 0; i < table.numRows(); i++) {
    const v = values[i] ?? 'none';
    counts.set(v, (counts.get(v) ?? 0) + 1);
  }
  return counts;
}

/** Shortest round-trip text of a number, or "—" when it is not finite. */
export function num(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : String(value);
}

/** A number to 3 significant digits (fixed, locale-free), or "—" when it is not finite. */
export function sig3(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : String(Number(value.toPrecision(3)));
}
