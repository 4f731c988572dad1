/** Fixed number formatting for the demo files, so reruns give the same bytes. */

/** `x` with `digits` significant digits, in plain or exponent notation exactly as toPrecision writes it. */
export function sig(x: number, digits = 6): string {
  if (x === 0) return '0';
  return Number(x.toPrecision(digits)).toPrecision(digits);
}

/** `x` with `decimals` digits after the point; negative zero written as zero. */
export function fixed(x: number, decimals: number): string {
  const s = x.toFixed(decimals);
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}

/** `x` rounded to `decimals` and read back, i.e. the value a reader of the written text gets. */
export function roundTo(x: number, decimals: number): number {
  return Number(fixed(x, decimals));
}
