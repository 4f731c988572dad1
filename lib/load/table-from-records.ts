// The typed-parsing core shared by delimited and columnar inputs: header check, column map, typed values, ledger.
import * as aq from 'arquero';
import type { Ledger } from '../ledger/index.js';
import type { Problem } from '../types.js';
import { CELL_COLUMNS, ELEMENTS, SAMPLE_COLUMNS, SAMPLE_QUANTITIES, type ColumnKind } from './canonical.js';
import * as msg from './messages.js';
import { parseNumberField, parsePlainDecimal } from './parse-number.js';
import { parseIsoTime } from './parse-time.js';
import type { ReadTableOptions, ReadTableResult, TableName } from './read-table.js';

/** One data record as text fields with its physical line (or row number for columnar files). */
export interface RawRecord {
  /** Field texts in header order. */
  fields: string[];
  /** Physical line in the file (header = 1), or 1-based row number + 1 for columnar files. */
  line: number;
}

/** Data records visited one at a time, so a reader need not keep every row's fields alive at once. */
export interface RecordStream {
  /** Header fields, untrimmed. */
  header: string[];
  /** Call `visit` with each data record's fields and physical line, in file order. */
  forEach(visit: (fields: string[], line: number) => void): void;
  /** At least the number of data records (sizes the numeric columns up front). */
  size: number;
}

/** Canonical columns each table needs; `depth|pressure` means either. */
const REQUIRED: Record<TableName, string[]> = {
  samples: ['cruise', 'station', 'lat', 'lon', 'depth|pressure'],
  cells: ['cell_id', 'cruise', 'station', 'depth', 'phyto_class', 'fe'],
};

/** Columns whose fields may carry below-detection markers. */
const CENSORABLE = new Set<string>([...SAMPLE_QUANTITIES, ...ELEMENTS]);

const TEXT = 0;
const NUMBER = 1;
const TIME = 2;

/** A result with no rows and one file-level error at `line:col`. */
export function emptyResult(file: string, line: number, col: number, message: string): ReadTableResult {
  return { table: aq.table({}), rowsRead: 0, problems: [{ file, line, col, message, severity: 'error' }] };
}

/** The typed-parsing core shared by delimited and columnar inputs: header check, column map, typed values, ledger. */
export function tableFromRecords(file: string, rawHeader: string[], records: RawRecord[], options: ReadTableOptions, ledger: Ledger): ReadTableResult {
  const stream: RecordStream = {
    header: rawHeader,
    size: records.length,
    forEach(visit) {
      for (const r of records) visit(r.fields, r.line);
    },
  };
  return tableFromStream(file, stream, options, ledger);
}

/** tableFromRecords over a record stream: the same header checks, typed columns and ledger rows. */
export function tableFromStream(file: string, records: RecordStream, options: ReadTableOptions, ledger: Ledger): ReadTableResult {
  const rawHeader = records.header;
  const problems: Problem[] = [];
  const fail = (line: number, col: number, message: string): ReadTableResult => emptyResult(file, line, col, message);
  const delimiter = options.delimiter ?? ',';
  const header = rawHeader.map((h) => h.trim());
  const seen = new Map<string, number>();
  for (let i = 0; i < header.length; i++) {
    const first = seen.get(header[i]);
    if (first !== undefined) return fail(1, i + 1, msg.duplicateHeader(header[i], first + 1));
    seen.set(header[i], i);
  }
  if (header.length === 1) {
    const other = [',', '\t', ';', '|'].find((d) => d !== delimiter && header[0].includes(d));
    if (other) return fail(1, 1, msg.wrongDelimiter(delimiter, other));
  }
  const known: Record<string, ColumnKind> = options.table === 'samples' ? SAMPLE_COLUMNS : CELL_COLUMNS;
  // Resolve canonical → field index: explicit map first, then headers that already use a canonical name.
  const index = new Map<string, number>();
  for (const [canonical, head] of Object.entries(options.columns)) {
    const at = seen.get(head);
    if (at === undefined) return fail(1, 1, msg.mappedColumnAbsent(canonical, head));
    index.set(canonical, at);
  }
  const mappedHeaders = new Set(Object.values(options.columns));
  for (const canonical of Object.keys(known)) {
    const at = seen.get(canonical);
    if (!index.has(canonical) && at !== undefined && !mappedHeaders.has(canonical)) index.set(canonical, at);
  }
  for (const need of REQUIRED[options.table]) {
    const alternatives = need.split('|');
    if (alternatives.some((c) => index.has(c))) continue;
    if (need === 'cruise' && options.cruise) continue;
    const canonical = alternatives[0];
    return fail(1, 1, msg.missingColumn(canonical, options.columns[canonical] ?? canonical, header));
  }
  const names = [...index.keys()];
  const censored = names.filter((n) => CENSORABLE.has(n));
  if (options.table === 'samples') for (const q of SAMPLE_QUANTITIES) if (!censored.includes(q)) censored.push(q);
  // Per canonical column, resolved once: where its field is, how it is typed, and which censored slot it feeds.
  const at = names.map((name) => index.get(name)!);
  const kinds = names.map((name) => ((known[name] ?? 'text') === 'text' ? TEXT : known[name] === 'number' ? NUMBER : TIME));
  const slot = names.map((name) => censored.indexOf(name));
  const out: unknown[][] = names.map(() => []);
  const numberCols = names.map((_, c) => c).filter((c) => kinds[c] !== TEXT);
  const textCols = names.map((_, c) => c).filter((c) => kinds[c] === TEXT);
  // Numeric columns are written in place into arrays sized for every record, then cut to the rows kept.
  const numberOut = numberCols.map(() => new Float64Array(records.size));
  const textOut = textCols.map((c) => out[c] as (string | null)[]);
  const belowOut: boolean[][] = censored.map(() => []);
  const dlOut: number[][] = censored.map(() => []);
  const dlRead = censored.map((q) => (index.has(`${q}_dl`) ? numberCols.indexOf(names.indexOf(`${q}_dl`)) : -1));
  let kept = 0;
  const fillCruise = !index.has('cruise') && options.cruise !== undefined;
  const cruiseOut: unknown[] = [];
  const sourceLine: number[] = [];
  let rowsRead = 0;
  const width = header.length;
  const nCols = names.length;
  const nCensored = censored.length;
  // Numbers and texts of the current row kept apart, so numbers stay unboxed.
  const rowNumber = new Float64Array(nCols);
  const rowText: (string | null)[] = new Array<string | null>(nCols).fill(null);
  const below: boolean[] = new Array<boolean>(nCensored).fill(false);
  const limits = new Float64Array(nCensored);
  const table = options.table;
  const exclude = (line: number, reason: string, detail: string): void => ledger.add({ table, file, line, stage: 'load', action: 'excluded', reason, detail });
  records.forEach((record, line) => {
    rowsRead++;
    if (record.length !== width) {
      exclude(line, 'ragged-row', msg.raggedRow(width, record.length));
      return;
    }
    below.fill(false);
    limits.fill(NaN);
    for (let c = 0; c < nCols; c++) {
      const raw = record[at[c]];
      const kind = kinds[c];
      if (kind === NUMBER) {
        const quick = parsePlainDecimal(raw);
        if (!Number.isNaN(quick)) {
          rowNumber[c] = quick;
          continue;
        }
        const k = slot[c];
        const field = parseNumberField(raw, k >= 0);
        if (field.kind === 'invalid') {
          exclude(line, 'not-a-number', msg.notANumber(header[at[c]], names[c], raw.trim()));
          return;
        }
        if (field.kind === 'below') {
          rowNumber[c] = NaN;
          below[k] = true;
          limits[k] = field.limit;
        } else rowNumber[c] = field.kind === 'number' ? field.value : NaN;
      } else if (kind === TEXT) {
        const t = raw.trim();
        rowText[c] = t === '' ? null : t;
      } else {
        const t = raw.trim();
        if (t === '') rowNumber[c] = NaN;
        else {
          const parsed = parseIsoTime(t);
          if (Number.isNaN(parsed.ms)) {
            exclude(line, 'bad-time', msg.badTime(header[at[c]], t));
            return;
          }
          rowNumber[c] = parsed.ms;
          if (parsed.zoneless) ledger.add({ table, file, line, stage: 'load', action: 'flagged', reason: 'time-without-zone', detail: msg.timeWithoutZone(header[at[c]], t) });
        }
      }
    }
    // Separate push sites for number and text columns keep each one monomorphic.
    for (let i = 0; i < numberCols.length; i++) numberOut[i][kept] = rowNumber[numberCols[i]];
    for (let i = 0; i < textCols.length; i++) textOut[i].push(rowText[textCols[i]]);
    for (let k = 0; k < nCensored; k++) {
      belowOut[k].push(below[k]);
      const read = dlRead[k];
      if (read >= 0) {
        // A written limit column wins; a limit given in the marker ("<0.05") fills it only where it is empty.
        const column = numberOut[read];
        if (below[k] && Number.isNaN(column[kept]) && !Number.isNaN(limits[k])) column[kept] = limits[k];
      } else dlOut[k].push(limits[k]);
    }
    if (fillCruise) cruiseOut.push(options.cruise);
    sourceLine.push(line);
    kept++;
  });
  if (rowsRead === 0) problems.push({ file, line: 1, col: 1, message: msg.headerOnly(), severity: 'warning' });
  // Column order as before: canonical columns, then per censored quantity its flag and (unless read) its limit.
  const columns: Record<string, unknown[]> = {};
  for (let c = 0; c < nCols; c++) columns[names[c]] = out[c];
  numberCols.forEach((c, i) => (columns[names[c]] = numberOut[i].slice(0, kept) as unknown as unknown[]));
  for (let k = 0; k < nCensored; k++) {
    columns[`${censored[k]}_below_dl`] = belowOut[k];
    if (dlRead[k] < 0) columns[`${censored[k]}_dl`] = dlOut[k];
  }
  if (fillCruise) columns.cruise = cruiseOut;
  columns.source_file = new Array(sourceLine.length).fill(file);
  columns.source_line = sourceLine;
  return { table: aq.table(columns), rowsRead, problems };
}
