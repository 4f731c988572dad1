// sig, pText and withInterval: fixed significant figures for captions and tables.
import { describe, expect, it } from 'vitest';
import { pText, sig, withInterval } from '../../../lib/site/figures/index.js';

describe('sig(x, digits)', () => {
  it('keeps significant figures with trailing zeros', () => {
    expect(sig(0.012345, 2)).toBe('0.012');
    expect(sig(4, 3)).toBe('4.00');
    expect(sig(483.2, 3)).toBe('483');
    expect(sig(793946, 3)).toBe('794000');
    expect(sig(-0.0654, 2)).toBe('-0.065');
  });
  it('switches to exponent form for very large and small values and dashes missing ones', () => {
    expect(sig(1234567, 3)).toBe('1.23e6');
    expect(sig(0.00001234, 2)).toBe('1.2e-5');
    expect(sig(Number.NaN)).toBe('–');
    expect(sig(null)).toBe('–');
  });
});

describe('pText(p) and withInterval(e, lo, hi)', () => {
  it('writes small p values as < 0.001 and intervals with an en dash', () => {
    expect(pText(9.6e-7)).toBe('< 0.001');
    expect(pText(0.0393)).toBe('0.039');
    expect(withInterval(0.511, 0.45, 0.572)).toBe('0.511 (0.450–0.572)');
  });
});
