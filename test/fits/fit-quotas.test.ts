import { describe, expect, it } from 'vitest';
import { fitQuotas, residualsFromFit, type ClassFit, type FitResults, type PowerLawFit } from '../../lib/fits/index.js';
import { generateCells, type TrueClass } from './generate-cells.js';

// Scatter chosen so the error-variance ratio of log10 Fe:C to log10 dFe equals b², where OLS (attenuation < 1 %),
// SMA and York all estimate the same structural exponent (Warton et al. 2006, Biol. Rev. 81:259, §III.2).
const TRUTH: TrueClass[] = [
  { name: 'diatom', a: 1.0, b: 0.5, cellsPerStation: 3, stations: 30, feCRelSigma: 0.05 },
  { name: 'cyanobacteria', a: 0.6, b: 0.8, cellsPerStation: 3, stations: 30, feCRelSigma: 0.08 },
  { name: 'dinoflagellate', a: 0.8, b: 0.3, cellsPerStation: 1, stations: 5, feCRelSigma: 0.1 },
];

function fitted(r: FitResults, name: string): Extract<ClassFit, { fitted: true }> {
  const c = r.classes.find((k) => k.class === name);
  if (c === undefined || !c.fitted) throw new Error(`${name} not fitted`);
  return c;
}

function powerLaw(c: Extract<ClassFit, { fitted: true }>, model: 'ols' | 'sma' | 'york'): PowerLawFit {
  const m = c.models.find((f) => f.model === model);
  if (m === undefined || !m.fitted || m.model === 'saturating') throw new Error(`${model} not fitted`);
  return m;
}

const base = generateCells(TRUTH, 97);
// Three unusable cells appended: dFe 0, dFe NaN, Fe:C negative.
const input = {
  cellClass: [...base.cellClass, 'diatom', 'diatom', 'cyanobacteria'],
  station: [...base.station, 'st000', 'st001', 'st002'],
  dFe: [...base.dFe, 0, NaN, 0.3],
  feC: [...base.feC, 5, 5, -1],
  feCSigma: [...base.feCSigma, NaN, NaN, NaN],
};
const n = base.dFe.length;
// 99.9 % intervals: each misses the truth with probability 0.001, so the 12 checks below fail by chance with
// probability about 1 %; this test checks the fits are centred on the truth, calibration is test/stats/coverage.
const options = { level: 0.999, bootstrap: { n: 200, seed: 5 }, minCells: 10 } as const;
const results = fitQuotas(input, options);

describe('fitQuotas', () => {
  it('fitQuotas(input) recovers each class exponent: ols, sma and york analytic and bootstrap intervals contain the truth', () => {
    for (const t of TRUTH.slice(0, 2)) {
      const c = fitted(results, t.name);
      for (const m of ['ols', 'sma', 'york'] as const) {
        const e = powerLaw(c, m).parameters.exponent;
        expect(e.interval.lower, `${t.name} ${m}`).toBeLessThan(t.b);
        expect(e.interval.upper, `${t.name} ${m}`).toBeGreaterThan(t.b);
        expect(e.bootstrapInterval?.lower, `${t.name} ${m} bootstrap`).toBeLessThan(t.b);
        expect(e.bootstrapInterval?.upper, `${t.name} ${m} bootstrap`).toBeGreaterThan(t.b);
      }
      expect(c.nCells).toBe(90);
      expect(c.nStations).toBe(30);
    }
  });

  it('fitQuotas reports classes below minCells as not fitted', () => {
    const d = results.classes.find((c) => c.class === 'dinoflagellate');
    expect(d).toEqual({ class: 'dinoflagellate', fitted: false, nCells: 5, nStations: 5, reason: 'too few cells (5 < 10)' });
    expect(results.classes.map((c) => c.class)).toEqual(['cyanobacteria', 'diatom', 'dinoflagellate']);
  });

  it('fitQuotas returns non-positive and non-finite cells with reasons instead of fitting them', () => {
    expect(results.excluded).toEqual([
      { index: n, reason: 'non-positive-dfe', detail: 'dFe is 0; a positive finite value is needed for a log–log fit, so the cell is not fitted' },
      { index: n + 1, reason: 'non-finite-dfe', detail: 'dFe is NaN; a positive finite value is needed for a log–log fit, so the cell is not fitted' },
      { index: n + 2, reason: 'non-positive-fe-c', detail: 'Fe:C is -1; a positive finite value is needed for a log–log fit, so the cell is not fitted' },
    ]);
    expect(results.pooled.nCells).toBe(n);
  });

  it('fitQuotas is deterministic: same seed, identical JSON; another seed moves only the bootstrap', () => {
    const again = fitQuotas(input, options);
    expect(JSON.stringify(again)).toBe(JSON.stringify(results));
    const other = fitQuotas(input, { ...options, bootstrap: { n: 200, seed: 6 } });
    const a = powerLaw(fitted(results, 'diatom'), 'ols').parameters.exponent;
    const b = powerLaw(fitted(other, 'diatom'), 'ols').parameters.exponent;
    expect(b.estimate).toBe(a.estimate);
    expect(b.bootstrapInterval).not.toEqual(a.bootstrapInterval);
  });

  it('fitQuotas does not mutate its input', () => {
    const copy = structuredClone(input);
    fitQuotas(input, { ...options, bootstrap: { n: 20, seed: 1 } });
    expect(input).toEqual(copy);
  });

  it('fitQuotas bands nest: confidence inside prediction, curve inside confidence, grid over the class dFe range', () => {
    const c = fitted(results, 'diatom');
    const b = c.bands;
    expect(b.model).toBe('ols');
    expect(b.dFe).toHaveLength(50);
    expect(b.dFe[0]).toBe(c.dFeRange.lower);
    expect(b.dFe[49]).toBe(c.dFeRange.upper);
    for (let i = 0; i < 50; i++) {
      expect(b.predictionLower[i]).toBeLessThan(b.confidenceLower[i]);
      expect(b.confidenceLower[i]).toBeLessThan(b.fit[i]);
      expect(b.fit[i]).toBeLessThan(b.confidenceUpper[i]);
      expect(b.confidenceUpper[i]).toBeLessThan(b.predictionUpper[i]);
    }
  });

  it('fitQuotas with primary "auto" picks the lowest AICc among the ranked models', () => {
    const r = fitQuotas(input, { ...options, primary: 'auto', bootstrap: { n: 0, seed: 1 } });
    const c = fitted(r, 'cyanobacteria');
    const ranked = c.models.filter((m) => m.fitted && m.aicc !== null) as { model: string; aicc: number }[];
    expect(ranked.length).toBeGreaterThanOrEqual(1);
    const best = ranked.reduce((x, y) => (y.aicc < x.aicc ? y : x));
    expect(c.primary).toBe(best.model);
    // bootstrap off: no bootstrap intervals
    expect(powerLaw(c, 'ols').parameters.exponent.bootstrapInterval).toBeNull();
  });

  it('fitQuotas tests class differences: different exponents give a small equal-slopes p', () => {
    const d = results.classDifferences;
    expect(d.classes).toEqual(['cyanobacteria', 'diatom']);
    expect(d.ancova?.equalSlopes.df1).toBe(1);
    expect(d.ancova?.equalSlopes.p).toBeLessThan(1e-6);
    expect(d.pairwise).toHaveLength(1);
    expect(d.pairwise[0].classA).toBe('cyanobacteria');
    expect(d.pairwise[0].difference).toBeGreaterThan(0);
  });

  it('fitQuotas York reports MSWD near 1 when the stated errors are the true errors', () => {
    // The generator draws the scatter from the stated σ, so S/(n−2) should be close to 1 (York et al. 2004, §IV).
    const y = powerLaw(fitted(results, 'diatom'), 'york');
    expect(y.diagnostics.mswd).toBeGreaterThan(0.6);
    expect(y.diagnostics.mswd).toBeLessThan(1.5);
  });
});

describe('residualsFromFit', () => {
  it('residualsFromFit gives NaN for excluded cells and unfitted classes and zero-mean OLS residuals per class', () => {
    const r = residualsFromFit(input, results);
    expect(r).toHaveLength(input.dFe.length);
    expect(Number.isNaN(r[n])).toBe(true);
    expect(Number.isNaN(r[n + 2])).toBe(true);
    const dino = input.cellClass.findIndex((c) => c === 'dinoflagellate');
    expect(Number.isNaN(r[dino])).toBe(true);
    // Unweighted OLS residuals sum to zero within each class (normal equations).
    let s = 0;
    let k = 0;
    for (let i = 0; i < n; i++) {
      if (input.cellClass[i] === 'diatom') {
        s += r[i];
        k++;
      }
    }
    expect(Math.abs(s / k)).toBeLessThan(1e-12);
  });
});
