import { describe, expect, it } from 'vitest';
import { defaultToCanonical } from '../../lib/grids/index.js';

describe('defaultToCanonical', () => {
  it('defaultToCanonical("nmol/kg") accepts per-kg spellings with factor 1 and scales prefixes', () => {
    const f = defaultToCanonical('nmol/kg');
    expect(f('nmol/kg')).toEqual({ factor: 1 });
    expect(f('nmol kg-1')).toEqual({ factor: 1 });
    expect(f('µmol/kg')).toEqual({ factor: 1000 });
  });

  it('defaultToCanonical("µmol/kg") converts per-volume units with 1025 kg/m³ and says so', () => {
    const f = defaultToCanonical('µmol/kg');
    expect(f('umol/kg')).toEqual({ factor: 1 });
    // 1 mmol/m³ = 1 µmol/L; ÷ 1.025 kg/L (fixed density 1025 kg/m³, common practice).
    const perCubicMetre = f('mmol/m3') as { factor: number; note: string };
    expect(perCubicMetre.factor).toBeCloseTo(1 / 1.025, 14);
    expect(perCubicMetre.note).toBe('converted mmol/m3 to µmol/kg with a fixed seawater density of 1025 kg/m³');
    expect(f('µM')).toEqual({ factor: 1 / 1.025, note: 'converted µM to µmol/kg with a fixed seawater density of 1025 kg/m³' });
    expect((f('mol m-3') as { factor: number }).factor).toBeCloseTo(1000 / 1.025, 10);
    expect(f('mmol')).toBe('unknown unit "mmol"; expected an amount per kg, per litre or per cubic metre convertible to µmol/kg');
  });
});
