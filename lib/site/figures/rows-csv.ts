// figureCsv for typed records (interfaces lack the index signature figureCsv's parameter asks for).
import { figureCsv, type CsvColumn, type CsvValue } from '../../figures/index.js';

/** CSV text of plain records whose fields are numbers, strings, booleans or null. */
export function rowsCsv(rows: readonly object[], columns: readonly CsvColumn[]): string {
  return figureCsv(rows as readonly Record<string, CsvValue>[], columns);
}
