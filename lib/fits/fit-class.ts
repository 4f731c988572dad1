import {
  aicc,
  michaelisMenten,
  tQuantile,
  type Interval,
  type MichaelisMentenFit,
} from '../stats/index.js';
import type { ClassData } from './class-data.js';
import { bandsFor } from './bands.js';
import { bootstrapClass } from './bootstrap-class.js';
import { imputedSigmas, noFeCSigma, noModelFitted, primaryFallback, zeroDFeSigma } from './messages.js';
import { powerLawCore, type PowerLawCore } from './power-law-core.js';
import type { ClassFit, ModelFit, ModelName, ParameterEstimate, ResolvedFitOptions } from './types.js';

/** Prepared inputs of the fitters of one class. */
interface Prepared {
  weights: Float64Array | undefined;
  sigmaLx: Float64Array;
  sigmaLy: Float64Array | null;
  notes: string[];
}

const MODEL_ORDER: readonly ModelName[] = ['ols', 'sma', 'york', 'saturating'];

/** Fits every requested model to one class: analytic and station-bootstrap intervals, AICc on log10 Fe:C, the primary model and its bands. */
export function fitClass(name: string, d: ClassData, o: ResolvedFitOptions): ClassFit {
  const n = d.rows.length;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < n; i++) {
    min = Math.min(min, d.dFe[i]);
    max = Math.max(max, d.dFe[i]);
  }
  const prep = prepare(d, o);
  const models = MODEL_ORDER.filter((m) => o.models.includes(m));
  const cores = new Map<ModelName, PowerLawCore | MichaelisMentenFit>();
  const failures = new Map<ModelName, string>();
  for (const m of models) {
    const r = fitOne(m, d.lx, d.ly, d.dFe, d.feC, prep, o);
    if (typeof r === 'string') failures.set(m, r);
    else cores.set(m, r);
  }
  // One bootstrap draw serves every model, so all models see the same resampled stations.
  const fitted = models.filter((m) => cores.has(m));
  let boot: { intervals: Interval[]; failed: number[] } | null = null;
  if (o.bootstrap.n > 0 && fitted.length > 0) boot = bootstrapClass(d, prep, fitted, cores, o);
  const t = tQuantile(1 - (1 - o.level) / 2, n - 2);
  const results: ModelFit[] = [];
  for (const m of models) {
    const c = cores.get(m);
    if (c === undefined) {
      results.push({ model: m, fitted: false, reason: failures.get(m) as string });
      continue;
    }
    const j = fitted.indexOf(m);
    const bi = (p: number): Interval | null => (boot === null ? null : boot.intervals[2 * j + p]);
    const failed = boot === null ? 0 : boot.failed[2 * j];
    const est = (estimate: number, se: number, p: number): ParameterEstimate => ({
      estimate,
      se,
      interval: { lower: estimate - t * se, upper: estimate + t * se },
      bootstrapInterval: bi(p),
    });
    if ('qmax' in c) {
      let rssLog = 0;
      for (let i = 0; i < n; i++) rssLog += (d.ly[i] - Math.log10((c.qmax * d.dFe[i]) / (c.k + d.dFe[i]))) ** 2;
      results.push({
        model: 'saturating',
        fitted: true,
        parameters: { qmax: est(c.qmax, c.qmaxSE, 0), k: est(c.k, c.kSE, 1) },
        covariance: c.covQmaxK,
        scale: c.scale,
        residualVariance: c.residualSE ** 2,
        diagnostics: { residualSE: c.residualSE, rssLog10: rssLog, converged: true },
        aicc: aicc(rssLog, n, 3).aicc,
        bootstrapFailed: failed,
        notes: saturatingNotes(c.scale, prep),
      });
    } else {
      results.push({
        model: m as 'ols' | 'sma' | 'york',
        fitted: true,
        parameters: { exponent: est(c.b, c.seB, 0), log10Coefficient: est(c.a, c.seA, 1) },
        covariance: c.cov,
        residualVariance: c.residualVariance,
        diagnostics: {
          rSquared: squaredCorrelation(d.lx, d.ly),
          residualSE: Math.sqrt(c.residualVariance),
          rssLog10: c.rss,
          mswd: c.mswd,
          converged: c.converged,
        },
        aicc: m === 'ols' ? aicc(c.rss, n, 3).aicc : null,
        bootstrapFailed: failed,
        notes: powerLawNotes(m as 'ols' | 'sma' | 'york', prep, c),
      });
    }
  }
  const choice = choosePrimary(results, o);
  if (choice === null) return { class: name, fitted: false, nCells: n, nStations: d.nStations, reason: noModelFitted() };
  const primaryFit = results.find((r) => r.model === choice.model) as Exclude<ModelFit, { fitted: false }>;
  return {
    class: name,
    fitted: true,
    nCells: n,
    nStations: d.nStations,
    dFeRange: { lower: min, upper: max },
    models: results,
    primary: choice.model,
    primaryReason: choice.reason,
    bands: bandsFor(primaryFit, min, max, n - 2, o),
  };
}

function prepare(d: ClassData, o: ResolvedFitOptions): Prepared {
  const n = d.rows.length;
  const notes: string[] = [];
  const finite = Array.from(d.sigmaLy).filter(Number.isFinite).sort((a, b) => a - b);
  let sigmaLy: Float64Array | null = null;
  if (finite.length > 0) {
    const median = finite.length % 2 === 1 ? finite[(finite.length - 1) / 2] : (finite[finite.length / 2 - 1] + finite[finite.length / 2]) / 2;
    sigmaLy = Float64Array.from(d.sigmaLy, (s) => (Number.isFinite(s) ? s : median));
    if (finite.length < n) notes.push(imputedSigmas(n - finite.length));
  }
  // σ(log10 x) = σ_x/(x·ln 10) = relative σ / ln 10: the same for every cell.
  const sigmaLx = new Float64Array(n).fill(o.dFeRelativeSigma / Math.LN10);
  const weights =
    o.weighting === 'inverse-variance' && sigmaLy !== null ? Float64Array.from(sigmaLy, (s) => 1 / (s * s)) : undefined;
  return { weights, sigmaLx, sigmaLy, notes };
}

function fitOne(
  m: ModelName,
  lx: Float64Array,
  ly: Float64Array,
  dFe: Float64Array,
  feC: Float64Array,
  p: Prepared,
  o: ResolvedFitOptions,
): PowerLawCore | MichaelisMentenFit | string {
  if (m === 'saturating') {
    const logScale = o.saturatingScale === 'log10';
    const weights =
      p.weights === undefined || p.sigmaLy === null
        ? undefined
        : logScale
          ? p.weights
          : Float64Array.from(p.sigmaLy, (s, i) => 1 / (s * feC[i] * Math.LN10) ** 2);
    const f = michaelisMenten(dFe, feC, {
      scale: o.saturatingScale,
      weights,
      level: o.level,
    });
    return f.converged ? f : f.reason;
  }
  if (m === 'york') {
    if (p.sigmaLy === null) return noFeCSigma();
    if (!(o.dFeRelativeSigma > 0)) return zeroDFeSigma();
  }
  return powerLawCore(m, lx, ly, { weights: m === 'ols' ? p.weights : undefined, sigmaLx: p.sigmaLx, sigmaLy: p.sigmaLy ?? undefined, level: o.level });
}

function choosePrimary(results: ModelFit[], o: ResolvedFitOptions): { model: ModelName; reason: string } | null {
  const ok = results.filter((r) => r.fitted);
  if (ok.length === 0) return null;
  if (o.primary === 'auto') {
    let best: ModelFit | null = null;
    let bestValue = Infinity;
    for (const r of ok) {
      const v = r.fitted ? r.aicc : null;
      if (v !== null && Number.isFinite(v) && v < bestValue) {
        best = r;
        bestValue = v;
      }
    }
    if (best !== null) return { model: best.model, reason: 'lowest AICc on log10 Fe:C among ols and saturating' };
    return { model: ok[0].model, reason: 'no AICc available; first fitted model' };
  }
  if (ok.some((r) => r.model === o.primary)) return { model: o.primary, reason: 'configured' };
  return { model: ok[0].model, reason: primaryFallback(o.primary, ok[0].model) };
}

function squaredCorrelation(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i];
    my += y[i];
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let syy = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (x[i] - mx) ** 2;
    syy += (y[i] - my) ** 2;
    sxy += (x[i] - mx) * (y[i] - my);
  }
  return (sxy * sxy) / (sxx * syy);
}

function powerLawNotes(m: 'ols' | 'sma' | 'york', p: Prepared, c: PowerLawCore): string[] {
  const notes = [...(m === 'york' ? p.notes : [])];
  if (m === 'ols') notes.push(p.weights === undefined ? 'unweighted least squares of log10 Fe:C on log10 dFe' : 'least squares weighted by 1/σ²(log10 Fe:C)');
  if (m === 'sma') notes.push('standardised major axis of log10 Fe:C and log10 dFe; not ranked by AICc (not a least-squares fit of log10 Fe:C)');
  if (m === 'york') {
    notes.push('York regression with σ(log10 dFe) = dFeRelativeSigma/ln 10 and σ(log10 Fe:C) = σ/(Fe:C·ln 10); intervals use σ scaled by √MSWD; not ranked by AICc');
    if (c.yorkSE !== null) notes.push(`unscaled York σ: exponent ${c.yorkSE.b}, log10 coefficient ${c.yorkSE.a}`);
  }
  return notes;
}

function saturatingNotes(scale: 'log10' | 'linear', p: Prepared): string[] {
  const notes = [
    scale === 'log10'
      ? 'nonlinear least squares of log10 Fe:C = log10(qmax·dFe/(k + dFe)); AICc on the same log10 residuals as ols'
      : 'nonlinear least squares on Fe:C itself; its AICc uses the logged predictions, which it did not minimise',
  ];
  if (p.weights !== undefined) notes.push('weighted by 1/σ² of Fe:C on the fitted scale');
  return notes;
}
