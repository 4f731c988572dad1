import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parsePlainDecimal } from '../../lib/load/parse-number.js';

describe('parsePlainDecimal', () => {
  it('parsePlainDecimal(plain decimals) equals Number(text) bit for bit', () => {
    const decimal = fc.tuple(fc.constantFrom('', '-', '+'), fc.stringMatching(/^\d{0,9}$/), fc.constantFrom('', '.'), fc.stringMatching(/^\d{0,9}$/)).map((p) => p.join(''));
    fc.assert(
      fc.property(decimal, (text) => {
        const v = parsePlainDecimal(text);
        if (!Number.isNaN(v)) expect(Object.is(v, Number(text))).toBe(true);
      }),
      { seed: 7, numRuns: 2000 },
    );
  });

  it('parsePlainDecimal(exponents, long mantissas, junk) returns NaN for the full parser to decide', () => {
    for (const t of ['1e5', '1234567890123456', '', '.', '-', '1.2.3', ' 1', '0x10', 'Infinity', '1,5']) expect(parsePlainDecimal(t)).toBeNaN();
    expect(Object.is(parsePlainDecimal('-0'), -0)).toBe(true);
    expect(parsePlainDecimal('.25')).toBe(0.25);
    expect(parsePlainDecimal('7.')).toBe(7);
  });
});
