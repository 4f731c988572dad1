import { normalCdf } from './distributions.js';

/** Wilcoxon signed-rank test of symmetry about mu0. */
export interface WilcoxonResult {
  /** Number of non-zero differences x − mu0 that were ranked. */
  n: number;
  /** Differences exactly zero, dropped before ranking (Wilcoxon 1945 convention, R default). */
  nZero: number;
  /** V = sum of the ranks of the positive differences. */
  statistic: number;
  /** Two-sided p-value; NaN when n = 0. */
  p: number;
  /** 'exact' (null distribution enumerated) or 'normal-approx' (with tie and continuity correction). */
  method: 'exact' | 'normal-approx';
  /** True when some |differences| tie (mid-ranks used). */
  ties: boolean;
}

/** Below this many differences, without ties or zeros, the exact null distribution is used (as R `wilcox.test`). */
export const WILCOXON_EXACT_MAX_N = 50;

/**
 * Two-sided Wilcoxon signed-rank test (Wilcoxon 1945, Biometrics Bull. 1:80): exact for n < 50 without
 * ties or zeros; otherwise z = (V − n(n+1)/4 ∓ ½)/σ with σ² = n(n+1)(2n+1)/24 − Σ(t³ − t)/48 (as R `wilcox.test`).
 */
export function wilcoxonSignedRank(values: readonly number[], mu0 = 0): WilcoxonResult {
  const diffs: number[] = [];
  let nZero = 0;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    const d = v - mu0;
    if (d === 0) nZero++;
    else diffs.push(d);
  }
  const n = diffs.length;
  const order = diffs.map((_, i) => i).sort((a, b) => Math.abs(diffs[a]) - Math.abs(diffs[b]) || a - b);
  const ranks = new Array<number>(n);
  let tieCorrection = 0;
  for (let i = 0; i < n; ) {
    let j = i;
    while (j + 1 < n && Math.abs(diffs[order[j + 1]]) === Math.abs(diffs[order[i]])) j++;
    const mid = (i + j + 2) / 2;
    for (let k = i; k <= j; k++) ranks[order[k]] = mid;
    const t = j - i + 1;
    tieCorrection += t * t * t - t;
    i = j + 1;
  }
  let statistic = 0;
  for (let i = 0; i < n; i++) if (diffs[i] > 0) statistic += ranks[i];
  const ties = tieCorrection > 0;
  if (n === 0) return { n, nZero, statistic, p: NaN, method: 'exact', ties };
  if (n < WILCOXON_EXACT_MAX_N && !ties && nZero === 0) {
    return { n, nZero, statistic, p: exactSignedRankP(statistic, n), method: 'exact', ties };
  }
  const centred = statistic - (n * (n + 1)) / 4;
  const sigma = Math.sqrt((n * (n + 1) * (2 * n + 1)) / 24 - tieCorrection / 48);
  const z = (centred - Math.sign(centred) * 0.5) / sigma;
  const p = sigma > 0 ? Math.min(1, 2 * normalCdf(-Math.abs(z))) : NaN;
  return { n, nZero, statistic, p, method: 'normal-approx', ties };
}

// Counts of rank subsets by their sum; the counts stay below 2^49, exact in doubles.
function exactSignedRankP(v: number, n: number): number {
  const max = (n * (n + 1)) / 2;
  const counts = new Float64Array(max + 1);
  counts[0] = 1;
  for (let r = 1; r <= n; r++) {
    for (let s = max; s >= r; s--) counts[s] += counts[s - r];
  }
  const total = 2 ** n;
  let lower = 0;
  for (let s = 0; s <= Math.floor(v); s++) lower += counts[s];
  let upper = 0;
  for (let s = Math.ceil(v); s <= max; s++) upper += counts[s];
  return Math.min(1, (2 * Math.min(lower, upper)) / total);
}
