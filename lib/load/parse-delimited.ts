// Full RFC 4180 parsing of delimited text with csv-parse: quotes, embedded delimiters and line breaks.
import { parse } from 'csv-parse/sync';
import * as msg from './messages.js';
import type { RawRecord } from './table-from-records.js';

/** Header and data records of a delimited text. */
export interface SplitRecords {
  /** Header fields, untrimmed. */
  header: string[];
  /** Data records in file order, with physical lines. */
  records: RawRecord[];
}

/** Why a text could not be split into records: the message and the line csv-parse stopped at. */
export interface SplitFailure {
  /** User-facing message. */
  message: string;
  /** Line reported by csv-parse (0 when unknown). */
  line: number;
}

/** Split delimited text into a header and records with csv-parse (BOM dropped, empty lines skipped, ragged rows kept); physical lines count from 1. */
export function parseDelimited(text: string, delimiter: string, maxLength: number): SplitRecords | SplitFailure {
  let parsed: { record: string[]; info: { lines: number; empty_lines: number } }[];
  try {
    parsed = parse(text, {
      bom: true,
      delimiter,
      info: true,
      relax_column_count: true,
      skip_empty_lines: true,
      record_delimiter: ['\r\n', '\n', '\r'],
      max_record_size: maxLength,
    }) as unknown as typeof parsed;
  } catch (error) {
    const e = error as { lines?: number; message?: string; code?: string };
    const message = e.code === 'CSV_MAX_RECORD_SIZE' ? msg.recordTooLong(maxLength) : msg.csvSyntax(String(e.message ?? error).split('\n')[0]);
    return { message, line: e.lines ?? 0 };
  }
  const records: RawRecord[] = [];
  let prevLines = parsed[0].info.lines;
  let prevEmpty = parsed[0].info.empty_lines;
  // info.lines is the line a record ends on; the next record starts after it and after any empty lines skipped between.
  for (let r = 1; r < parsed.length; r++) {
    const { record, info } = parsed[r];
    records.push({ fields: record, line: prevLines + 1 + (info.empty_lines - prevEmpty) });
    prevLines = info.lines;
    prevEmpty = info.empty_lines;
  }
  return { header: parsed[0].record, records };
}
