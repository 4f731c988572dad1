import { fillValue } from './messages.js';
import type { RowLedger } from './rowLedger.js';

/** True when x equals one of the fill values to 1e-6 relative (9.96921e36 is stored as a rounded float; common practice). */
export function isFillValue(x: number, fills: readonly number[]): boolean {
  if (!Number.isFinite(x)) return false;
  for (const f of fills) if (x === f || Math.abs(x - f) <= 1e-6 * Math.abs(f)) return true;
  return false;
}

/** Replace fill values by NaN in the given columns, in place; one 'converted' / 'fill-value' ledger row per affected input row. */
export function replaceFillValues(columns: Record<string, Float64Array>, fills: readonly number[], rows: RowLedger): void {
  const names = Object.keys(columns).sort();
  const n = rows.lines.length;
  for (let i = 0; i < n; i++) {
    const hits: { column: string; value: number }[] = [];
    for (const name of names) {
      const v = columns[name][i];
      if (isFillValue(v, fills)) {
        hits.push({ column: name, value: v });
        columns[name][i] = NaN;
      }
    }
    if (hits.length > 0) rows.add(i, 'converted', 'fill-value', fillValue(hits));
  }
}
