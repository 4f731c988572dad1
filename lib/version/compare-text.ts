// Sorting that gives the same order on every machine.

/** Code-unit order of two strings, independent of the locale (localeCompare is not). */
export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
