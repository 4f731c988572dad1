import { describe, expect, it } from 'vitest';
import { powerMinDetectable, stationsNeeded, tTestPower } from '../../lib/stats/power.js';

describe('power of the one-sample t test', () => {
  it('stationsNeeded(0.5, 1) is 34 and stationsNeeded(0.2, 1) is 199 at α = 0.05, power 0.8', () => {
    // From memory: G*Power "t tests – means: difference from constant", two-tailed, α = 0.05, power 0.80:
    // d = 0.5 → n = 34 (actual power 0.808), d = 0.2 → n = 199 (Cohen 1988 effect-size conventions).
    expect(stationsNeeded(0.5, 1, 0.05, 0.8)).toBe(34);
    expect(tTestPower(0.5, 1, 34, 0.05)).toBeCloseTo(0.808, 3);
    expect(stationsNeeded(0.2, 1, 0.05, 0.8)).toBe(199);
    expect(stationsNeeded(0.4, 2, 0.05, 0.8)).toBe(199);
  });

  it('powerMinDetectable(n, sd) approaches (z₀.₉₇₅ + z₀.₈)·sd/√n for large n', () => {
    // Normal approximation, common practice (Cohen 1988): z₀.₉₇₅ = 1.959963984540054, z₀.₈ = 0.8416212335729143.
    const zSum = 1.959963984540054 + 0.8416212335729143;
    for (const n of [2000, 10000]) {
      expect(powerMinDetectable(n, 0.3, 0.05, 0.8) / ((zSum * 0.3) / Math.sqrt(n))).toBeCloseTo(1, 3);
    }
    // With few stations the t test needs a clearly larger effect than the normal formula says.
    expect(powerMinDetectable(5, 1)).toBeGreaterThan((zSum * 1) / Math.sqrt(5) * 1.3);
  });

  it('powerMinDetectable(n, sd, α) solves tTestPower = power', () => {
    for (const n of [2, 3, 8, 40]) {
      const d = powerMinDetectable(n, 0.25, 0.1, 0.8);
      expect(tTestPower(d, 0.25, n, 0.1)).toBeCloseTo(0.8, 9);
    }
  });

  it('powerMinDetectable(n) falls as n grows, and rises with sd, lower α and higher power', () => {
    let previous = Infinity;
    for (const n of [2, 3, 5, 10, 30, 100]) {
      const d = powerMinDetectable(n, 0.2, 0.1);
      expect(d).toBeLessThan(previous);
      previous = d;
    }
    expect(powerMinDetectable(10, 0.4)).toBeGreaterThan(powerMinDetectable(10, 0.2));
    expect(powerMinDetectable(10, 0.2, 0.01)).toBeGreaterThan(powerMinDetectable(10, 0.2, 0.05));
    expect(powerMinDetectable(10, 0.2, 0.05, 0.9)).toBeGreaterThan(powerMinDetectable(10, 0.2, 0.05, 0.8));
  });

  it('stationsNeeded(effect, sd) is the first n reaching the power', () => {
    for (const [effect, sd] of [[0.176, 0.3], [0.1, 0.15], [1, 0.5]]) {
      const n = stationsNeeded(effect, sd, 0.1, 0.8);
      expect(tTestPower(effect, sd, n, 0.1)).toBeGreaterThanOrEqual(0.8);
      if (n > 2) expect(tTestPower(effect, sd, n - 1, 0.1)).toBeLessThan(0.8);
    }
  });

  it('power functions return NaN or Infinity where no answer exists', () => {
    expect(powerMinDetectable(1, 0.2)).toBeNaN();
    expect(powerMinDetectable(10, 0)).toBeNaN();
    expect(stationsNeeded(0, 0.2)).toBeNaN();
    expect(stationsNeeded(1e-4, 1, 0.05, 0.8, 1000)).toBe(Infinity);
  });
});
