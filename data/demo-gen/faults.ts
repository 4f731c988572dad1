/** The faults injected into the demo files, so the ledger has something to show, and where they end up. */
import type { Bottle } from './bottles.js';
import type { Cell } from './cells.js';
import type { TextRow } from './delimited-text.js';
import { fixed } from './format.js';

/** A bottle-file row with the bottle it came from. */
export interface SampleRow extends TextRow {
  /** The bottle written on this row. */
  bottle: Bottle;
}

/** A cell-file row with the cell it came from. */
export interface CellRow extends TextRow {
  /** The cell written on this row. */
  cell: Cell;
  /** Fault kind when this row carries an injected fault, else ''. */
  fault: string;
}

/** One injected fault as truth.json records it. */
export interface FaultRecord {
  /** File relative to the demo project. */
  file: string;
  /** Physical line (header = 1). */
  line: number;
  /** Every affected line when the fault spans several rows. */
  lines?: number[];
  /** What was done to the row. */
  kind: string;
  /** Ledger reason the tool is expected to give. */
  expected_reason: string;
  /** Ledger action expected: excluded, converted or flagged. */
  expected_action: 'excluded' | 'converted' | 'flagged';
  /** Human-readable note. */
  detail: string;
}

/** A planned fault on one bottle of a cruise (0-based station index and nominal depth). */
interface SampleFault {
  cruise: string;
  station: number;
  depth: number;
  kind: 'duplicate-bottle' | 'bad-flag' | 'unknown-flag' | 'comma-decimal' | 'below-detection' | 'ragged-row';
  /** Canonical column changed, for field faults. */
  column?: string;
  /** New field text; for comma-decimal the value's own digits are used. */
  value?: string;
  reason: string;
  action: FaultRecord['expected_action'];
}

/**
 * Bottle faults; all at depths where no cells are taken except the censored dFe, whose depths the cells avoid.
 * A bad or unknown flag drops the one value (the row stays), so those are 'flagged', not 'excluded'.
 */
export const SAMPLE_FAULTS: readonly SampleFault[] = [
  { cruise: 'SG2104', station: 6, depth: 500, kind: 'duplicate-bottle', reason: 'duplicate-bottle', action: 'excluded' },
  { cruise: 'SG2104', station: 8, depth: 1500, kind: 'bad-flag', column: 'dissolved_fe_flag', value: '4', reason: 'flag-not-accepted', action: 'flagged' },
  { cruise: 'TH2110', station: 2, depth: 2500, kind: 'unknown-flag', column: 'nitrate_flag', value: 'X', reason: 'unknown-flag', action: 'flagged' },
  { cruise: 'TH2110', station: 5, depth: 500, kind: 'comma-decimal', column: 'nitrate', reason: 'not-a-number', action: 'excluded' },
  { cruise: 'CR2206', station: 7, depth: 10, kind: 'below-detection', column: 'dissolved_fe', value: '<0.02', reason: 'below-detection-substituted', action: 'converted' },
  { cruise: 'CR2206', station: 7, depth: 25, kind: 'below-detection', column: 'dissolved_fe', value: '<0.02', reason: 'below-detection-substituted', action: 'converted' },
  { cruise: 'SG2301', station: 3, depth: 1000, kind: 'ragged-row', reason: 'ragged-row', action: 'excluded' },
];

/** The extra station written with latitude and longitude swapped, which puts it in southern Africa; it has no cells. */
export const SWAPPED_STATION = { cruise: 'SG2104', intended: [26.0, -31.0] as const, reason: 'position-on-land' } as const;

/** A planned fault on the n-th cell row (0-based) of a cruise's cell file. */
interface CellFault {
  cruise: string;
  row: number;
  kind: 'unknown-class' | 'zero-fe';
  column: string;
  value: string;
  reason: string;
}

/** Cell faults. */
export const CELL_FAULTS: readonly CellFault[] = [
  { cruise: 'SG2301', row: 40, kind: 'unknown-class', column: 'phyto_class', value: 'unidentified flagellate', reason: 'unknown-class' },
  { cruise: 'CR2206', row: 25, kind: 'zero-fe', column: 'fe', value: '0', reason: 'non-positive-content' },
];

/** A fault applied to a row, before line numbers are known. */
export interface PendingFault {
  /** Faulty row (for a duplicate: the second copy). */
  rows: TextRow[];
  /** Record without file and line. */
  record: Omit<FaultRecord, 'file' | 'line' | 'lines'>;
}

/** Apply this cruise's bottle faults to its rows (in place); returns them pending line numbers. */
export function injectSampleFaults(cruise: string, rows: SampleRow[], columns: readonly string[]): PendingFault[] {
  const out: PendingFault[] = [];
  for (const f of SAMPLE_FAULTS.filter((x) => x.cruise === cruise)) {
    const at = rows.findIndex((r) => r.bottle.stationIndex === f.station && r.bottle.depth === f.depth);
    const row = rows[at];
    const where = `${row.bottle.station} at ${f.depth} m`;
    const record = (detail: string) => ({ kind: f.kind, expected_reason: f.reason, expected_action: f.action, detail: `${where}: ${detail}` });
    if (f.kind === 'duplicate-bottle') {
      const copy: SampleRow = { fields: [...row.fields], bottle: row.bottle };
      rows.splice(at + 1, 0, copy);
      out.push({ rows: [copy], record: record('the same cruise, station, cast and bottle written twice; this is the second copy') });
    } else if (f.kind === 'ragged-row') {
      row.fields = row.fields.slice(0, -1);
      out.push({ rows: [row], record: record('last field missing (one field too few)') });
    } else {
      const k = columns.indexOf(f.column!);
      const before = row.fields[k];
      row.fields[k] = f.kind === 'comma-decimal' ? fixed(Number(before), 2).replace('.', ',') : f.value!;
      out.push({ rows: [row], record: record(`${f.column} "${before}" written as "${row.fields[k]}"`) });
    }
  }
  return out;
}

/** Apply this cruise's cell faults to its rows (in place); returns them pending line numbers. */
export function injectCellFaults(cruise: string, rows: CellRow[], columns: readonly string[]): PendingFault[] {
  return CELL_FAULTS.filter((f) => f.cruise === cruise).map((f) => {
    const row = rows[f.row];
    const k = columns.indexOf(f.column);
    const before = row.fields[k];
    row.fields[k] = f.value;
    row.fault = f.kind;
    return { rows: [row], record: { kind: f.kind, expected_reason: f.reason, expected_action: 'excluded', detail: `cell ${row.cell.cellId}: ${f.column} "${before}" written as "${f.value}"` } };
  });
}

/** Resolve pending faults to file and physical lines (header = line 1). */
export function locateFaults(file: string, rows: readonly TextRow[], pending: readonly PendingFault[]): FaultRecord[] {
  return pending.map((p) => {
    const lines = p.rows.map((r) => rows.indexOf(r) + 2);
    return { file, line: lines[0], ...(lines.length > 1 ? { lines } : {}), ...p.record };
  });
}
