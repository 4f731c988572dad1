// Numbers for people: a fixed count of significant figures, so the same value always prints the same way.

/**
 * `x` to `sig` significant figures with trailing zeros dropped (like C's %g): plain decimals for
 * 1e-4 ≤ |x| < 1e6, otherwise mantissa and exponent ("1.23e-7"). Non-finite values print as String(x).
 */
export function formatNumber(x: number, sig = 3): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  // The exponent is read after rounding, so 999.96 at 3 figures is 1000, not 999.96's exponent 2.
  const [mantissa, exponentText] = x.toExponential(sig - 1).split('e');
  const exponent = Number(exponentText);
  if (exponent < -4 || exponent >= 6) return `${trimZeros(mantissa)}e${exponent}`;
  return trimZeros(Number(x.toPrecision(sig)).toFixed(Math.max(0, sig - 1 - exponent)));
}

function trimZeros(text: string): string {
  return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}
