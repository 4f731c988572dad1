// Number formatting for pages: significant figures without trailing noise, p-values, intervals.

/** `x` to `sig` significant figures (plain notation between 1e-4 and 1e6, else exponent), "—" when not finite. */
export function sig(x: number | null | undefined, digits = 3): string {
  if (x === null || x === undefined || !Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const abs = Math.abs(x);
  if (abs < 1e-4 || abs >= 1e6) return x.toExponential(digits - 1).replace('e', '×10^').replace('+', '');
  const decimals = Math.max(0, digits - 1 - Math.floor(Math.log10(abs)));
  return x.toFixed(Math.min(decimals, 12));
}

/** A p-value: "< 0.0001" below that, else 2 significant figures. */
export function pValue(p: number | null | undefined): string {
  if (p === null || p === undefined || !Number.isFinite(p)) return '—';
  return p < 1e-4 ? '< 0.0001' : sig(p, 2);
}

/** "lower–upper" with the same significant figures. */
export function interval(lower: number | null | undefined, upper: number | null | undefined, digits = 3): string {
  return `${sig(lower, digits)}–${sig(upper, digits)}`;
}

/** A p-value as a relation for running text: "< 0.0001" or "= 0.032". */
export function pRelation(p: number | null | undefined): string {
  const text = pValue(p);
  return text.startsWith('<') ? text : `= ${text}`;
}
