import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ rel·|expected| (or ≤ rel when expected is 0). */
export function expectRel(actual: number, expected: number, rel: number): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  expect(Math.abs(actual - expected) / scale, `${actual} vs ${expected}`).toBeLessThanOrEqual(rel);
}
