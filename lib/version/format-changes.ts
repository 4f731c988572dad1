// The Changes section as plain text for the terminal (`basinquota diff`).
import type { ChangesSection, ParameterValue, RegionChangeKind } from './changes-section.js';
import { formatNumber } from './format-number.js';
import { formatTable } from './format-table.js';
import { firstVersion } from './messages.js';

/** Significant figures for fit parameters and fold differences. */
export const CHANGE_SIG_FIGS = 3;

/** Words for each region change, shared with the Changes page. */
export const REGION_CHANGE_LABELS: Record<RegionChangeKind, string> = {
  'newly-flagged': 'newly flagged',
  cleared: 'cleared',
  reversed: 'reversed',
};

const f = (x: number | null): string => (x === null ? '-' : formatNumber(x, CHANGE_SIG_FIGS));
const list = (items: string[]): string => (items.length ? items.join(', ') : '-');

/** "0.52 [0.41, 0.63]", the bare estimate when there is no interval, "absent" when there is no value. */
export function formatParameterValue(value: ParameterValue | null): string {
  if (value === null) return 'absent';
  if (value.lower === null || value.upper === null) return f(value.estimate);
  return `${f(value.estimate)} [${f(value.lower)}, ${f(value.upper)}]`;
}

/** The whole section as text, one block per kind of change, ending in a newline. */
export function formatChanges(changes: ChangesSection): string {
  const { previous, current } = changes;
  if (previous === null) return `Version ${current.version} (${current.date}). ${firstVersion()}\n`;
  const out: string[] = [`Changes from version ${previous.version} (${previous.date}) to version ${current.version} (${current.date})`, ''];

  const c = changes.cells;
  out.push('Data');
  out.push(`  cruises added: ${list(changes.cruises.added)}`);
  out.push(`  cruises removed: ${list(changes.cruises.removed)}`);
  out.push(`  cells: ${c.before} -> ${c.after} (${c.added} added, ${c.removed} removed)`);
  if (c.added) out.push(`  cells added: ${ids(c.addedIds, c.added)}`);
  if (c.removed) out.push(`  cells removed: ${ids(c.removedIds, c.removed)}`);

  if (changes.stations.length) {
    out.push('', 'Stations');
    out.push(...formatTable(['cruise', 'added', 'removed'], changes.stations.map((s) => [s.cruise, list(s.added), list(s.removed)])));
  }
  if (changes.holdings.length) {
    out.push('', 'Holdings');
    out.push(...formatTable(['cruise', 'samples', 'cells'], changes.holdings.map((h) => [h.cruise, `${h.samplesBefore} -> ${h.samplesAfter}`, `${h.cellsBefore} -> ${h.cellsAfter}`]), [false, true, true]));
  }

  out.push('', 'Fit parameters');
  if (changes.parameters.length === 0) out.push('  none in either version');
  else
    out.push(
      ...formatTable(
        ['class', 'model', 'parameter', 'old [interval]', 'new [interval]', 'beyond old interval'],
        changes.parameters.map((p) => [p.class, p.model, p.parameter, formatParameterValue(p.before), formatParameterValue(p.after), beyond(p.before, p.after, p.outsideOldInterval)]),
      ),
    );

  out.push('', 'Regions');
  if (changes.regions.length === 0) out.push('  no region changed its flag');
  else
    out.push(
      ...formatTable(
        ['region', 'class', 'change', 'old', 'new'],
        changes.regions.map((r) => [r.region, r.class, REGION_CHANGE_LABELS[r.change], flag(r.before, r.foldBefore), flag(r.after, r.foldAfter)]),
      ),
    );

  out.push('', 'Ledger counts');
  if (changes.ledger.length === 0) out.push('  unchanged');
  else out.push(...formatTable(['table', 'action', 'reason', 'old', 'new'], changes.ledger.map((l) => [l.table, l.action, l.reason, String(l.before), String(l.after)]), [false, false, false, true, true]));

  return `${out.join('\n')}\n`;
}

/** yes / no, or '-' when the question has no answer (a side missing, or no old interval). */
export function beyond(before: ParameterValue | null, after: ParameterValue | null, outside: boolean): string {
  if (before === null || after === null || before.lower === null || before.upper === null || after.estimate === null) return '-';
  return outside ? 'yes' : 'no';
}

function ids(shown: string[], total: number): string {
  return total > shown.length ? `${shown.join(', ')} and ${total - shown.length} more` : shown.join(', ');
}

function flag(value: string | null, fold: number | null): string {
  if (value === null) return 'absent';
  return fold === null ? value : `${value} (fold ${f(fold)})`;
}
