/** User-facing messages of the quotas stage; tests assert the exact text. */

/** A raw class label that no configured class lists. */
export function unknownClass(label: string): string {
  return `phyto_class "${label}" matches no configured class or alias; cell excluded (classes are never guessed)`;
}

/** One alias claimed by two classes in the configuration. */
export function duplicateAlias(alias: string, first: string, second: string): string {
  return `class alias "${alias}" is listed for both "${first}" and "${second}"`;
}

/** A cell whose Fe content is zero or negative. */
export function nonPositiveContent(element: string, value: number): string {
  return `${element} content ${String(value)} mol/cell is not a positive number; cell excluded`;
}

/** A cell with no Fe content at all (empty, NA, a fill value or below detection). */
export function missingContent(element: string): string {
  return `${element} content is missing (empty, a fill value or below detection); cell excluded`;
}

/** A cell whose carbon could not be obtained by its class's method. */
export function noCarbon(method: string, why: string): string {
  return `no carbon by method ${method}: ${why}; cell excluded`;
}

/** A cell without a 1-sigma for its Fe content: ratios computed, their sigmas left empty. */
export function noSigma(element: string): string {
  return `${element}_sigma missing; ${element} ratios have no uncertainty`;
}

/** A carbon method that needs a column the cell table lacks or leaves empty. */
export function missingInput(what: string): string {
  return `${what} missing`;
}
