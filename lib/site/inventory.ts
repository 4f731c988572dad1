// Per-cruise inventory and exclusion summary for the Overview and Inventory pages.
import type * as aq from 'arquero';
import type { LedgerEntry } from '../types.js';

/** One cruise's holdings after harmonisation. */
export interface CruiseInventory {
  /** Cruise id. */
  cruise: string;
  /** Distinct stations with samples or cells. */
  stations: number;
  /** Bottle rows used. */
  samples: number;
  /** Cell rows used. */
  cells: number;
  /** Earliest sample or cell time, ISO date (UTC), or null. */
  firstDate: string | null;
  /** Latest sample or cell time, ISO date (UTC), or null. */
  lastDate: string | null;
}

/** Ledger rows grouped by table, action and reason, with up to a few examples. */
export interface LedgerGroup {
  /** Logical table. */
  table: string;
  /** excluded / converted / flagged. */
  action: string;
  /** Reason code. */
  reason: string;
  /** Number of ledger rows. */
  count: number;
  /** First few rows as `file:line detail`. */
  examples: string[];
}

/** Per-cruise counts from the sample and cell tables, sorted by cruise id. */
export function inventoryByCruise(samples: aq.ColumnTable, cells: aq.ColumnTable): CruiseInventory[] {
  const byCruise = new Map<string, { stations: Set<string>; samples: number; cells: number; min: number; max: number }>();
  const visit = (table: aq.ColumnTable, kind: 'samples' | 'cells'): void => {
    if (table.numRows() === 0) return;
    const cruise = table.array('cruise') as ArrayLike<string>;
    const station = table.array('station') as ArrayLike<string>;
    const time = table.columnNames().includes('time') ? (table.array('time') as ArrayLike<number>) : null;
    for (let i = 0; i < table.numRows(); i++) {
      let entry = byCruise.get(cruise[i]);
      if (!entry) byCruise.set(cruise[i], (entry = { stations: new Set(), samples: 0, cells: 0, min: Infinity, max: -Infinity }));
      entry.stations.add(station[i]);
      entry[kind]++;
      const t = time ? time[i] : NaN;
      if (Number.isFinite(t)) {
        if (t < entry.min) entry.min = t;
        if (t > entry.max) entry.max = t;
      }
    }
  };
  visit(samples, 'samples');
  visit(cells, 'cells');
  return [...byCruise.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([cruise, e]) => ({
      cruise,
      stations: e.stations.size,
      samples: e.samples,
      cells: e.cells,
      firstDate: Number.isFinite(e.min) ? new Date(e.min).toISOString().slice(0, 10) : null,
      lastDate: Number.isFinite(e.max) ? new Date(e.max).toISOString().slice(0, 10) : null,
    }));
}

/** Ledger rows grouped by table/action/reason in a stable order, with the first `examples` rows of each. */
export function groupLedger(entries: readonly LedgerEntry[], examples = 3): LedgerGroup[] {
  const groups = new Map<string, LedgerGroup>();
  for (const e of entries) {
    const key = `${e.table}\u0000${e.action}\u0000${e.reason}`;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { table: e.table, action: e.action, reason: e.reason, count: 0, examples: [] }));
    g.count++;
    if (g.examples.length < examples) g.examples.push(`${e.file}:${e.line} ${e.detail}`);
  }
  const order = { excluded: 0, converted: 1, flagged: 2 } as Record<string, number>;
  return [...groups.values()].sort((a, b) => (order[a.action] ?? 9) - (order[b.action] ?? 9) || a.table.localeCompare(b.table) || b.count - a.count || a.reason.localeCompare(b.reason));
}

/** Count of rows per distinct value of a text column, sorted by value. */
export function countBy(table: aq.ColumnTable, column: string): { value: string; count: number }[] {
  if (table.numRows() === 0 || !table.columnNames().includes(column)) return [];
  const values = table.array(column) as ArrayLike<string | null>;
  const counts = new Map<string, number>();
  for (let i = 0; i < table.numRows(); i++) {
    const v = values[i] ?? '(none)';
    counts.set(v, (counts.get(v) ?? 0) + 1);
  }
  return [...counts.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([value, count]) => ({ value, count }));
}
