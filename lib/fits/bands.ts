import { tQuantile } from '../stats/index.js';
import { logGrid } from './log-grid.js';
import type { FitBands, ModelFit, ResolvedFitOptions } from './types.js';

/** Curve, confidence and prediction bands of a fitted model on a log dFe grid, in Fe:C units: delta method on the fitted scale, t on n − 2 df (Bates & Watts 1988, §2.3.2; Draper & Smith 1998, §1.4). */
export function bandsFor(fit: Exclude<ModelFit, { fitted: false }>, min: number, max: number, df: number, o: ResolvedFitOptions): FitBands {
  const grid = logGrid(min, max, o.gridPoints);
  const t = tQuantile(1 - (1 - o.level) / 2, df);
  const out: FitBands = { model: fit.model, dFe: grid, fit: [], confidenceLower: [], confidenceUpper: [], predictionLower: [], predictionUpper: [] };
  for (const x of grid) {
    let mean: number;
    let varMean: number;
    let log: boolean;
    if (fit.model === 'saturating') {
      const q = fit.parameters.qmax.estimate;
      const k = fit.parameters.k.estimate;
      const vq = fit.parameters.qmax.se ** 2;
      const vk = fit.parameters.k.se ** 2;
      log = fit.scale === 'log10';
      let g1: number;
      let g2: number;
      if (log) {
        mean = Math.log10((q * x) / (k + x));
        g1 = 1 / (q * Math.LN10);
        g2 = -1 / ((k + x) * Math.LN10);
      } else {
        mean = (q * x) / (k + x);
        g1 = x / (k + x);
        g2 = (-q * x) / (k + x) ** 2;
      }
      varMean = g1 * g1 * vq + g2 * g2 * vk + 2 * g1 * g2 * fit.covariance;
    } else {
      const a = fit.parameters.log10Coefficient;
      const b = fit.parameters.exponent;
      const lx = Math.log10(x);
      log = true;
      mean = a.estimate + b.estimate * lx;
      varMean = a.se ** 2 + lx * lx * b.se ** 2 + 2 * lx * fit.covariance;
    }
    const hc = t * Math.sqrt(Math.max(varMean, 0));
    const hp = t * Math.sqrt(Math.max(varMean, 0) + fit.residualVariance);
    const back = log ? (v: number) => 10 ** v : (v: number) => v;
    out.fit.push(back(mean));
    out.confidenceLower.push(back(mean - hc));
    out.confidenceUpper.push(back(mean + hc));
    out.predictionLower.push(back(mean - hp));
    out.predictionUpper.push(back(mean + hp));
  }
  return out;
}
