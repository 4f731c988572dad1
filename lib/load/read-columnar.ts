// Parquet (hyparquet) and Arrow IPC (apache-arrow) tables into the same canonical columns as CSV, with the same column maps.
import { DataType, tableFromIPC } from 'apache-arrow';
import { parquetReadObjects } from 'hyparquet';
import type { Ledger } from '../ledger/index.js';
import type { InputBytes, Problem } from '../types.js';
import * as msg from './messages.js';
import { tableFromRecords, type RawRecord, type ReadTableOptions, type ReadTableResult } from './read-table.js';

/** A decoded columnar file: column names and each row's values as text (numbers in shortest round-trip form, times as ISO 8601). */
export interface ColumnarText {
  /** File name. */
  name: string;
  /** Column names in file order. */
  header: string[];
  /** Rows as text fields; row r carries line r + 2 so row numbers read like a CSV with a header. */
  records: RawRecord[];
}

/** True for the columnar file names basinquota reads (.parquet, .arrow, .arrows, .feather). */
export function isColumnarFile(name: string): boolean {
  return /\.(parquet|arrow|arrows|feather)$/i.test(name);
}

/** Decode a Parquet or Arrow IPC file into text records; a file that does not decode gives a Problem. */
export async function decodeColumnar(input: InputBytes): Promise<ColumnarText | Problem> {
  const parquet = /\.parquet$/i.test(input.name);
  try {
    const columns = parquet ? await parquetColumns(input.bytes) : arrowColumns(input.bytes);
    const header = Object.keys(columns);
    const n = header.length ? columns[header[0]].length : 0;
    const records: RawRecord[] = new Array(n);
    for (let r = 0; r < n; r++) records[r] = { fields: header.map((h) => fieldText(columns[h][r])), line: r + 2 };
    return { name: input.name, header, records };
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return { file: input.name, line: 0, col: 0, severity: 'error', message: msg.columnarUnreadable(parquet ? 'Parquet' : 'Arrow IPC', detail) };
  }
}

/** Read a decoded columnar file through the same typed parsing and ledger as CSV. */
export function readColumnar(input: ColumnarText, options: ReadTableOptions, ledger: Ledger): ReadTableResult {
  return tableFromRecords(input.name, input.header, input.records, options, ledger);
}

async function parquetColumns(bytes: Uint8Array): Promise<Record<string, unknown[]>> {
  const buffer = bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
  const rows = (await parquetReadObjects({ file: buffer })) as Record<string, unknown>[];
  const columns: Record<string, unknown[]> = {};
  for (const row of rows) for (const [k, v] of Object.entries(row)) (columns[k] ??= []).push(v);
  return columns;
}

function arrowColumns(bytes: Uint8Array): Record<string, unknown[]> {
  const table = tableFromIPC(bytes);
  const columns: Record<string, unknown[]> = {};
  for (const field of table.schema.fields) {
    const vector = table.getChild(field.name);
    const values: unknown[] = [];
    // Arrow timestamps and dates come back as epoch milliseconds: make them Dates so they print as ISO 8601.
    const isTime = DataType.isTimestamp(field.type) || DataType.isDate(field.type);
    if (vector) for (let i = 0; i < vector.length; i++) {
      const v = vector.get(i) as unknown;
      values.push(isTime && v !== null && v !== undefined ? new Date(Number(v)) : v);
    }
    columns[field.name] = values;
  }
  return columns;
}

/** One value as the text a CSV would hold. */
function fieldText(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isNaN(value) ? '' : String(value);
  if (typeof value === 'bigint') return String(Number(value));
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  if (typeof value === 'string') return value;
  throw new Error(`a value of type ${Object.prototype.toString.call(value)} cannot be read as a number, text or time`);
}
