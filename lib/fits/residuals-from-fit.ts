import { predictLog10 } from './predict-log10.js';
import type { FitInput, FitResults, ModelFit } from './types.js';

/** Each cell's log10 residual log10 Fe:C − log10 fitted Fe:C from its class's primary fit; NaN for excluded cells and classes that were not fitted. */
export function residualsFromFit(input: FitInput, results: FitResults): Float64Array {
  const n = input.cellClass.length;
  const out = new Float64Array(n).fill(NaN);
  const primary = new Map<string, Exclude<ModelFit, { fitted: false }>>();
  for (const c of results.classes) {
    if (!c.fitted) continue;
    const m = c.models.find((f) => f.model === c.primary);
    if (m !== undefined && m.fitted) primary.set(c.class, m);
  }
  for (let i = 0; i < n; i++) {
    const fit = primary.get(input.cellClass[i]);
    const x = input.dFe[i];
    const y = input.feC[i];
    if (fit === undefined || !(x > 0 && y > 0 && Number.isFinite(x) && Number.isFinite(y))) continue;
    out[i] = Math.log10(y) - predictLog10(fit, x);
  }
  return out;
}
