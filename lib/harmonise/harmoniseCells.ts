import * as aq from 'arquero';
import type { Ledger } from '../ledger/index.js';
import { CELL_COLUMNS, ELEMENTS } from '../load/canonical.js';
import { numberColumn, sourceLines, textColumn } from './columns.js';
import { isIdentity, requireStatedUnits, resolveConversions } from './conversions.js';
import { keptTable } from './keptTable.js';
import { replaceFillValues } from './fillValues.js';
import { duplicateCellId } from './messages.js';
import { DEFAULT_FILL_VALUES, type CellHarmoniseOptions } from './options.js';
import { checkNegativeDepth, checkOnLand, checkPositionRange } from './positionChecks.js';
import { sortConversions, type ConversionCount, type HarmoniseResult } from './result.js';
import { RowLedger } from './rowLedger.js';

// Per-cell detection limits `<el>_dl` come from the loader's censored-value parsing, in the content's unit.
const NUMERIC = [
  ...Object.entries(CELL_COLUMNS)
    .filter(([, kind]) => kind === 'number')
    .map(([name]) => name),
  ...ELEMENTS.map((el) => `${el}_dl`),
];

const FOLLOWERS: Record<string, string> = {
  carbon_sigma: 'carbon',
  ...Object.fromEntries(ELEMENTS.flatMap((el) => [[`${el}_sigma`, el], [`${el}_dl`, el]])),
};

/** Throw when a cell id occurs twice in the file, naming both lines. */
function checkDuplicateIds(ids: (string | null)[] | null, rows: RowLedger): void {
  if (!ids) return;
  const seen = new Map<string, number>();
  for (let i = 0; i < ids.length; i++) {
    const id = ids[i];
    if (id === null || id.trim() === '') continue;
    const first = seen.get(id);
    if (first !== undefined) throw new Error(duplicateCellId(rows.file, id, rows.lines[first], rows.lines[i]));
    seen.set(id, i);
  }
}

/**
 * Harmonise one cell file: duplicate cell ids (an error), fill values, position range and longitude, negative depth,
 * units to canonical (contents and carbon to mol/cell, pg C via 12.011 g/mol, IUPAC; biovolume µm³; dimensions µm)
 * and positions on land. Below-detection and non-positive contents are left as loaded (NaN with `<el>_below_dl`) for the
 * quotas stage. Rows in = rows out + 'excluded' rows.
 */
export function harmoniseCells(table: aq.ColumnTable, options: CellHarmoniseOptions, ledger: Ledger): HarmoniseResult {
  const file = options.file;
  const tableName = options.table ?? 'cells';
  const n = table.numRows();
  const rows = new RowLedger(ledger, tableName, file, sourceLines(table, file));
  const conversions = resolveConversions(options.units, file, FOLLOWERS);
  requireStatedUnits(table.columnNames(), (c) => (table.array(c) as ArrayLike<unknown>).length > 0 && Array.from(table.array(c) as ArrayLike<unknown>).some((v) => typeof v === 'number' && Number.isFinite(v)), conversions, file);
  const names = table.columnNames();
  checkDuplicateIds(textColumn(table, 'cell_id'), rows);

  const num: Record<string, Float64Array> = {};
  for (const c of NUMERIC) if (names.includes(c)) num[c] = numberColumn(table, c);
  replaceFillValues(num, options.fillValues ?? DEFAULT_FILL_VALUES, rows);
  const nan = new Float64Array(n).fill(NaN);
  const lat = num.lat ?? nan.slice(), lon = num.lon ?? nan.slice();
  // Cells usually take their station's position in the match stage, which ledgers the ones it cannot place.
  checkPositionRange(lat, lon, rows, false);
  const depthConv = conversions.get('depth');
  if (num.depth && depthConv && !isIdentity(depthConv)) for (let i = 0; i < n; i++) num.depth[i] *= depthConv.factor;
  if (num.depth) checkNegativeDepth(num.depth, rows);
  if (options.landCheck ?? true) checkOnLand(lat, lon, rows, options.coastToleranceKm ?? 10, options.landResolution ?? '50m');
  const kept = rows.kept();

  const counts: ConversionCount[] = [];
  for (const [c, conv] of conversions) {
    if (isIdentity(conv) || !num[c]) continue;
    let converted = 0;
    for (const i of kept) {
      if (!Number.isFinite(num[c][i])) continue;
      if (c !== 'depth') num[c][i] *= conv.factor;
      converted++;
    }
    counts.push({ column: c, from: conv.from, to: conv.to, method: conv.viaMolarMass ? 'molar-mass' : 'factor', rows: converted });
  }

  return {
    table: keptTable(table, names, num, kept),
    summary: {
      table: tableName,
      file,
      rowsIn: n,
      rowsOut: kept.length,
      excluded: n - kept.length,
      conversions: sortConversions(counts),
      belowDetectionSubstituted: 0,
    },
  };
}
