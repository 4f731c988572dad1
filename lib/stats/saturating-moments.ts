import type { SaturatingGroupedData } from './michaelis-menten-on-counts.js';

/** Largest series index kept: terms m < TERMS of every series, moments up to index TERMS + 3. */
const TERMS = 21;
/** Moments stored per station and kind. */
const STRIDE = TERMS + 4;
/** A station is summed from its moments when ρ = |k − k₀|/(k₀ + min x) is at most this (0.2²¹ ≈ 2·10⁻¹⁵). */
const RHO = 0.2;

/**
 * Per-station moments of the saturating Gauss–Newton sums about a reference k₀, so that the sums at a nearby k cost
 * O(terms) per station instead of one logarithm and division per row. With h₀ = 1/(k₀ + x) and D = k₀ − k, every sum
 * is a power series in D·h₀ (binomial series of h = h₀/(1 − D·h₀), series of ln(1 + d/u₀) and of ln u/u,
 * Abramowitz & Stegun 1964, 3.6.8 and 4.1.24): log10 scale M_m = Σ w h₀ᵐ, P_m = Σ w·obs·h₀ᵐ, N_m = Σ w·log10(k₀ + x)·h₀ᵐ;
 * linear scale M_m = Σ w x² h₀ᵐ, P_m = Σ w x·obs·h₀ᵐ.
 */
export interface SaturatingMoments {
  /** Reference k₀ the moments are taken about. */
  k0: number;
  /** Largest h₀ = 1/(k₀ + min x) of each station (0 for a station without rows). */
  h0max: Float64Array;
  /** Moments M, station j at j·STRIDE + m. */
  m: Float64Array;
  /** Moments P. */
  p: Float64Array;
  /** Moments N (log10 scale only; zeros on the linear scale). */
  n: Float64Array;
}

/** Builds the per-station moments of `SaturatingMoments` about k₀ (the whole-data k of a bootstrap). */
export function saturatingMoments(d: SaturatingGroupedData, k0: number): SaturatingMoments {
  const { start, x, obs, w } = d;
  const groups = start.length - 1;
  const log = d.scale === 'log10';
  const m = new Float64Array(groups * STRIDE);
  const p = new Float64Array(groups * STRIDE);
  const n = new Float64Array(groups * STRIDE);
  const h0max = new Float64Array(groups);
  for (let j = 0; j < groups; j++) {
    const o = j * STRIDE;
    for (let i = start[j]; i < start[j + 1]; i++) {
      const u0 = k0 + x[i];
      const h0 = 1 / u0;
      if (h0 > h0max[j]) h0max[j] = h0;
      const L0 = Math.log10(u0);
      const a = log ? w[i] : w[i] * x[i] * x[i];
      const b = log ? w[i] * obs[i] : w[i] * x[i] * obs[i];
      let pw = 1;
      for (let t = 0; t < STRIDE; t++) {
        m[o + t] += a * pw;
        p[o + t] += b * pw;
        if (log) n[o + t] += w[i] * L0 * pw;
        pw *= h0;
      }
    }
  }
  return { k0, h0max, m, p, n };
}

/**
 * Station j's Gauss–Newton sums at (q, k) from its moments into `out`, or false when k lies too far from k₀ for the
 * series (the caller then sums the rows). log10 scale: out = Σw, Σw·h, Σw·h², Σw·e, Σw·h·e with e = obs − log10 q +
 * log10(k + x); linear scale: out = Σw x²h², Σw x²h³, Σw x²h⁴, Σw x·obs·h, Σw x·obs·h².
 */
export function stationSums(s: SaturatingMoments, j: number, log: boolean, q: number, k: number, out: Float64Array): boolean {
  const D = s.k0 - k;
  const rho = Math.abs(D) * s.h0max[j];
  if (!(rho <= RHO)) return false;
  // Terms needed for a truncation error below 10⁻¹⁵ of the leading term.
  const K = rho === 0 ? 1 : Math.min(TERMS, Math.max(1, Math.ceil(-34.5 / Math.log(rho))));
  const o = j * STRIDE;
  const { m, p, n } = s;
  if (log) {
    let sh = 0;
    let shh = 0;
    let sl = 0;
    let shl = 0;
    let sho = 0;
    let harmonic = 0;
    let pw = 1;
    for (let t = 0; t < K; t++) {
      sh += pw * m[o + t + 1];
      shh += (t + 1) * pw * m[o + t + 2];
      if (t > 0) {
        harmonic += 1 / t;
        sl += (pw * m[o + t]) / t;
      }
      shl += pw * (n[o + t + 1] - (harmonic / Math.LN10) * m[o + t + 1]);
      sho += pw * p[o + t + 1];
      pw *= D;
    }
    // The log series needs the term m = K as well (it starts at m = 1).
    sl += (pw * m[o + K]) / K;
    const sw = m[o];
    const sL = n[o] - sl / Math.LN10;
    const lq = Math.log10(q);
    out[0] = sw;
    out[1] = sh;
    out[2] = shh;
    out[3] = p[o] - lq * sw + sL;
    out[4] = sho - lq * sh + shl;
  } else {
    let x2 = 0;
    let x3 = 0;
    let x4 = 0;
    let o1 = 0;
    let o2 = 0;
    let pw = 1;
    for (let t = 0; t < K; t++) {
      x2 += (t + 1) * pw * m[o + t + 2];
      x3 += (((t + 1) * (t + 2)) / 2) * pw * m[o + t + 3];
      x4 += (((t + 1) * (t + 2) * (t + 3)) / 6) * pw * m[o + t + 4];
      o1 += pw * p[o + t + 1];
      o2 += (t + 1) * pw * p[o + t + 2];
      pw *= D;
    }
    out[0] = x2;
    out[1] = x3;
    out[2] = x4;
    out[3] = o1;
    out[4] = o2;
  }
  return true;
}
