// Delimited text (CSV/TSV) to an Arquero table with canonical columns, typed values and provenance.
import * as aq from 'arquero';
import { parse } from 'csv-parse/sync';
import type { Ledger } from '../ledger/index.js';
import type { InputText, Problem } from '../types.js';
import { CELL_COLUMNS, ELEMENTS, SAMPLE_COLUMNS, SAMPLE_QUANTITIES, type ColumnKind } from './canonical.js';
import * as msg from './messages.js';
import { parseNumberField } from './parse-number.js';
import { parseIsoTime } from './parse-time.js';

/** Which logical table a file feeds. */
export type TableName = 'samples' | 'cells';

/** How to read one delimited file. */
export interface ReadTableOptions {
  /** Logical table the file feeds. */
  table: TableName;
  /** Canonical column name → header in the file; canonical names present as headers map themselves. */
  columns: Record<string, string>;
  /** Field delimiter; default "," (or tab for names ending in .tsv/.tab). */
  delimiter?: string;
  /** Cruise for every row when the file has no cruise column. */
  cruise?: string;
  /** Longest field accepted, in characters; default 100 000. */
  maxFieldLength?: number;
}

/** A read file: the table (canonical columns + source_file, source_line), rows read, and problems that stop the build. */
export interface ReadTableResult {
  /** Rows that parsed, in file order. */
  table: aq.ColumnTable;
  /** Data records read (header excluded). */
  rowsRead: number;
  /** File-level errors (missing columns, syntax) and warnings. */
  problems: Problem[];
}

/** Canonical columns each table needs; `depth|pressure` means either. */
const REQUIRED: Record<TableName, string[]> = {
  samples: ['cruise', 'station', 'lat', 'lon', 'depth|pressure'],
  cells: ['cell_id', 'cruise', 'station', 'depth', 'phyto_class', 'fe'],
};

/** Columns whose fields may carry below-detection markers. */
const CENSORABLE = new Set<string>([...SAMPLE_QUANTITIES, ...ELEMENTS]);

/** Parse one delimited file into canonical typed columns; bad rows go to the ledger, file-level faults to problems. */
export function readTable(input: InputText, options: ReadTableOptions, ledger: Ledger): ReadTableResult {
  const file = input.name;
  const problems: Problem[] = [];
  const fail = (line: number, col: number, message: string): ReadTableResult => {
    problems.push({ file, line, col, message, severity: 'error' });
    return { table: aq.table({}), rowsRead: 0, problems };
  };
  if (input.text.replace(/^\uFEFF/, '').trim() === '') return fail(1, 1, msg.emptyFile());
  const delimiter = options.delimiter ?? (/\.(tsv|tab)$/i.test(file) ? '\t' : ',');
  let records: { record: string[]; info: { lines: number; empty_lines: number } }[];
  try {
    records = parse(input.text, {
      bom: true,
      delimiter,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      record_delimiter: ['\r\n', '\n', '\r'],
      max_record_size: options.maxFieldLength ?? 100_000,
    }) as unknown as typeof records;
  } catch (error) {
    const e = error as { lines?: number; message?: string; code?: string };
    const detail = e.code === 'CSV_MAX_RECORD_SIZE' ? msg.recordTooLong(options.maxFieldLength ?? 100_000) : msg.csvSyntax(String(e.message ?? error).split('\n')[0]);
    return fail(e.lines ?? 0, 0, detail);
  }
  const header = records[0].record.map((h) => h.trim());
  const rows: RawRecord[] = [];
  let prevLines = records[0].info.lines;
  let prevEmpty = records[0].info.empty_lines;
  for (let r = 1; r < records.length; r++) {
    const { record, info } = records[r];
    rows.push({ fields: record, line: prevLines + 1 + (info.empty_lines - prevEmpty) });
    prevLines = info.lines;
    prevEmpty = info.empty_lines;
  }
  return tableFromRecords(file, header, rows, { ...options, delimiter }, ledger);
}

/** One data record as text fields with its physical line (or row number for columnar files). */
export interface RawRecord {
  /** Field texts in header order. */
  fields: string[];
  /** Physical line in the file (header = 1), or 1-based row number + 1 for columnar files. */
  line: number;
}

/** The typed-parsing core shared by delimited and columnar inputs: header check, column map, typed values, ledger. */
export function tableFromRecords(file: string, rawHeader: string[], records: RawRecord[], options: ReadTableOptions, ledger: Ledger): ReadTableResult {
  const problems: Problem[] = [];
  const fail = (line: number, col: number, message: string): ReadTableResult => {
    problems.push({ file, line, col, message, severity: 'error' });
    return { table: aq.table({}), rowsRead: 0, problems };
  };
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
  const columns: Record<string, unknown[]> = {};
  for (const name of names) columns[name] = [];
  const censored = names.filter((n) => CENSORABLE.has(n));
  if (options.table === 'samples') for (const q of SAMPLE_QUANTITIES) if (!censored.includes(q)) censored.push(q);
  for (const q of censored) {
    columns[`${q}_below_dl`] = [];
    if (!(`${q}_dl` in columns)) columns[`${q}_dl`] = [];
  }
  const fillCruise = !index.has('cruise') && options.cruise !== undefined;
  if (fillCruise) columns.cruise = [];
  const sourceLine: number[] = [];
  const rowsRead = records.length;
  const row: unknown[] = new Array(names.length);
  const below: boolean[] = new Array(censored.length);
  const limits: number[] = new Array(censored.length);
  for (const { fields: record, line } of records) {
    const exclude = (reason: string, detail: string): void => ledger.add({ table: options.table, file, line, stage: 'load', action: 'excluded', reason, detail });
    if (record.length !== header.length) {
      exclude('ragged-row', msg.raggedRow(header.length, record.length));
      continue;
    }
    let bad = false;
    below.fill(false);
    limits.fill(NaN);
    for (let c = 0; c < names.length && !bad; c++) {
      const name = names[c];
      const raw = record[index.get(name)!];
      const kind = known[name] ?? 'text';
      if (kind === 'text') {
        const t = raw.trim();
        row[c] = t === '' ? null : t;
      } else if (kind === 'number') {
        const k = censored.indexOf(name);
        const field = parseNumberField(raw, k >= 0);
        if (field.kind === 'invalid') {
          exclude('not-a-number', msg.notANumber(header[index.get(name)!], name, raw.trim()));
          bad = true;
        } else if (field.kind === 'below') {
          row[c] = NaN;
          below[k] = true;
          limits[k] = field.limit;
        } else row[c] = field.kind === 'number' ? field.value : NaN;
      } else {
        const t = raw.trim();
        if (t === '') row[c] = NaN;
        else {
          const parsed = parseIsoTime(t);
          if (Number.isNaN(parsed.ms)) {
            exclude('bad-time', msg.badTime(header[index.get(name)!], t));
            bad = true;
          } else {
            row[c] = parsed.ms;
            if (parsed.zoneless) ledger.add({ table: options.table, file, line, stage: 'load', action: 'flagged', reason: 'time-without-zone', detail: msg.timeWithoutZone(header[index.get(name)!], t) });
          }
        }
      }
    }
    if (bad) continue;
    for (let c = 0; c < names.length; c++) columns[names[c]].push(row[c]);
    for (let k = 0; k < censored.length; k++) {
      const q = censored[k];
      columns[`${q}_below_dl`].push(below[k]);
      const dlColumn = columns[`${q}_dl`];
      if (index.has(`${q}_dl`)) {
        const last = dlColumn.length - 1;
        if (below[k] && Number.isNaN(dlColumn[last] as number) && !Number.isNaN(limits[k])) dlColumn[last] = limits[k];
      } else dlColumn.push(limits[k]);
    }
    if (fillCruise) columns.cruise.push(options.cruise);
    sourceLine.push(line);
  }
  if (rowsRead === 0) problems.push({ file, line: 1, col: 1, message: msg.headerOnly(), severity: 'warning' });
  columns.source_file = new Array(sourceLine.length).fill(file);
  columns.source_line = sourceLine;
  return { table: aq.table(columns), rowsRead, problems };
}
