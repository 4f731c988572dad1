/** Opt-in correction of one cruise's dissolved Fe by a user-approved crossover offset, each changed row ledgered. */
import * as aq from 'arquero';
import type { Ledger } from '../ledger/ledger.js';
import { offsetApplied } from './messages.js';
import { numberColumn, textColumn } from './table-columns.js';

/** An offset the user approved: the cruise reads `offsetNmolKg` high, so that amount is subtracted from its dFe. */
export interface ApprovedOffset {
  /** Cruise to correct. */
  cruise: string;
  /** nmol/kg to subtract (a crossover `offset_nmol_kg` of cruise_a against a reference cruise_b). */
  offsetNmolKg: number;
}

/**
 * New samples table with dissolved_fe − offset for each approved cruise; every changed row gets a ledger entry
 * (action 'converted', reason 'crossover-offset-applied'). Missing values are left alone. Only call on explicit user approval.
 */
export function applyOffsets(samples: aq.ColumnTable, approved: ApprovedOffset[], ledger: Ledger, table = 'samples'): aq.ColumnTable {
  if (!samples.columnNames().includes('dissolved_fe')) return samples;
  const offsetOf = new Map(approved.map((a) => [a.cruise, a.offsetNmolKg]));
  const cruise = textColumn(samples, 'cruise');
  const fe = numberColumn(samples, 'dissolved_fe');
  const files = textColumn(samples, 'source_file');
  const lines = numberColumn(samples, 'source_line');
  const corrected = Float64Array.from(fe);
  for (let i = 0; i < fe.length; i++) {
    const offset = offsetOf.get(cruise[i]);
    if (offset === undefined || offset === 0 || !Number.isFinite(fe[i])) continue;
    corrected[i] = fe[i] - offset;
    ledger.add({
      table,
      file: files[i],
      line: Number.isFinite(lines[i]) ? lines[i] : 0,
      stage: 'match',
      action: 'converted',
      reason: 'crossover-offset-applied',
      detail: offsetApplied(cruise[i], offset, fe[i], corrected[i]),
    });
  }
  return samples.reify().assign(aq.table({ dissolved_fe: corrected }));
}
