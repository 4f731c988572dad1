import type { LedgerEntry } from '../types.js';

/** Collects ledger rows for one pipeline run; a sink passed into every stage, never module-level. */
export class Ledger {
  /** Rows in insertion order. */
  readonly entries: LedgerEntry[] = [];

  /** Append one row. */
  add(entry: LedgerEntry): void {
    this.entries.push(entry);
  }

  /** Rows with action 'excluded' for one table and file. */
  excluded(table: string, file?: string): LedgerEntry[] {
    return this.entries.filter((e) => e.action === 'excluded' && e.table === table && (file === undefined || e.file === file));
  }

  /** Counts by `table / action / reason`, sorted by key (stable output for pages and diffs). */
  countsByReason(): { table: string; action: string; reason: string; count: number }[] {
    const counts = new Map<string, number>();
    for (const e of this.entries) {
      const key = `${e.table}\u0000${e.action}\u0000${e.reason}`;
      counts.set(key, (counts.get(key) ?? 0) + 1);
    }
    return [...counts.entries()]
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([key, count]) => {
        const [table, action, reason] = key.split('\u0000');
        return { table, action, reason, count };
      });
  }
}
