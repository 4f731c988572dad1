import { describe, expect, it } from 'vitest';
import { formatNumber } from '../../lib/version/index.js';

describe('formatNumber', () => {
  it('formatNumber(x, 3) rounds to three significant figures and drops trailing zeros', () => {
    expect(formatNumber(0.52)).toBe('0.52');
    expect(formatNumber(0.123456)).toBe('0.123');
    expect(formatNumber(42.5)).toBe('42.5');
    expect(formatNumber(2)).toBe('2');
    expect(formatNumber(-1.23456)).toBe('-1.23');
  });

  it('formatNumber(x, sig) reads the exponent after rounding (999.96 → 1000)', () => {
    expect(formatNumber(999.96, 3)).toBe('1000');
    expect(formatNumber(0.099996, 3)).toBe('0.1');
  });

  it('formatNumber(x, sig) rounds large plain numbers to their significant figures', () => {
    expect(formatNumber(12345, 3)).toBe('12300');
  });

  it('formatNumber(x, sig) switches to an exponent below 1e-4 and from 1e6', () => {
    expect(formatNumber(0.00012345, 3)).toBe('0.000123');
    expect(formatNumber(1.5e-7, 3)).toBe('1.5e-7');
    expect(formatNumber(2.3456e9, 2)).toBe('2.3e9');
  });

  it('formatNumber(x) writes zero and negative zero as 0, and non-finite values as JavaScript does', () => {
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(NaN)).toBe('NaN');
    expect(formatNumber(-Infinity)).toBe('-Infinity');
  });
});
