// Expected Overview numbers: the generator's truth minus what the site's ledger excluded.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { delimiterFor, parseCsv, splitRows } from '../helpers/delimited.js';

/** One cruise's entry in truth.json `counts.cruises`. */
export interface TruthCruise {
  /** Cell file, relative to the project. */
  cell_file: string;
  /** Data rows in the cell file. */
  cell_rows: number;
  /** Usable cells per class (faulty cells already left out by the generator). */
  cells_by_class: Record<string, number>;
  /** Bottle file, relative to the project. */
  sample_file: string;
  /** Data rows in the bottle file. */
  sample_rows: number;
  /** Stations written, including faulty ones. */
  stations: number;
}

/** Ledger rows with action `excluded`, as distinct `file:line` keys per table. */
export function excludedRows(ledgerCsv: string): Map<string, Set<string>> {
  const byTable = new Map<string, Set<string>>();
  for (const row of parseCsv(ledgerCsv)) {
    if (row.action !== 'excluded') continue;
    const set = byTable.get(row.table) ?? new Set<string>();
    set.add(`${row.file}:${row.line}`);
    byTable.set(row.table, set);
  }
  return byTable;
}

/** Stations of a bottle file whose every row the ledger excluded (station column found by header name). */
export function stationsFullyExcluded(projectDir: string, file: string, stationHeader: string, excluded: Set<string>): string[] {
  const rows = splitRows(readFileSync(join(projectDir, file), 'utf8'), delimiterFor(file));
  const col = rows[0].fields.indexOf(stationHeader);
  if (col < 0) throw new Error(`${file}: no column ${stationHeader}`);
  const kept = new Map<string, boolean>();
  for (const r of rows.slice(1)) {
    const station = r.fields[col];
    const used = !excluded.has(`${file}:${r.line}`);
    kept.set(station, (kept.get(station) ?? false) || used);
  }
  return [...kept].filter(([, k]) => !k).map(([s]) => s);
}
