import { describe, expect, it } from 'vitest';
import { CARBON_MOLAR_MASS, unitConversion, validateUnit } from '../../lib/units/unitConversion.js';

describe('unitConversion(column, unit, file)', () => {
  it('unitConversion("dissolved_fe", "nmol/kg") is the identity', () => {
    expect(unitConversion('dissolved_fe', 'nmol/kg', 'a.csv')).toEqual({ from: 'nmol/kg', to: 'nmol/kg', factor: 1, perVolume: false, viaMolarMass: false });
  });

  it('unitConversion("dissolved_fe", "pmol/kg") divides by 1000', () => {
    expect(unitConversion('dissolved_fe', 'pmol/kg', 'a.csv').factor).toBe(0.001);
  });

  it('unitConversion("dissolved_fe", "nmol/L") needs density with factor 1000 (nmol m⁻³ per L)', () => {
    const c = unitConversion('dissolved_fe', 'nmol/L', 'a.csv');
    expect(c.perVolume).toBe(true);
    expect(c.factor).toBe(1000);
  });

  it('unitConversion("nitrate", "µM") and "mmol/m3" are per-volume µmol with factor 1000', () => {
    expect(unitConversion('nitrate', 'µM', 'a.csv')).toMatchObject({ factor: 1000, perVolume: true, to: 'µmol/kg' });
    expect(unitConversion('nitrate', 'mmol/m3', 'a.csv')).toMatchObject({ factor: 1000, perVolume: true });
    expect(unitConversion('silicate_dl', 'umol/kg', 'a.csv')).toMatchObject({ factor: 1, perVolume: false });
  });

  it('unitConversion("fe", "amol/cell") is 1e-18 mol/cell', () => {
    expect(unitConversion('fe', 'amol/cell', 'c.csv').factor).toBe(1e-18);
    expect(unitConversion('fe_sigma', 'fmol/cell', 'c.csv').factor).toBe(1e-15);
  });

  it('unitConversion("carbon", "pg C/cell") is 1e-12 g / 12.011 g mol⁻¹', () => {
    // IUPAC conventional atomic weight of carbon 12.011 (Meija et al. 2016).
    expect(CARBON_MOLAR_MASS).toBe(12.011);
    const c = unitConversion('carbon', 'pg C/cell', 'c.csv');
    expect(c.viaMolarMass).toBe(true);
    expect(c.factor).toBeCloseTo(1e-12 / 12.011, 25);
    expect(unitConversion('carbon', 'fg C/cell', 'c.csv').factor).toBeCloseTo(1e-15 / 12.011, 28);
  });

  it('unitConversion("biovolume", "um^3") is the identity and "depth" in m too', () => {
    expect(unitConversion('biovolume', 'um^3', 'c.csv').factor).toBe(1);
    expect(unitConversion('depth', 'm', 'c.csv').factor).toBe(1);
  });

  it('unitConversion throws an error naming file, unit and column for an unknown unit', () => {
    expect(() => unitConversion('dissolved_fe', 'nmol/kgg', 'data/a.csv')).toThrow('data/a.csv: unknown unit "nmol/kgg" for column dissolved_fe');
  });

  it('unitConversion throws for a unit of the wrong dimension', () => {
    expect(() => unitConversion('dissolved_fe', 'm', 'data/a.csv')).toThrow(
      'data/a.csv: unit "m" has the wrong dimension for dissolved_fe (expected amount per mass or per volume)',
    );
  });
});

describe('validateUnit(quantity, unit)', () => {
  it('validateUnit("dissolved_fe", "nmol kg-1") is null', () => {
    expect(validateUnit('dissolved_fe', 'nmol kg-1')).toBeNull();
  });

  it('validateUnit returns the exact messages for unknown, wrong-dimension and unit-less columns', () => {
    expect(validateUnit('dissolved_fe', 'nmol/kgg')).toBe('unknown unit "nmol/kgg" for column dissolved_fe');
    expect(validateUnit('dissolved_fe', 'm')).toBe('unit "m" has the wrong dimension for dissolved_fe (expected amount per mass or per volume)');
    expect(validateUnit('fe', 'pg C/cell')).toBe('unit "pg C/cell" has the wrong dimension for fe (expected amount per cell)');
    expect(validateUnit('carbon', 'nmol/kg')).toBe('unit "nmol/kg" has the wrong dimension for carbon (expected amount per cell or carbon mass per cell)');
    expect(validateUnit('cruise', 'm')).toBe('column cruise takes no unit (it has no canonical unit)');
  });
});
