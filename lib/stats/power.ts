import { noncentralTCdf, normalQuantile, tQuantile } from './distributions.js';

/**
 * Power of a two-sided one-sample t test at significance alpha against a true shift `effect`
 * (same units as sd): P(|T| > t₍₁₋α/₂, n−1₎), T ~ non-central t(n − 1, effect·√n/sd) (Cohen 1988, ch. 2).
 */
export function tTestPower(effect: number, sd: number, n: number, alpha = 0.05): number {
  if (!(n >= 2) || !(sd > 0) || !(alpha > 0 && alpha < 1) || !Number.isFinite(effect)) return NaN;
  const df = n - 1;
  const crit = tQuantile(1 - alpha / 2, df);
  const ncp = (Math.abs(effect) * Math.sqrt(n)) / sd;
  const p = 1 - noncentralTCdf(crit, df, ncp) + noncentralTCdf(-crit, df, ncp);
  return Math.min(1, Math.max(0, p));
}

/**
 * Smallest shift (units of sd, e.g. log10) a two-sided one-sample t test with n values detects at
 * significance alpha with the given power; solves tTestPower = power by bisection (Cohen 1988, ch. 2).
 * NaN when n < 2 or sd is not positive.
 */
export function powerMinDetectable(n: number, sd: number, alpha = 0.05, power = 0.8): number {
  if (!(n >= 2) || !(sd > 0) || !(alpha > 0 && alpha < 1) || !(power > alpha && power < 1)) return NaN;
  // Solve on the standardised scale d = effect/sd, starting from the normal approximation.
  const dNormal = (normalQuantile(1 - alpha / 2) + normalQuantile(power)) / Math.sqrt(n);
  let lo = 0;
  let hi = dNormal;
  let guard = 0;
  while (tTestPower(hi, 1, n, alpha) < power && guard++ < 60) {
    lo = hi;
    hi *= 2;
  }
  for (let i = 0; i < 80 && hi - lo > 1e-12 * hi; i++) {
    const mid = (lo + hi) / 2;
    if (tTestPower(mid, 1, n, alpha) < power) lo = mid;
    else hi = mid;
  }
  return hi * sd;
}

/**
 * Smallest n (≥ 2) at which a two-sided one-sample t test detects a shift `effect` with the given power
 * at significance alpha (Cohen 1988, ch. 2); Infinity if more than maxN would be needed, NaN for effect 0.
 */
export function stationsNeeded(effect: number, sd: number, alpha = 0.05, power = 0.8, maxN = 1_000_000): number {
  if (!(sd > 0) || !Number.isFinite(effect) || effect === 0 || !(alpha > 0 && alpha < 1) || !(power > alpha && power < 1)) return NaN;
  const d = Math.abs(effect) / sd;
  const zSum = normalQuantile(1 - alpha / 2) + normalQuantile(power);
  // The t test is never more powerful than the z test, so the normal answer is a lower bound.
  let n = Math.max(2, Math.floor((zSum / d) ** 2));
  if (n > maxN) return Infinity;
  while (n > 2 && tTestPower(d, 1, n - 1, alpha) >= power) n--;
  // Double, then bisect, so huge n stay cheap.
  let lo = n - 1;
  let hi = n;
  while (tTestPower(d, 1, hi, alpha) < power) {
    if (hi > maxN) return Infinity;
    lo = hi;
    hi = Math.min(maxN + 1, hi * 2);
  }
  while (hi - lo > 1) {
    const mid = Math.floor((lo + hi) / 2);
    if (tTestPower(d, 1, mid, alpha) >= power) hi = mid;
    else lo = mid;
  }
  return hi;
}
