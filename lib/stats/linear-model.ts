import { lengthMismatch, singularMatrix, tooFewPoints } from './messages.js';

/** A general linear model fit y = Xβ + ε. */
export interface LinearModelFit {
  /** Number of observations. */
  n: number;
  /** Number of coefficients (columns of X). */
  p: number;
  /** Residual degrees of freedom, n − p. */
  df: number;
  /** Least-squares coefficients, one per column of X. */
  coefficients: number[];
  /** Covariance matrix σ²(XᵀX)⁻¹, row-major p×p. */
  covariance: number[];
  /** Residual sum of squares. */
  rss: number;
  /** Residual standard error √(RSS/df). */
  residualSE: number;
}

/** Least squares y = Xβ by Householder QR, X given as p columns of length n (Golub & Van Loan 2013, Matrix Computations, Alg. 5.2.1). */
export function linearModel(columns: readonly ArrayLike<number>[], y: ArrayLike<number>): LinearModelFit {
  const n = y.length;
  const p = columns.length;
  for (const c of columns) if (c.length !== n) throw new RangeError(lengthMismatch('y', n, 'a design column', c.length));
  if (n <= p) throw new RangeError(tooFewPoints('linearModel', p + 1, n));
  // Column-major working copy; the caller's arrays stay untouched.
  const a = new Float64Array(n * p);
  for (let j = 0; j < p; j++) for (let i = 0; i < n; i++) a[j * n + i] = columns[j][i];
  const b = Float64Array.from(y);
  const v = new Float64Array(n);
  let scale = 0;
  for (let i = 0; i < a.length; i++) scale = Math.max(scale, Math.abs(a[i]));
  for (let j = 0; j < p; j++) {
    let norm = 0;
    for (let i = j; i < n; i++) norm += a[j * n + i] ** 2;
    norm = Math.sqrt(norm);
    if (!(norm > 1e-12 * scale * Math.sqrt(n))) throw new RangeError(singularMatrix('linearModel'));
    const alpha = a[j * n + j] > 0 ? -norm : norm;
    for (let i = j; i < n; i++) v[i] = a[j * n + i];
    v[j] -= alpha;
    let vv = 0;
    for (let i = j; i < n; i++) vv += v[i] * v[i];
    for (let c = j; c < p; c++) {
      let d = 0;
      for (let i = j; i < n; i++) d += v[i] * a[c * n + i];
      const f = (2 * d) / vv;
      for (let i = j; i < n; i++) a[c * n + i] -= f * v[i];
    }
    let d = 0;
    for (let i = j; i < n; i++) d += v[i] * b[i];
    const f = (2 * d) / vv;
    for (let i = j; i < n; i++) b[i] -= f * v[i];
  }
  // R is the upper p×p block of a; Qᵀy is b.
  const beta = new Array<number>(p).fill(0);
  for (let j = p - 1; j >= 0; j--) {
    let s = b[j];
    for (let c = j + 1; c < p; c++) s -= a[c * n + j] * beta[c];
    beta[j] = s / a[j * n + j];
  }
  let rss = 0;
  for (let i = p; i < n; i++) rss += b[i] * b[i];
  // (XᵀX)⁻¹ = R⁻¹R⁻ᵀ.
  const rinv = new Float64Array(p * p);
  for (let c = 0; c < p; c++) {
    rinv[c * p + c] = 1 / a[c * n + c];
    for (let j = c - 1; j >= 0; j--) {
      let s = 0;
      for (let m = j + 1; m <= c; m++) s += a[m * n + j] * rinv[m * p + c];
      rinv[j * p + c] = -s / a[j * n + j];
    }
  }
  const df = n - p;
  const s2 = rss / df;
  const covariance = new Array<number>(p * p).fill(0);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j < p; j++) {
      let s = 0;
      for (let m = Math.max(i, j); m < p; m++) s += rinv[i * p + m] * rinv[j * p + m];
      covariance[i * p + j] = s2 * s;
    }
  }
  return { n, p, df, coefficients: beta, covariance, rss, residualSE: Math.sqrt(s2) };
}
