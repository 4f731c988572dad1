/** A ratio of two measured quantities with its first-order propagated 1-sigma. */

/**
 * Ratio r = scale·a/b and its 1-sigma σr = scale·√((σa/b)² + (a·σb/b²)²), which equals |r|·√((σa/a)² + (σb/b)²)
 * (first-order propagation; Taylor 1997, An Introduction to Error Analysis, eq. 3.18) but stays finite at a = 0.
 * Value NaN when b ≤ 0 or either value is missing; sigma NaN when a sigma is missing.
 */
export function ratioWithSigma(a: number, sigmaA: number, b: number, sigmaB: number, scale = 1): { value: number; sigma: number } {
  if (!Number.isFinite(a) || !Number.isFinite(b) || b <= 0) return { value: Number.NaN, sigma: Number.NaN };
  const value = (a / b) * scale;
  const sigma = scale * Math.hypot(sigmaA / b, (a * sigmaB) / (b * b));
  return { value, sigma: Number.isFinite(sigma) ? sigma : Number.NaN };
}
