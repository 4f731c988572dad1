// Sentences describing a class's primary fit: the exponent with its interval, or Qmax and K.
import type { ClassFit, ModelFit, PowerLawFit, SaturatingFit } from '../../fits/index.js';
import { sig, withInterval } from './format.js';

/** The primary model result of a fitted class, or undefined. */
export function primaryModel(fit: ClassFit): PowerLawFit | SaturatingFit | undefined {
  if (!fit.fitted) return undefined;
  const m = fit.models.find((x: ModelFit) => x.model === fit.primary);
  return m && m.fitted ? m : undefined;
}

/** E.g. 'diatom: exponent 0.51 (95 % CI 0.45–0.57), n = 483 cells at 60 stations'. */
export function fitSentence(fit: ClassFit, level: number): string {
  const pct = `${sig(level * 100, 2)} %`;
  const m = primaryModel(fit);
  if (!fit.fitted || !m) return `${fit.class}: not fitted (${fit.fitted ? 'primary model failed' : fit.reason}), n = ${fit.nCells} cells`;
  const where = `n = ${fit.nCells} cells at ${fit.nStations} stations`;
  if (m.model === 'saturating') {
    const { qmax, k } = m.parameters;
    return `${fit.class} (saturating): Qmax ${withInterval(qmax.estimate, qmax.interval.lower, qmax.interval.upper)} µmol mol⁻¹ and K ${withInterval(k.estimate, k.interval.lower, k.interval.upper)} nmol kg⁻¹ (${pct} CI), ${where}`;
  }
  const b = m.parameters.exponent;
  return `${fit.class} (${m.model}): exponent ${sig(b.estimate)} (${pct} CI ${sig(b.interval.lower)}–${sig(b.interval.upper)}), ${where}`;
}
