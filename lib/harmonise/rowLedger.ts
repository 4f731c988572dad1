import type { Ledger } from '../ledger/index.js';
import type { LedgerAction } from '../types.js';

/** Ledger writer for one input file of the harmonise stage; guarantees at most one 'excluded' row per input row. */
export class RowLedger {
  /** 1 where the row has been excluded. */
  readonly excluded: Uint8Array;

  /** Write to `ledger` for rows of `file` whose physical lines are `lines`. */
  constructor(
    private readonly ledger: Ledger,
    readonly table: string,
    readonly file: string,
    readonly lines: Float64Array,
  ) {
    this.excluded = new Uint8Array(lines.length);
  }

  /** Record a converted or flagged row (the row stays). */
  add(i: number, action: Exclude<LedgerAction, 'excluded'>, reason: string, detail: string): void {
    this.ledger.add({ table: this.table, file: this.file, line: this.lines[i], stage: 'harmonise', action, reason, detail });
  }

  /** Exclude a row with its reason; a row already excluded keeps its first reason. */
  exclude(i: number, reason: string, detail: string): void {
    if (this.excluded[i]) return;
    this.excluded[i] = 1;
    this.ledger.add({ table: this.table, file: this.file, line: this.lines[i], stage: 'harmonise', action: 'excluded', reason, detail });
  }

  /** Indices of rows not excluded, ascending. */
  kept(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.excluded.length; i++) if (!this.excluded[i]) out.push(i);
    return out;
  }
}
