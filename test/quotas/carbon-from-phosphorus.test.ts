import { describe, expect, it } from 'vitest';
import { carbonFromPhosphorus, REDFIELD_C_TO_P } from '../../lib/quotas/index.js';

describe('carbonFromPhosphorus(p, cp)', () => {
  it('uses the Redfield C:P of 106 by default', () => {
    // Redfield (1963): C:P = 106; 1e-15 mol P → 1.06e-13 mol C.
    expect(REDFIELD_C_TO_P).toBe(106);
    expect(carbonFromPhosphorus(1e-15)).toBeCloseTo(1.06e-13, 26);
  });
  it('takes a user ratio', () => {
    expect(carbonFromPhosphorus(1e-15, 200)).toBeCloseTo(2e-13, 26);
  });
  it('returns NaN for non-positive P', () => {
    expect(carbonFromPhosphorus(0)).toBeNaN();
    expect(carbonFromPhosphorus(Number.NaN)).toBeNaN();
  });
});
