import * as aq from 'arquero';

/** The output table: the kept rows of each column in `order`, taken from `computed` when the stage rewrote it, else from the input table. */
export function keptTable(table: aq.ColumnTable, order: readonly string[], computed: Record<string, ArrayLike<unknown>>, kept: readonly number[]): aq.ColumnTable {
  const out: Record<string, unknown[]> = {};
  for (const c of order) {
    const src = computed[c] ?? (table.array(c) as ArrayLike<unknown>);
    out[c] = kept.map((i) => src[i]);
  }
  return aq.table(out);
}
