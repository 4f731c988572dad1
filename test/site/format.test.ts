import { describe, expect, it } from 'vitest';
import { interval, pRelation, pValue, sig } from '../../lib/site/format.js';

describe('page number formatting', () => {
  it('sig(x, 3) keeps three significant figures in plain notation', () => {
    expect(sig(0.51131)).toBe('0.511');
    expect(sig(12.345)).toBe('12.3');
    expect(sig(1234.5)).toBe('1235');
    expect(sig(-0.0654502)).toBe('-0.0655');
    expect(sig(NaN)).toBe('—');
    expect(sig(null)).toBe('—');
  });

  it('sig(x) switches to an exponent outside 1e-4 … 1e6', () => {
    expect(sig(1.234e-7)).toBe('1.23×10^-7');
    expect(sig(5e8, 2)).toBe('5.0×10^8');
  });

  it('pValue and pRelation write tiny p-values as a bound', () => {
    expect(pValue(0.00003)).toBe('< 0.0001');
    expect(pRelation(0.00003)).toBe('< 0.0001');
    expect(pRelation(0.0321)).toBe('= 0.032');
  });

  it('interval(lower, upper) joins two ends with an en dash', () => {
    expect(interval(0.447, 0.5716)).toBe('0.447–0.572');
  });
});
