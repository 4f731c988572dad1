import type { ModelFit } from './types.js';

/** log10 of the fitted Fe:C (µmol mol⁻¹) at dFe (nmol kg⁻¹) for a fitted model (power law: a + b·log10 dFe; saturating: log10 of qmax·dFe/(k + dFe)). */
export function predictLog10(fit: Exclude<ModelFit, { fitted: false }>, dFe: number): number {
  if (fit.model === 'saturating') {
    const q = fit.parameters.qmax.estimate;
    const k = fit.parameters.k.estimate;
    return Math.log10((q * dFe) / (k + dFe));
  }
  return fit.parameters.log10Coefficient.estimate + fit.parameters.exponent.estimate * Math.log10(dFe);
}
