// Every user-facing message of the load stage; tests assert the exact text.

/** An input file with no bytes. */
export const emptyFile = (): string => 'file is empty; expected a header line naming the columns';

/** A header with no data rows (a warning). */
export const headerOnly = (): string => 'file has a header but no data rows';

/** Bytes that are not UTF-8. */
export const invalidUtf8 = (byte: number): string => `invalid UTF-8 at byte ${byte}; save the file as UTF-8`;

/** The same header twice. */
export const duplicateHeader = (name: string, firstCol: number): string => `duplicate column header "${name}" (first at column ${firstCol})`;

/** A required column absent from the header. */
export const missingColumn = (canonical: string, header: string, available: string[]): string =>
  `missing required column "${header}"${header !== canonical ? ` (mapped to ${canonical})` : ''}; the header has: ${available.join(', ')}`;

/** A header that looks split by another delimiter. */
export const wrongDelimiter = (expected: string, seen: string): string =>
  `the header has a single column but contains ${describeDelimiter(seen)}: expected fields separated by ${describeDelimiter(expected)} (set "delimiter" in the config)`;

/** A column mapped in the config but absent in the file. */
export const mappedColumnAbsent = (canonical: string, header: string): string => `column "${header}" (mapped to ${canonical}) is not in the header`;

/** A row with a different number of fields than the header. */
export const raggedRow = (expected: number, found: number): string => `expected ${expected} fields as in the header, found ${found}`;

/** Text where a number was expected. */
export const notANumber = (header: string, canonical: string, value: string): string => {
  const hint = /^[+-]?\d{1,3}(,\d{3})+(\.\d+)?$/.test(value)
    ? ' (thousands separators are not accepted)'
    : /^[+-]?\d+,\d+$/.test(value)
      ? ' (use a decimal point, not a decimal comma)'
      : '';
  return `column "${header}" (${canonical}): "${truncate(value)}" is not a number${hint}`;
};

/** A time that is not ISO 8601 or not a real date. */
export const badTime = (header: string, value: string): string =>
  `column "${header}" (time): "${truncate(value)}" is not an ISO 8601 date or date-time (e.g. 2024-03-17 or 2024-03-17T06:30:00Z)`;

/** A date-time without a zone, read as UTC. */
export const timeWithoutZone = (header: string, value: string): string => `column "${header}" (time): "${value}" has no time zone; read as UTC`;

/** CSV structure the parser cannot read (unclosed quote …). */
export const csvSyntax = (detail: string): string => `CSV syntax error: ${detail}`;

/** A file-level cruise and a cruise column that disagree. */
export const cruiseMismatch = (configCruise: string, rowCruise: string): string =>
  `cruise "${rowCruise}" differs from the file's configured cruise "${configCruise}"`;

/** A record longer than the loader accepts (a runaway quote or an enormous field). */
export const recordTooLong = (limit: number): string =>
  `a record is longer than ${limit} characters (an unclosed quote, or a field far too long for a data value)`;

/** A columnar file (Parquet, Arrow) the reader cannot decode. */
export const columnarUnreadable = (format: string, detail: string): string => `not a readable ${format} file (${detail})`;

/** A columnar column of a type basinquota cannot take. */
export const columnarType = (column: string, type: string): string => `column "${column}" has type ${type}; expected numbers, text or timestamps`;

function describeDelimiter(d: string): string {
  return d === '\t' ? 'tabs' : d === ',' ? 'commas' : d === ';' ? 'semicolons' : d === '|' ? 'pipes' : `"${d}"`;
}

function truncate(value: string): string {
  return value.length > 40 ? `${value.slice(0, 40)}…` : value;
}
