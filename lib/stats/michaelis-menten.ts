import { tQuantile } from './distributions.js';
import type { Interval } from './interval.js';
import { michaelisMentenLm } from './michaelis-menten-lm.js';
import {
  atBound,
  badLevel,
  iterationLimit,
  lengthMismatch,
  nonFiniteFit,
  nonPositiveParameter,
  notPositive,
  singularMatrix,
  tooFewPoints,
} from './messages.js';

/** Options of `michaelisMenten`. */
export interface MichaelisMentenOptions {
  /** Scale of the residuals: 'linear' fits y, 'log10' fits log10 y (log-normal scatter); default 'linear'. */
  scale?: 'linear' | 'log10';
  /** Per-point weights w = 1/σ² on the chosen scale; default all 1. */
  weights?: ArrayLike<number>;
  /** Starting values; default from the Hanes–Woolf line, else a data-range fallback. */
  initial?: { qmax: number; k: number };
  /** Levenberg–Marquardt iteration limit before Gauss–Newton polishing (0 = Gauss–Newton only, for starts at the optimum); default 100. */
  maxIterations?: number;
  /** Confidence level of the parameter intervals; default 0.95. */
  level?: number;
}

/** How the starting values were found. */
export type MichaelisMentenStart = 'given' | 'hanes-woolf' | 'fallback';

/** A converged saturating fit y = qmax·x/(k + x). */
export interface MichaelisMentenFit {
  /** Always true here. */
  converged: true;
  /** Number of points. */
  n: number;
  /** Residual degrees of freedom, n − 2. */
  df: number;
  /** Confidence level of the intervals. */
  level: number;
  /** Scale the residuals were taken on. */
  scale: 'linear' | 'log10';
  /** Asymptote qmax (units of y). */
  qmax: number;
  /** Half-saturation constant k (units of x). */
  k: number;
  /** Standard error of qmax from σ²·(JᵀWJ)⁻¹. */
  qmaxSE: number;
  /** Standard error of k. */
  kSE: number;
  /** Wald t interval of qmax on n − 2 df. */
  qmaxCI: Interval;
  /** Wald t interval of k on n − 2 df. */
  kCI: Interval;
  /** Covariance of (qmax, k). */
  covQmaxK: number;
  /** (Weighted) residual sum of squares on the fitted scale. */
  rss: number;
  /** √(RSS/(n − 2)). */
  residualSE: number;
  /** How the starting values were found. */
  start: MichaelisMentenStart;
  /** Levenberg–Marquardt iterations used. */
  iterations: number;
  /** Gauss–Newton polishing steps used after Levenberg–Marquardt. */
  polishSteps: number;
}

/** A saturating fit that did not reach a usable optimum, with the reason. */
export interface MichaelisMentenFailure {
  /** Always false here. */
  converged: false;
  /** Number of points. */
  n: number;
  /** Why no estimate is given. */
  reason: string;
}

/** Nonlinear least squares of y = qmax·x/(k + x) (Levenberg–Marquardt on typed arrays, then Gauss–Newton polishing; standard errors from σ²(JᵀWJ)⁻¹ as in Bates & Watts 1988, Nonlinear Regression Analysis, §2.3). */
export function michaelisMenten(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  options: MichaelisMentenOptions = {},
): MichaelisMentenFit | MichaelisMentenFailure {
  const n = x.length;
  if (y.length !== n) throw new RangeError(lengthMismatch('x', n, 'y', y.length));
  if (n < 3) throw new RangeError(tooFewPoints('michaelisMenten', 3, n));
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(badLevel(level));
  const scale = options.scale ?? 'linear';
  const w = options.weights;
  if (w !== undefined && w.length !== n) throw new RangeError(lengthMismatch('x', n, 'weights', w.length));
  const what = 'michaelisMenten';
  const fail = (reason: string): MichaelisMentenFailure => ({ converged: false, n, reason });
  for (let i = 0; i < n; i++) {
    if (!(x[i] > 0 && Number.isFinite(x[i]))) return fail(notPositive('x', x[i]));
    if (scale === 'log10' && !(y[i] > 0 && Number.isFinite(y[i]))) return fail(notPositive('y', y[i]));
  }
  const obs = new Float64Array(n);
  for (let i = 0; i < n; i++) obs[i] = scale === 'log10' ? Math.log10(y[i]) : y[i];
  const wt = new Float64Array(n);
  for (let i = 0; i < n; i++) wt[i] = w === undefined ? 1 : w[i];

  const { qmax: q0, k: k0, start } = startingValues(x, y, options.initial);
  const model =
    scale === 'log10'
      ? (p: number[]) => (xi: number) => Math.log10((p[0] * xi) / (p[1] + xi))
      : (p: number[]) => (xi: number) => (p[0] * xi) / (p[1] + xi);
  const jacobian = (q: number, k: number, xi: number, out: Float64Array): void => {
    if (scale === 'log10') {
      out[0] = 1 / (q * Math.LN10);
      out[1] = -1 / ((k + xi) * Math.LN10);
    } else {
      out[0] = xi / (k + xi);
      out[1] = (-q * xi) / ((k + xi) * (k + xi));
    }
  };
  const jrow = new Float64Array(2);
  const maxIterations = options.maxIterations ?? 100;
  // maxIterations 0 goes straight to Gauss–Newton, for starts already at the optimum.
  const lm = michaelisMentenLm(x, obs, wt, scale, q0, k0, maxIterations);
  let q = lm.qmax;
  let k = lm.k;
  const rssAt = (qq: number, kk: number): number => {
    const f = model([qq, kk]);
    let s = 0;
    for (let i = 0; i < n; i++) {
      const e = obs[i] - f(x[i]);
      s += wt[i] * e * e;
    }
    return s;
  };
  // Gauss–Newton polishing: the library's damping schedule stalls a little short of the optimum.
  let rss = rssAt(q, k);
  let polishSteps = 0;
  let polished = false;
  let a11 = 0;
  let a12 = 0;
  let a22 = 0;
  const normal = (qq: number, kk: number): { g1: number; g2: number } => {
    a11 = 0;
    a12 = 0;
    a22 = 0;
    let g1 = 0;
    let g2 = 0;
    const f = model([qq, kk]);
    for (let i = 0; i < n; i++) {
      jacobian(qq, kk, x[i], jrow);
      const e = obs[i] - f(x[i]);
      a11 += wt[i] * jrow[0] * jrow[0];
      a12 += wt[i] * jrow[0] * jrow[1];
      a22 += wt[i] * jrow[1] * jrow[1];
      g1 += wt[i] * jrow[0] * e;
      g2 += wt[i] * jrow[1] * e;
    }
    return { g1, g2 };
  };
  for (; polishSteps < 100 && Number.isFinite(rss); polishSteps++) {
    const { g1, g2 } = normal(q, k);
    const det = a11 * a22 - a12 * a12;
    if (!(Math.abs(det) > 1e-300)) return fail(singularMatrix(what));
    let d1 = (a22 * g1 - a12 * g2) / det;
    let d2 = (a11 * g2 - a12 * g1) / det;
    let accepted = false;
    for (let halve = 0; halve < 40; halve++) {
      const qn = q + d1;
      const kn = k + d2;
      const rn = kn > 0 && qn > 0 ? rssAt(qn, kn) : NaN;
      // Near the optimum RSS changes below rounding while the Gauss–Newton step is still exact, so allow ties.
      if (rn <= rss * (1 + 1e-12)) {
        q = qn;
        k = kn;
        rss = rn;
        accepted = true;
        break;
      }
      d1 /= 2;
      d2 /= 2;
    }
    if (!accepted || (Math.abs(d1) <= 1e-13 * Math.abs(q) && Math.abs(d2) <= 1e-13 * Math.abs(k))) {
      // No step lowers RSS any more or the step is at rounding level: the optimum is reached.
      polished = true;
      polishSteps++;
      break;
    }
  }
  if (!Number.isFinite(q) || !Number.isFinite(k) || !Number.isFinite(rss)) return fail(nonFiniteFit(what));
  if (!polished) return fail(iterationLimit(what, maxIterations + polishSteps));
  if (!(q > 0)) return fail(nonPositiveParameter(what, 'qmax', q));
  if (!(k > 0)) return fail(nonPositiveParameter(what, 'k', k));
  // k pinned at the positivity bound means the optimum lies at k ≤ 0 (no saturation): not an estimate.
  let xmin = Infinity;
  for (let i = 0; i < n; i++) xmin = Math.min(xmin, x[i]);
  if (k <= 1e-9 * xmin) return fail(atBound(what, 'k', k));
  normal(q, k);
  const det = a11 * a22 - a12 * a12;
  // Relative determinant guards against a JᵀWJ that inverts only numerically (k far beyond the data).
  if (!(det > 1e-14 * a11 * a22)) return fail(singularMatrix(what));
  const df = n - 2;
  const s2 = rss / df;
  const varQ = (s2 * a22) / det;
  const varK = (s2 * a11) / det;
  const cov = (-s2 * a12) / det;
  const qmaxSE = Math.sqrt(varQ);
  const kSE = Math.sqrt(varK);
  const t = tQuantile(1 - (1 - level) / 2, df);
  return {
    converged: true,
    n,
    df,
    level,
    scale,
    qmax: q,
    k,
    qmaxSE,
    kSE,
    qmaxCI: { lower: q - t * qmaxSE, upper: q + t * qmaxSE },
    kCI: { lower: k - t * kSE, upper: k + t * kSE },
    covQmaxK: cov,
    rss,
    residualSE: Math.sqrt(s2),
    start,
    iterations: lm.iterations,
    polishSteps,
  };
}

/** Starting values: Hanes–Woolf x/y = k/qmax + x/qmax (Hanes 1932), else qmax = 1.5·max y, k = median x. */
function startingValues(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  given: { qmax: number; k: number } | undefined,
): { qmax: number; k: number; start: MichaelisMentenStart } {
  if (given !== undefined && given.qmax > 0 && given.k > 0) return { ...given, start: 'given' };
  const n = x.length;
  let sx = 0;
  let sz = 0;
  let m = 0;
  for (let i = 0; i < n; i++) {
    if (y[i] > 0) {
      sx += x[i];
      sz += x[i] / y[i];
      m++;
    }
  }
  if (m >= 2) {
    const mx = sx / m;
    const mz = sz / m;
    let sxx = 0;
    let sxz = 0;
    for (let i = 0; i < n; i++) {
      if (y[i] > 0) {
        sxx += (x[i] - mx) ** 2;
        sxz += (x[i] - mx) * (x[i] / y[i] - mz);
      }
    }
    const slope = sxz / sxx;
    const intercept = mz - slope * mx;
    const qmax = 1 / slope;
    const k = intercept * qmax;
    if (qmax > 0 && k > 0 && Number.isFinite(qmax) && Number.isFinite(k)) return { qmax, k, start: 'hanes-woolf' };
  }
  const ys = Array.from(y).filter(Number.isFinite);
  const xs = Array.from(x).sort((a, b) => a - b);
  const ymax = ys.length > 0 ? Math.max(...ys) : 1;
  return { qmax: 1.5 * (ymax > 0 ? ymax : 1), k: xs[Math.floor(n / 2)], start: 'fallback' };
}
