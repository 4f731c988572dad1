/** A seeded random source for the demo generator: every draw comes from one linear congruential stream. */
import { randomLcg, randomNormal } from 'd3-random';

/** Seeded draws used by the demo generator. */
export interface Rng {
  /** Uniform in [0, 1). */
  uniform(): number;
  /** Uniform in [lo, hi). */
  between(lo: number, hi: number): number;
  /** Integer in [lo, hi], both included. */
  int(lo: number, hi: number): number;
  /** Normal with the given mean and standard deviation. */
  normal(mean: number, sd: number): number;
  /** A key drawn with probability proportional to its weight (keys in insertion order). */
  pick<K extends string>(weights: Readonly<Record<K, number>>): K;
}

/** A seeded random source from an integer `randomSeed`; the same value gives the same stream. */
export function makeRng(randomSeed: number): Rng {
  const lcg = randomLcg(randomSeed);
  const gauss = randomNormal.source(lcg)(0, 1);
  const uniform = (): number => lcg();
  return {
    uniform,
    between: (lo, hi) => lo + (hi - lo) * uniform(),
    int: (lo, hi) => lo + Math.min(hi - lo, Math.floor(uniform() * (hi - lo + 1))),
    normal: (mean, sd) => mean + sd * gauss(),
    pick<K extends string>(weights: Readonly<Record<K, number>>): K {
      const keys = Object.keys(weights) as K[];
      const total = keys.reduce((s, k) => s + weights[k], 0);
      let u = uniform() * total;
      for (const k of keys) {
        u -= weights[k];
        if (u < 0 && weights[k] > 0) return k;
      }
      return keys.filter((k) => weights[k] > 0).at(-1)!;
    },
  };
}
