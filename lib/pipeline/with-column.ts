import * as aq from 'arquero';

/** A new table with one column added or replaced (the input table is not changed). */
export function withColumn(table: aq.ColumnTable, name: string, values: ArrayLike<unknown>): aq.ColumnTable {
  const columns: Record<string, ArrayLike<unknown>> = {};
  for (const c of table.columnNames()) if (c !== name) columns[c] = table.array(c) as ArrayLike<unknown>;
  columns[name] = values;
  return aq.table(columns);
}
