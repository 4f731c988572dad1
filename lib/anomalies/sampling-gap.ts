import { powerMinDetectable, stationsNeeded } from '../stats/power.js';
import type { SamplingGap } from './anomaly-types.js';

/**
 * Between-station SD pooled over groups: √(Σ Σ (x − x̄_g)² / Σ (n_g − 1)), groups with ≥ 2 stations
 * (the usual pooled within-group variance, e.g. Sokal & Rohlf 1995, Biometry ch. 8); sd null when df = 0.
 */
export function pooledSd(groups: readonly (readonly number[])[]): { sd: number | null; df: number } {
  let ss = 0;
  let df = 0;
  for (const xs of groups) {
    if (xs.length < 2) continue;
    const m = xs.reduce((s, v) => s + v, 0) / xs.length;
    for (const v of xs) ss += (v - m) * (v - m);
    df += xs.length - 1;
  }
  return { sd: df > 0 && ss > 0 ? Math.sqrt(ss / df) : null, df };
}

/**
 * Smallest fold difference nStations can detect and the stations needed for targetFold, for a two-sided
 * one-sample t test at significance alpha and the given power, between-station SD `sd` (Cohen 1988, ch. 2).
 */
export function samplingGap(nStations: number, sd: number | null, alpha: number, power: number, targetFold: number, minStations: number): SamplingGap {
  if (sd === null) return { minDetectableLog10: null, minDetectableFold: null, stationsForTargetFold: null, additionalStations: null };
  const d = nStations >= 2 ? powerMinDetectable(nStations, sd, alpha, power) : NaN;
  const needed = stationsNeeded(Math.log10(targetFold), sd, alpha, power);
  const stationsForTargetFold = Number.isFinite(needed) ? Math.max(minStations, needed) : null;
  return {
    minDetectableLog10: Number.isFinite(d) ? d : null,
    minDetectableFold: Number.isFinite(d) ? 10 ** d : null,
    stationsForTargetFold,
    additionalStations: stationsForTargetFold === null ? null : Math.max(0, stationsForTargetFold - nStations),
  };
}
