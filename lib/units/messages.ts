/** User-facing messages of the units library; tests assert the exact text. */

/** A unit string that the parser does not know. */
export function unknownUnit(unit: string, column: string): string {
  return `unknown unit "${unit}" for column ${column}`;
}

/** A unit that parses but measures something else than the column holds. */
export function wrongDimension(unit: string, column: string, expected: string): string {
  return `unit "${unit}" has the wrong dimension for ${column} (expected ${expected})`;
}

/** A column that has no canonical unit, so no unit may be configured for it. */
export function noCanonicalUnit(column: string): string {
  return `column ${column} takes no unit (it has no canonical unit)`;
}

/** Prefix a message with the input file it concerns. */
export function inFile(file: string, message: string): string {
  return `${file}: ${message}`;
}
