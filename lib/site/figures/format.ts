// Fixed number formatting for captions and tables: significant figures, no locale, no exponent surprises.

/** `x` to `digits` significant figures as plain text ('–' for null or non-finite); e.g. sig(0.012345, 2) = '0.012'. */
export function sig(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '–';
  if (x === 0) return '0';
  const mag = Math.floor(Math.log10(Math.abs(x)));
  if (mag >= 6 || mag < -4) return x.toExponential(digits - 1).replace('e+', 'e');
  const decimals = Math.max(0, digits - 1 - mag);
  // Whole numbers wider than `digits` are rounded too: 793946 to 3 figures is 794000.
  return decimals === 0 ? String(Number(x.toPrecision(digits))) : x.toFixed(decimals);
}

/** A p value as text: '< 0.001' below 0.001, else 2 significant figures. */
export function pText(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '–';
  return p < 0.001 ? '< 0.001' : sig(p, 2);
}

/** An estimate with its interval, e.g. '0.42 (0.35–0.49)'. */
export function withInterval(estimate: number | null | undefined, lower: number | null | undefined, upper: number | null | undefined, digits = 3): string {
  return `${sig(estimate, digits)} (${sig(lower, digits)}–${sig(upper, digits)})`;
}
