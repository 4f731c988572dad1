import { describe, expect, it } from 'vitest';
import { parseUnit } from '../../lib/units/parseUnit.js';

// [spelling, dimension, factor to base units mol, kg, m, cell, dbar, °C]; SI prefixes from the BIPM SI Brochure (9th ed.), Table 7.
const SPELLINGS: [string, Record<string, number>, number][] = [
  ['nmol/kg', { amount: 1, mass: -1 }, 1e-9],
  ['nmol kg-1', { amount: 1, mass: -1 }, 1e-9],
  ['nmol kg^-1', { amount: 1, mass: -1 }, 1e-9],
  ['nmol kg⁻¹', { amount: 1, mass: -1 }, 1e-9],
  ['nM', { amount: 1, length: -3 }, 1e-6],
  ['nmol/L', { amount: 1, length: -3 }, 1e-6],
  ['nmol l-1', { amount: 1, length: -3 }, 1e-6],
  ['pmol/kg', { amount: 1, mass: -1 }, 1e-12],
  ['pmol/L', { amount: 1, length: -3 }, 1e-9],
  ['µmol/kg', { amount: 1, mass: -1 }, 1e-6],
  ['μmol/kg', { amount: 1, mass: -1 }, 1e-6],
  ['umol/kg', { amount: 1, mass: -1 }, 1e-6],
  ['µM', { amount: 1, length: -3 }, 1e-3],
  ['uM', { amount: 1, length: -3 }, 1e-3],
  ['mmol/m3', { amount: 1, length: -3 }, 1e-3],
  ['mmol m-3', { amount: 1, length: -3 }, 1e-3],
  ['mol/cell', { amount: 1, cell: -1 }, 1],
  ['fmol/cell', { amount: 1, cell: -1 }, 1e-15],
  ['amol/cell', { amount: 1, cell: -1 }, 1e-18],
  ['amol cell-1', { amount: 1, cell: -1 }, 1e-18],
  ['µm3', { length: 3 }, 1e-18],
  ['um^3', { length: 3 }, 1e-18],
  ['µm³', { length: 3 }, 1e-18],
  ['pg C/cell', { mass: 1, cell: -1 }, 1e-15],
  ['fg C/cell', { mass: 1, cell: -1 }, 1e-18],
  ['dbar', { pressure: 1 }, 1],
  ['m', { length: 1 }, 1],
  ['degC', { temperature: 1 }, 1],
  ['°C', { temperature: 1 }, 1],
  ['PSU', {}, 1],
  ['1', {}, 1],
];

describe('parseUnit(text)', () => {
  for (const [text, dimension, factor] of SPELLINGS) {
    it(`parseUnit("${text}") is ${JSON.stringify(dimension)} × ${factor}`, () => {
      const u = parseUnit(text);
      expect(u).not.toBeNull();
      expect(u!.dimension).toEqual(dimension);
      expect(u!.factor / factor).toBeCloseTo(1, 12);
    });
  }

  it('parseUnit("pg C/cell") names carbon as the substance', () => {
    expect(parseUnit('pg C/cell')!.substance).toBe('C');
    expect(parseUnit('pg/cell')!.substance).toBeUndefined();
  });

  for (const bad of ['nmol/kgg', '', 'kg/', 'C/cell', 'nmol kg^0', 'NM', 'xmol/kg', 'b.d.l.']) {
    it(`parseUnit(${JSON.stringify(bad)}) is null`, () => {
      expect(parseUnit(bad)).toBeNull();
    });
  }
});
