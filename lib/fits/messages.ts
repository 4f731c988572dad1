/** User-facing messages of the fits stage; tests assert the exact text. */

/** A cell whose dFe or Fe:C is not usable on log axes. */
export function unusableValue(what: 'dFe' | 'Fe:C', value: number): string {
  return `${what} is ${value}; a positive finite value is needed for a log–log fit, so the cell is not fitted`;
}

/** A class with too few cells. */
export function tooFewCells(n: number, minCells: number): string {
  return `too few cells (${n} < ${minCells})`;
}

/** York needs Fe:C uncertainties. */
export function noFeCSigma(): string {
  return 'no finite Fe:C uncertainties in this class, so York regression is not fitted';
}

/** York needs a dFe uncertainty. */
export function zeroDFeSigma(): string {
  return 'dFeRelativeSigma is 0: York regression needs an uncertainty in dFe (use ols with inverse-variance weighting instead)';
}

/** Some Fe:C uncertainties were missing and were filled in. */
export function imputedSigmas(count: number): string {
  return `${count} cells had no Fe:C uncertainty and were given the class median σ(log10 Fe:C)`;
}

/** The configured primary model could not be fitted. */
export function primaryFallback(wanted: string, used: string): string {
  return `${wanted} was requested as primary but was not fitted; ${used} is used instead`;
}

/** Input columns of different lengths. */
export function columnLengths(column: string, n: number, expected: number): string {
  return `fit input column ${column} has ${n} entries, expected ${expected}`;
}

/** An option out of range. */
export function badOption(name: string, value: unknown, expected: string): string {
  return `fits option ${name} is ${String(value)}; expected ${expected}`;
}

/** No model could be fitted for a class. */
export function noModelFitted(): string {
  return 'no model could be fitted';
}

/** ANCOVA not possible. */
export function tooFewClasses(n: number): string {
  return `class comparison needs at least 2 fitted classes, got ${n}`;
}
