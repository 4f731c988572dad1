// The same bottle in two sample files (a cruise exported twice, or merged by hand): the later file's row is excluded.
import * as aq from 'arquero';
import type { Ledger } from '../ledger/index.js';

/** The ledger detail of a bottle already read from another file. */
export function duplicateAcrossFiles(key: string, firstFile: string, firstLine: number): string {
  return `duplicate bottle ${key}, already read from ${firstFile}:${firstLine}; this row is excluded`;
}

/** Per-file sample tables with bottles already seen in an earlier file removed (one 'excluded' ledger row each). */
export function dropCrossFileDuplicates(tables: aq.ColumnTable[], ledger: Ledger): aq.ColumnTable[] {
  const seen = new Map<string, { file: string; line: number }>();
  return tables.map((table) => {
    const names = table.columnNames();
    if (!names.includes('bottle') || table.numRows() === 0) return table;
    const get = (c: string) => (names.includes(c) ? (table.array(c) as ArrayLike<string | null>) : null);
    const [cruise, station, cast, bottle] = ['cruise', 'station', 'cast', 'bottle'].map(get);
    const file = table.array('source_file') as ArrayLike<string>;
    const line = table.array('source_line') as ArrayLike<number>;
    const keep: number[] = [];
    const local = new Map<string, { file: string; line: number }>();
    for (let i = 0; i < table.numRows(); i++) {
      const b = bottle?.[i];
      if (b === null || b === undefined || b === '') {
        keep.push(i);
        continue;
      }
      const key = [cruise, station, cast, bottle].map((c) => c?.[i] ?? '–').join('/');
      const first = seen.get(key);
      if (first && first.file !== file[i]) {
        ledger.add({ table: 'samples', file: file[i], line: line[i], stage: 'harmonise', action: 'excluded', reason: 'duplicate-bottle', detail: duplicateAcrossFiles(key, first.file, first.line) });
        continue;
      }
      local.set(key, { file: file[i], line: line[i] });
      keep.push(i);
    }
    for (const [k, v] of local) if (!seen.has(k)) seen.set(k, v);
    if (keep.length === table.numRows()) return table;
    const columns: Record<string, unknown[]> = {};
    for (const c of names) {
      const values = table.array(c) as ArrayLike<unknown>;
      columns[c] = keep.map((i) => values[i]);
    }
    return aq.table(columns);
  });
}
