// Delimited text (CSV/TSV) to an Arquero table with canonical columns, typed values and provenance.
import type * as aq from 'arquero';
import type { Ledger } from '../ledger/index.js';
import type { InputText, Problem } from '../types.js';
import * as msg from './messages.js';
import { parseDelimited } from './parse-delimited.js';
import { splitQuoteFree } from './split-quote-free.js';
import { emptyResult, tableFromStream, type RecordStream } from './table-from-records.js';

export { tableFromRecords, type RawRecord } from './table-from-records.js';

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

/** Which record splitter to use: 'auto' takes the quote-free shortcut when it applies; 'csv-parse' always uses the full parser. */
export type RecordSplitter = 'auto' | 'csv-parse';

/**
 * Parse one delimited file into canonical typed columns; bad rows go to the ledger, file-level faults to problems.
 * Text without a quote character is split by lines and delimiters (the same records as RFC 4180 gives, much faster);
 * anything else goes through csv-parse. `splitter` exists so tests can compare the two.
 */
export function readTable(input: InputText, options: ReadTableOptions, ledger: Ledger, splitter: RecordSplitter = 'auto'): ReadTableResult {
  const file = input.name;
  if (input.text.replace(/^\uFEFF/, '').trim() === '') return emptyResult(file, 1, 1, msg.emptyFile());
  const delimiter = options.delimiter ?? (/\.(tsv|tab)$/i.test(file) ? '\t' : ',');
  const maxLength = options.maxFieldLength ?? 100_000;
  let stream: RecordStream | null = splitter === 'auto' ? splitQuoteFree(input.text, delimiter, maxLength) : null;
  if (!stream) {
    const parsed = parseDelimited(input.text, delimiter, maxLength);
    if ('message' in parsed) return emptyResult(file, parsed.line, 0, parsed.message);
    const { header, records } = parsed;
    stream = { header, size: records.length, forEach: (visit) => records.forEach((r) => visit(r.fields, r.line)) };
  }
  return tableFromStream(file, stream, { ...options, delimiter }, ledger);
}
