// Arquero tables to bytes and back, exactly: numbers keep NaN and -0, texts, nulls and booleans keep their types.
import * as aq from 'arquero';

/**
 * How one column is stored: 'f64' a Float64Array and 'num' a plain array of numbers (raw doubles), 'text' strings
 * and nulls (a JSON dictionary of distinct strings, then one int32 code per row, -1 for null), 'bool' booleans (one
 * byte per row), 'json' anything else (with non-finite numbers, -0 and undefined tagged).
 */
type ColumnKind = 'f64' | 'num' | 'text' | 'bool' | 'json';

/** Where one column's bytes sit in the blob. */
export interface ColumnHeader {
  /** Column name. */
  name: string;
  /** Storage kind. */
  kind: ColumnKind;
  /** Byte offset in the blob. */
  offset: number;
  /** Byte length. */
  length: number;
}

/** A table's layout in a blob. */
export interface TableHeader {
  /** Rows. */
  numRows: number;
  /** Columns in table order. */
  columns: ColumnHeader[];
}

/** A table encoded: its header (JSON-able) and its bytes, each column 8-byte aligned. */
export interface EncodedTable {
  /** Layout. */
  header: TableHeader;
  /** Column bytes. */
  chunks: Uint8Array[];
}

/** A JSON value standing for a value JSON cannot hold: a non-finite number, negative zero or undefined. */
const replacer = (_key: string, value: unknown): unknown => {
  if (typeof value === 'number' && (!Number.isFinite(value) || Object.is(value, -0))) return { n: Object.is(value, -0) ? '-0' : String(value) };
  if (value === undefined) return { u: 1 };
  return value;
};

const reviver = (_key: string, value: unknown): unknown => {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const tagged = value as { n?: string; u?: number };
    return tagged.n !== undefined ? Number(tagged.n) : undefined;
  }
  return value;
};

/** Encode a table whose columns are Float64Arrays or plain arrays of numbers, strings, booleans and nulls; throws on anything else (the caller then does not cache). */
export function encodeTable(table: aq.ColumnTable, startOffset: number): EncodedTable {
  const columns: ColumnHeader[] = [];
  const chunks: Uint8Array[] = [];
  let offset = startOffset;
  for (const name of table.columnNames()) {
    // The column's own storage when the table is neither filtered nor ordered (array() would copy into a plain Array).
    const values = (table.isFiltered() || table.isOrdered() ? table.array(name) : table.column(name)) as unknown;
    let kind: ColumnKind;
    let bytes: Uint8Array;
    if (values instanceof Float64Array) {
      kind = 'f64';
      bytes = new Uint8Array(values.buffer.slice(values.byteOffset, values.byteOffset + values.byteLength));
    } else if (Array.isArray(values)) {
      if (values.every((v) => typeof v === 'number')) {
        kind = 'num';
        bytes = new Uint8Array(Float64Array.from(values as number[]).buffer);
      } else if (values.every((v) => typeof v === 'boolean')) {
        kind = 'bool';
        bytes = Uint8Array.from(values as boolean[], (v) => (v ? 1 : 0));
      } else if (values.every((v) => v === null || typeof v === 'string')) {
        kind = 'text';
        bytes = encodeText(values as (string | null)[]);
      } else {
        const odd = values.find((v) => v !== null && v !== undefined && typeof v !== 'string' && typeof v !== 'number' && typeof v !== 'boolean');
        if (odd !== undefined) throw new Error(`cannot cache column ${name}: a value of type ${Object.prototype.toString.call(odd)}`);
        kind = 'json';
        bytes = new TextEncoder().encode(JSON.stringify(values, replacer));
      }
    } else throw new Error(`cannot cache column ${name}: ${Object.prototype.toString.call(values)}`);
    const pad = (8 - (offset % 8)) % 8;
    if (pad) chunks.push(new Uint8Array(pad));
    offset += pad;
    columns.push({ name, kind, offset, length: bytes.length });
    chunks.push(bytes);
    offset += bytes.length;
  }
  return { header: { numRows: table.numRows(), columns }, chunks };
}

/** Decode a table from its header and the blob holding its columns; throws when the layout does not fit the blob. */
export function decodeTable(header: TableHeader, blob: Uint8Array): aq.ColumnTable {
  const columns: Record<string, unknown> = {};
  for (const c of header.columns) {
    if (c.offset < 0 || c.length < 0 || c.offset + c.length > blob.length) throw new Error(`column ${c.name} lies outside the entry`);
    const bytes = blob.subarray(c.offset, c.offset + c.length);
    let values: ArrayLike<unknown>;
    if (c.kind === 'f64' || c.kind === 'num') {
      if (c.length !== header.numRows * 8) throw new Error(`column ${c.name} has ${c.length} bytes for ${header.numRows} rows`);
      // Copy into a fresh, aligned buffer (the blob may sit at any offset of a pooled Buffer).
      const copy = new Uint8Array(c.length);
      copy.set(bytes);
      const numbers = new Float64Array(copy.buffer);
      if (c.kind === 'f64') values = numbers;
      else {
        const plain = new Array<number>(numbers.length);
        for (let i = 0; i < numbers.length; i++) plain[i] = numbers[i];
        values = plain;
      }
    } else if (c.kind === 'bool') {
      if (c.length !== header.numRows) throw new Error(`column ${c.name} has ${c.length} bytes for ${header.numRows} rows`);
      const flags = new Array<boolean>(c.length);
      for (let i = 0; i < c.length; i++) flags[i] = bytes[i] === 1;
      values = flags;
    } else if (c.kind === 'text') {
      values = decodeText(bytes, header.numRows, c.name);
    } else if (c.kind === 'json') {
      const text = new TextDecoder().decode(bytes);
      // The reviver is slow and only needed for tagged values, which are the only objects in the array.
      const parsed = (text.includes('{') ? JSON.parse(text, reviver) : JSON.parse(text)) as unknown;
      if (!Array.isArray(parsed) || parsed.length !== header.numRows) throw new Error(`column ${c.name} does not hold ${header.numRows} values`);
      values = parsed as unknown[];
    } else throw new Error(`column ${String(c.name)} has an unknown kind`);
    columns[c.name] = values;
  }
  return aq.table(columns as Record<string, unknown[]>);
}

/** Strings and nulls as: 4-byte dictionary length, the JSON dictionary, padding to 4 bytes, one int32 code per row. */
function encodeText(values: (string | null)[]): Uint8Array {
  const codes = new Int32Array(values.length);
  const dictionary: string[] = [];
  const seen = new Map<string, number>();
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null) {
      codes[i] = -1;
      continue;
    }
    let code = seen.get(v);
    if (code === undefined) {
      code = dictionary.length;
      seen.set(v, code);
      dictionary.push(v);
    }
    codes[i] = code;
  }
  const dict = new TextEncoder().encode(JSON.stringify(dictionary));
  const start = 4 + dict.length + ((4 - (dict.length % 4)) % 4);
  const out = new Uint8Array(start + codes.byteLength);
  new DataView(out.buffer).setUint32(0, dict.length, true);
  out.set(dict, 4);
  out.set(new Uint8Array(codes.buffer), start);
  return out;
}

function decodeText(bytes: Uint8Array, numRows: number, name: string): (string | null)[] {
  if (bytes.length < 4) throw new Error(`column ${name} is truncated`);
  const dictLength = new DataView(bytes.buffer, bytes.byteOffset, 4).getUint32(0, true);
  const start = 4 + dictLength + ((4 - (dictLength % 4)) % 4);
  if (start + numRows * 4 !== bytes.length) throw new Error(`column ${name} has ${bytes.length} bytes for ${numRows} rows`);
  const dictionary = JSON.parse(new TextDecoder().decode(bytes.subarray(4, 4 + dictLength))) as string[];
  const copy = new Uint8Array(numRows * 4);
  copy.set(bytes.subarray(start));
  const codes = new Int32Array(copy.buffer);
  const out = new Array<string | null>(numRows);
  for (let i = 0; i < numRows; i++) {
    const code = codes[i];
    if (code >= dictionary.length) throw new Error(`column ${name} has a code outside its dictionary`);
    out[i] = code < 0 ? null : dictionary[code];
  }
  return out;
}
