import * as aq from 'arquero';
import { describe, expect, it } from 'vitest';
import { Ledger } from '../../lib/ledger/index.js';
import { computeQuotas } from '../../lib/quotas/index.js';
import type { QuotaOptions } from '../../lib/quotas/index.js';
import { unknownClass } from '../../lib/quotas/messages.js';

const options: QuotaOptions = {
  classes: {
    diatom: { aliases: ['Bacillariophyceae', 'diatoms'], carbon: 'biovolume-diatom', relativeError: 0.3, minFeC: { value: 2, citation: 'test value' } },
    dinoflagellate: { aliases: ['dino'], carbon: 'biovolume-protist', relativeError: 0.3 },
    measured: { aliases: [], carbon: 'measured', relativeError: 0.1 },
    cyanobacteria: { aliases: ['Synechococcus'], carbon: 'phosphorus', relativeError: 0.2 },
    pico: { aliases: [], carbon: 'biovolume-factor', relativeError: 0.5 },
  },
};

function cells(rows: Record<string, unknown>[]): aq.ColumnTable {
  const base = { cell_id: '', phyto_class: '', biovolume: Number.NaN, carbon: Number.NaN, carbon_sigma: Number.NaN, fe: Number.NaN, fe_sigma: Number.NaN, p: Number.NaN, p_sigma: Number.NaN, mn: Number.NaN, mn_sigma: Number.NaN, source_file: 'cells.csv', source_line: 0 };
  return aq.from(rows.map((r, i) => ({ ...base, source_line: i + 2, ...r })));
}

describe('computeQuotas(cells, options, ledger)', () => {
  it('gives Fe:C in µmol/mol and Fe:P in mmol/mol for a worked cell', () => {
    // Fe 1e-18 mol, C 1e-12 mol: Fe:C = 1e-6 mol/mol = 1 µmol/mol; P 1e-14 mol: Fe:P = 1e-4 mol/mol = 0.1 mmol/mol.
    // Consistency: Fe:C = Fe:P · P:C = 0.1e-3 · (1e-14 / 1e-12) = 1e-6 mol/mol. C:Fe = 1e6 mol/mol.
    const out = computeQuotas(cells([{ cell_id: 'a', phyto_class: 'measured', carbon: 1e-12, fe: 1e-18, p: 1e-14 }]), options, new Ledger());
    expect(out.get('fe_c', 0)).toBeCloseTo(1, 12);
    expect(out.get('fe_p', 0)).toBeCloseTo(0.1, 12);
    expect(out.get('c_fe', 0)).toBeCloseTo(1e6, 4);
    expect(out.get('carbon_method', 0)).toBe('measured');
  });

  it('propagates element and carbon errors to first order (hand-worked)', () => {
    // Fe = 2e-18 ± 0.2e-18 mol (10 %), C = 1e-12 ± 0.2e-12 mol (20 %, its own sigma), P = 1e-14 ± 1e-15 (10 %).
    // Fe:C = 2e-18/1e-12·1e6 = 2 µmol/mol; rel = √(0.1² + 0.2²) = √0.05 = 0.2236068 → σ = 0.4472136.
    // Fe:P = 2e-18/1e-14·1e3 = 0.2 mmol/mol; rel = √(0.1² + 0.1²) = 0.1414214 → σ = 0.02828427.
    // C:Fe = 1e6/2 = 5e5 mol/mol, same relative error → σ = 111803.4.
    // Mn = 1e-18 ± 0 → Mn:C = 1 µmol/mol, σ = 1·0.2 = 0.2 (carbon only).
    const out = computeQuotas(
      cells([{ phyto_class: 'measured', carbon: 1e-12, carbon_sigma: 0.2e-12, fe: 2e-18, fe_sigma: 0.2e-18, p: 1e-14, p_sigma: 1e-15, mn: 1e-18, mn_sigma: 0 }]),
      options,
      new Ledger(),
    );
    expect(out.get('fe_c', 0)).toBeCloseTo(2, 12);
    expect(out.get('fe_c_sigma', 0)).toBeCloseTo(0.4472135955, 9);
    expect(out.get('fe_p', 0)).toBeCloseTo(0.2, 12);
    expect(out.get('fe_p_sigma', 0)).toBeCloseTo(0.02828427125, 10);
    expect(out.get('c_fe', 0)).toBeCloseTo(5e5, 6);
    expect(out.get('c_fe_sigma', 0)).toBeCloseTo(111803.39887, 4);
    expect(out.get('mn_c', 0)).toBeCloseTo(1, 12);
    expect(out.get('mn_c_sigma', 0)).toBeCloseTo(0.2, 12);
  });

  it('uses the class relative error when measured carbon has no sigma', () => {
    // Fe with zero sigma, carbon relative error 0.1 from the class → Fe:C sigma = 10 % of 1.
    const out = computeQuotas(cells([{ phyto_class: 'measured', carbon: 1e-12, fe: 1e-18, fe_sigma: 0 }]), options, new Ledger());
    expect(out.get('carbon_sigma_mol', 0)).toBeCloseTo(1e-13, 25);
    expect(out.get('fe_c_sigma', 0)).toBeCloseTo(0.1, 12);
  });

  it('takes diatom carbon from biovolume by Menden-Deuer & Lessard and computes the luxury index', () => {
    // 1000 µm³ diatom: 77.9830110523259 pg C (Menden-Deuer & Lessard 2000, log form) = 77.983…e-12 g / 12.011 g/mol.
    const carbon = 77.9830110523259e-12 / 12.011;
    const fe = 4 * carbon * 1e-6; // chosen so Fe:C = 4 µmol/mol
    const out = computeQuotas(cells([{ phyto_class: ' bacillariophyceae ', biovolume: 1000, fe, fe_sigma: 0 }]), options, new Ledger());
    expect(out.get('class', 0)).toBe('diatom');
    expect(out.get('carbon_mol', 0) as number).toBeCloseTo(carbon, 24);
    expect(out.get('carbon_method', 0)).toBe('biovolume-diatom');
    expect(out.get('fe_c', 0)).toBeCloseTo(4, 10);
    // luxury index = 4 / 2 (class minimum given in the options).
    expect(out.get('luxury_index', 0)).toBeCloseTo(2, 10);
    expect(out.get('carbon_sigma_mol', 0) as number).toBeCloseTo(0.3 * carbon, 24);
  });

  it('falls back to the cell shape when biovolume is missing', () => {
    // Sphere of diameter 10 µm: π/6·1000 = 523.599 µm³ (Hillebrand et al. 1999); protist 10^(−0.665)·V^0.939 pg.
    const v = (Math.PI / 6) * 1000;
    const pg = 10 ** (-0.665 + 0.939 * Math.log10(v));
    const out = computeQuotas(cells([{ phyto_class: 'dino', cell_shape: 'sphere', cell_length: 10, fe: 1e-18, fe_sigma: 0 }]), options, new Ledger());
    expect(out.get('carbon_mol', 0) as number).toBeCloseTo(pg * 1e-12 / 12.011, 24);
  });

  it('takes carbon from phosphorus by Redfield 106 with the P error added', () => {
    // C = 1e-15 · 106 = 1.06e-13 mol (Redfield 1963); rel σ = √(0.2² + 0.1²) = 0.2236068.
    const out = computeQuotas(cells([{ phyto_class: 'Synechococcus', p: 1e-15, p_sigma: 1e-16, fe: 1e-19, fe_sigma: 0 }]), options, new Ledger());
    expect(out.get('carbon_mol', 0) as number).toBeCloseTo(1.06e-13, 26);
    expect((out.get('carbon_sigma_mol', 0) as number) / 1.06e-13).toBeCloseTo(0.2236067977, 9);
  });

  it('excludes unknown classes, non-positive Fe and missing carbon, one ledger entry each', () => {
    const input = cells([
      { cell_id: 'ok', phyto_class: 'measured', carbon: 1e-12, fe: 1e-18, fe_sigma: 1e-19 },
      { cell_id: 'unknown', phyto_class: 'Haptophyte', carbon: 1e-12, fe: 1e-18, fe_sigma: 1e-19 },
      { cell_id: 'zero-fe', phyto_class: 'measured', carbon: 1e-12, fe: 0, fe_sigma: 1e-19 },
      { cell_id: 'no-carbon', phyto_class: 'diatom', fe: 1e-18, fe_sigma: 1e-19 },
      { cell_id: 'no-p', phyto_class: 'cyanobacteria', fe: 1e-18, fe_sigma: 1e-19 },
    ]);
    const ledger = new Ledger();
    const out = computeQuotas(input, options, ledger);
    expect(out.array('cell_id')).toEqual(['ok']);
    const excluded = ledger.excluded('cells');
    expect(excluded.map((e) => [e.line, e.reason])).toEqual([
      [3, 'unknown-class'],
      [4, 'non-positive-content'],
      [5, 'no-carbon'],
      [6, 'no-carbon'],
    ]);
    expect(excluded[0].detail).toBe(unknownClass('Haptophyte'));
    expect(excluded[0].detail).toBe('phyto_class "Haptophyte" matches no configured class or alias; cell excluded (classes are never guessed)');
    expect(excluded[2].detail).toBe('no carbon by method biovolume-diatom: biovolume (or a known cell_shape with its dimensions) missing; cell excluded');
    // Ledger invariant: rows in = rows out + rows excluded.
    expect(out.numRows() + excluded.length).toBe(input.numRows());
  });

  it('flags a cell without Fe sigma and leaves its sigmas empty', () => {
    const ledger = new Ledger();
    const out = computeQuotas(cells([{ phyto_class: 'measured', carbon: 1e-12, fe: 1e-18 }]), options, ledger);
    expect(out.get('fe_c_sigma', 0)).toBeNaN();
    expect(ledger.entries.map((e) => [e.action, e.reason, e.detail])).toEqual([['flagged', 'no-sigma', 'fe_sigma missing; fe ratios have no uncertainty']]);
  });

  it('appends the quota columns in a stable order and does not mutate its input', () => {
    const input = cells([{ phyto_class: 'measured', carbon: 1e-12, fe: 1e-18, fe_sigma: 0 }]);
    const before = JSON.stringify(input.objects());
    const namesBefore = input.columnNames();
    const out = computeQuotas(input, options, new Ledger());
    expect(JSON.stringify(input.objects())).toBe(before);
    expect(input.columnNames()).toEqual(namesBefore);
    expect(out.columnNames().slice(namesBefore.length)).toEqual([
      'class', 'carbon_mol', 'carbon_method', 'carbon_sigma_mol', 'fe_c', 'fe_c_sigma', 'fe_p', 'fe_p_sigma',
      'p_c', 'p_c_sigma', 'mn_c', 'mn_c_sigma', 'mn_p', 'mn_p_sigma', 'luxury_index', 'c_fe', 'c_fe_sigma',
    ]);
  });

  it('refuses an alias claimed by two classes', () => {
    const bad: QuotaOptions = { classes: { a: { aliases: ['x'], carbon: 'measured', relativeError: 0 }, b: { aliases: ['X '], carbon: 'measured', relativeError: 0 } } };
    expect(() => computeQuotas(cells([]), bad, new Ledger())).toThrow('class alias "X " is listed for both "a" and "b"');
  });
});
