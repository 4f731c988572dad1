/** Column access helpers shared by the match and quotas stages: typed copies, never views into the input. */
import * as aq from 'arquero';

/** Values of a column in table row order, without a copy when the table is neither filtered nor ordered. */
function columnValues(table: aq.ColumnTable, name: string): ArrayLike<unknown> {
  const column = table.column(name);
  if (!table.isFiltered() && !table.isOrdered() && (Array.isArray(column) || ArrayBuffer.isView(column))) {
    return column as ArrayLike<unknown>;
  }
  return table.array(name);
}

/** A numeric column as a fresh Float64Array; absent columns and non-numbers read as NaN. */
export function numberColumn(table: aq.ColumnTable, name: string): Float64Array {
  const n = table.numRows();
  const out = new Float64Array(n).fill(Number.NaN);
  if (table.columnIndex(name) < 0) return out;
  const values = columnValues(table, name);
  for (let i = 0; i < n; i++) {
    const v = values[i];
    if (typeof v === 'number') out[i] = v;
    else if (v instanceof Date) out[i] = v.getTime();
  }
  return out;
}

/** A text column as strings; absent columns and null/undefined read as ''. */
export function textColumn(table: aq.ColumnTable, name: string): string[] {
  const n = table.numRows();
  if (table.columnIndex(name) < 0) return new Array<string>(n).fill('');
  const values = columnValues(table, name);
  const out = new Array<string>(n);
  for (let i = 0; i < n; i++) {
    const v = values[i];
    out[i] = v === null || v === undefined ? '' : String(v);
  }
  return out;
}

/** A boolean column; absent columns read as false. */
export function booleanColumn(table: aq.ColumnTable, name: string): boolean[] {
  const n = table.numRows();
  if (table.columnIndex(name) < 0) return new Array<boolean>(n).fill(false);
  const values = columnValues(table, name);
  const out = new Array<boolean>(n);
  for (let i = 0; i < n; i++) out[i] = values[i] === true;
  return out;
}

/**
 * New table holding rows `keep` (input order) of every input column, then the given added columns
 * (already of length keep.length), in the order given; an added column that exists in the input replaces it in place.
 * Columns are copied, so the input stays untouched.
 */
export function keepRowsWith(
  table: aq.ColumnTable,
  keep: number[],
  added: [string, ArrayLike<unknown>][],
): aq.ColumnTable {
  const data: Record<string, ArrayLike<unknown>> = {};
  const names: string[] = [];
  const addedByName = new Map(added);
  for (const name of table.columnNames()) {
    const replacement = addedByName.get(name);
    if (replacement !== undefined) {
      data[name] = replacement instanceof Float64Array ? Float64Array.from(replacement) : Array.from(replacement);
    } else {
      const values = columnValues(table, name);
      data[name] = keep.map((i) => values[i]);
    }
    names.push(name);
  }
  for (const [name, values] of added) {
    if (Object.hasOwn(data, name)) continue;
    data[name] = values instanceof Float64Array ? Float64Array.from(values) : Array.from(values);
    names.push(name);
  }
  return aq.table(data, names);
}
