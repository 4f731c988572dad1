/** Result of the Benjamini–Hochberg step-up procedure over one family of p-values. */
export interface BhResult {
  /** BH-adjusted p-values in input order (R `p.adjust(p, "BH")`); NaN where the input was NaN. */
  adjusted: number[];
  /** True where the hypothesis is rejected at the false discovery rate q (adjusted ≤ q). */
  rejected: boolean[];
  /** Number of finite p-values in the family (m). */
  nTested: number;
  /** Number of rejections. */
  nRejected: number;
  /** The false discovery rate the rejections control. */
  q: number;
}

/**
 * Benjamini–Hochberg adjusted p-values and rejections at false discovery rate q:
 * p̃₍ᵢ₎ = min over j ≥ i of min(1, m·p₍ⱼ₎/j) (Benjamini & Hochberg 1995, JRSS B 57:289; R `p.adjust` "BH").
 * NaN p-values are not part of the family (as R drops NA): they stay NaN and are never rejected.
 */
export function benjaminiHochberg(p: readonly number[], q = 0.05): BhResult {
  if (!(q > 0 && q < 1)) throw new RangeError(`false discovery rate q must lie strictly between 0 and 1, got ${q}`);
  const finite: number[] = [];
  for (let i = 0; i < p.length; i++) {
    const v = p[i];
    if (Number.isNaN(v)) continue;
    if (!(v >= 0 && v <= 1)) throw new RangeError(`p-value ${i} is ${v}; p-values must lie in [0, 1]`);
    finite.push(i);
  }
  const m = finite.length;
  // Largest p first so the running minimum realises "min over j ≥ i"; index breaks ties for determinism.
  const order = finite.slice().sort((a, b) => p[b] - p[a] || b - a);
  const adjusted = p.map(() => NaN);
  let running = 1;
  order.forEach((idx, k) => {
    const rank = m - k;
    running = Math.min(running, (m / rank) * p[idx]);
    adjusted[idx] = Math.min(1, running);
  });
  const rejected = adjusted.map((a) => a <= q);
  return { adjusted, rejected, nTested: m, nRejected: rejected.filter(Boolean).length, q };
}
