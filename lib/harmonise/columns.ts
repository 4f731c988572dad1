import type * as aq from 'arquero';
import { missingColumn } from './messages.js';

/** A numeric column copied into a Float64Array (the input table is never mutated); all NaN when absent. */
export function numberColumn(table: aq.ColumnTable, name: string): Float64Array {
  const out = new Float64Array(table.numRows()).fill(NaN);
  if (!table.columnNames().includes(name)) return out;
  const src = table.array(name);
  for (let i = 0; i < out.length; i++) {
    const v = src[i];
    out[i] = typeof v === 'number' ? v : NaN;
  }
  return out;
}

/** A text column copied as (string | null)[], or null when absent. */
export function textColumn(table: aq.ColumnTable, name: string): (string | null)[] | null {
  if (!table.columnNames().includes(name)) return null;
  return Array.from(table.array(name), (v) => (v === null || v === undefined ? null : String(v)));
}

/** A boolean column as a Uint8Array (1 = true); all 0 when absent. */
export function booleanColumn(table: aq.ColumnTable, name: string): Uint8Array {
  const out = new Uint8Array(table.numRows());
  if (!table.columnNames().includes(name)) return out;
  const src = table.array(name);
  for (let i = 0; i < out.length; i++) out[i] = src[i] === true ? 1 : 0;
  return out;
}

/** The physical line of every row from `source_line`; throws naming the file when the loader did not provide it. */
export function sourceLines(table: aq.ColumnTable, file: string): Float64Array {
  if (!table.columnNames().includes('source_line')) throw new Error(missingColumn(file, 'source_line'));
  return numberColumn(table, 'source_line');
}
