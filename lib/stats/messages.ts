/** User-facing messages of the statistics library; tests assert the exact text. */

/** Two inputs that must pair up have different lengths. */
export function lengthMismatch(a: string, na: number, b: string, nb: number): string {
  return `${a} has ${na} values but ${b} has ${nb}; they must pair up`;
}

/** Too few points for an estimator. */
export function tooFewPoints(what: string, needed: number, got: number): string {
  return `${what} needs at least ${needed} points, got ${got}`;
}

/** A confidence level outside (0, 1). */
export function badLevel(level: number): string {
  return `confidence level must lie strictly between 0 and 1, got ${level}`;
}

/** A non-finite or non-positive value where a positive one is needed. */
export function notPositive(what: string, value: number): string {
  return `${what} must be a positive finite number, got ${value}`;
}

/** Iterations stopped before the convergence criterion was met. */
export function iterationLimit(what: string, iterations: number): string {
  return `${what} did not converge within ${iterations} iterations`;
}

/** The nonlinear fit produced non-finite parameters. */
export function nonFiniteFit(what: string): string {
  return `${what} produced non-finite parameters`;
}

/** A fitted parameter that must be positive is not. */
export function nonPositiveParameter(what: string, name: string, value: number): string {
  return `${what} gave ${name} = ${value}, which must be positive`;
}

/** The normal-equations matrix cannot be inverted. */
export function singularMatrix(what: string): string {
  return `${what}: the design is singular (parameters not identifiable from these data)`;
}

/** The groups of an ANCOVA are too few or too small. */
export function ancovaGroups(groups: number): string {
  return `the comparison of slopes needs at least 2 groups of at least 3 points each, got ${groups} usable groups`;
}

/** A group index outside 0..groups−1 or negative. */
export function badGroupIndex(row: number, value: number): string {
  return `group index of row ${row} is ${value}; group indices must be integers from 0`;
}

/** A fitted parameter stopped at its lower bound, so the optimum lies outside the allowed range. */
export function atBound(what: string, name: string, value: number): string {
  return `${what} drove ${name} to its lower bound (${value}): the data show no saturation in range`;
}
