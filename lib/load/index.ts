export { readTable, type ReadTableOptions, type ReadTableResult, type TableName } from './read-table.js';
export { decodeUtf8 } from './decode.js';
export { parseIsoTime } from './parse-time.js';
export { parseNumberField } from './parse-number.js';
export { SAMPLE_COLUMNS, CELL_COLUMNS, ELEMENTS, SAMPLE_QUANTITIES, PROVENANCE_COLUMNS, type Element, type ColumnKind } from './canonical.js';
export { decodeColumnar, readColumnar, isColumnarFile, type ColumnarText } from './read-columnar.js';
export { tableFromRecords, type RawRecord } from './read-table.js';
