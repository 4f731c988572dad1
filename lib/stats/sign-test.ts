/** Sign test of a zero median difference. */
export interface SignTestResult {
  /** Non-zero differences x − mu0. */
  n: number;
  /** Differences above zero. */
  nPositive: number;
  /** Differences below zero. */
  nNegative: number;
  /** Differences exactly zero (dropped). */
  nZero: number;
  /** Exact two-sided binomial p-value, 2·P(X ≤ min(k, n − k)), X ~ Bin(n, ½); NaN when n = 0. */
  p: number;
}

/** Exact two-sided sign test, binomial with p = ½ (Conover 1999, Practical Nonparametric Statistics §3.4; as R `binom.test`). */
export function signTest(values: readonly number[], mu0 = 0): SignTestResult {
  let nPositive = 0;
  let nNegative = 0;
  let nZero = 0;
  for (const v of values) {
    if (!Number.isFinite(v)) continue;
    if (v > mu0) nPositive++;
    else if (v < mu0) nNegative++;
    else nZero++;
  }
  const n = nPositive + nNegative;
  const p = n === 0 ? NaN : Math.min(1, 2 * binomialHalfCdf(Math.min(nPositive, nNegative), n));
  return { n, nPositive, nNegative, nZero, p };
}

// P(X ≤ k) for X ~ Bin(n, ½), summing C(n, i)/2ⁿ in log space so large n do not overflow.
function binomialHalfCdf(k: number, n: number): number {
  const logHalfN = n * Math.log(0.5);
  let logC = 0;
  let sum = 0;
  for (let i = 0; i <= k; i++) {
    sum += Math.exp(logC + logHalfN);
    logC += Math.log(n - i) - Math.log(i + 1);
  }
  return Math.min(1, sum);
}
