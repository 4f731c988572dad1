// Geometric mean of positive values with a t interval on the log10 scale.
import { tQuantile } from '../../stats/index.js';

/** Geometric mean and its `level` interval (t on log10 values, n − 1 df); null for fewer than 2 positive values. */
export function geometricMean(values: readonly number[], level = 0.95): { value: number; lower: number; upper: number; n: number } | null {
  const logs = values.filter((v) => Number.isFinite(v) && v > 0).map(Math.log10);
  const n = logs.length;
  if (n < 2) return null;
  const mean = logs.reduce((s, v) => s + v, 0) / n;
  const sd = Math.sqrt(logs.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1));
  const half = tQuantile(1 - (1 - level) / 2, n - 1) * (sd / Math.sqrt(n));
  return { value: 10 ** mean, lower: 10 ** (mean - half), upper: 10 ** (mean + half), n };
}

/** Deterministic uniform numbers in [0, 1) (mulberry32), for plot jitter that is the same on every build. */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
