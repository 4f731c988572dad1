import { ancovaSlopes, pairwiseSlopeDifferences } from '../stats/index.js';
import { classData, type ClassData } from './class-data.js';
import { fitClass } from './fit-class.js';
import { badOption, columnLengths, tooFewCells, tooFewClasses, unusableValue } from './messages.js';
import type { ClassDifferences, ClassFit, ExcludedCell, FitInput, FitOptions, FitResults, ResolvedFitOptions } from './types.js';

/** Name of the pooled pseudo-class. */
export const POOLED = 'all';

/** Resolves fit options to their documented defaults and checks their ranges. */
export function resolveFitOptions(options: FitOptions = {}): ResolvedFitOptions {
  const o: ResolvedFitOptions = {
    models: [...(options.models ?? ['ols', 'sma', 'york', 'saturating'])],
    primary: options.primary ?? 'ols',
    bootstrap: { n: options.bootstrap?.n ?? 1000, seed: options.bootstrap?.seed ?? 1 },
    level: options.level ?? 0.95,
    minCells: options.minCells ?? 10,
    weighting: options.weighting ?? 'none',
    dFeRelativeSigma: options.dFeRelativeSigma ?? 0.1,
    saturatingScale: options.saturatingScale ?? 'log10',
    gridPoints: options.gridPoints ?? 50,
  };
  if (!(o.level > 0 && o.level < 1)) throw new RangeError(badOption('level', o.level, 'a number strictly between 0 and 1'));
  if (!(Number.isInteger(o.minCells) && o.minCells >= 3)) throw new RangeError(badOption('minCells', o.minCells, 'an integer ≥ 3'));
  if (!(Number.isInteger(o.bootstrap.n) && o.bootstrap.n >= 0)) throw new RangeError(badOption('bootstrap.n', o.bootstrap.n, 'an integer ≥ 0'));
  if (!(o.dFeRelativeSigma >= 0)) throw new RangeError(badOption('dFeRelativeSigma', o.dFeRelativeSigma, 'a number ≥ 0'));
  if (!(Number.isInteger(o.gridPoints) && o.gridPoints >= 2)) throw new RangeError(badOption('gridPoints', o.gridPoints, 'an integer ≥ 2'));
  if (o.models.length === 0) throw new RangeError(badOption('models', '[]', 'at least one model'));
  return o;
}

/** The fits stage: per class and pooled, power-law (ols, sma, york on log10–log10) and saturating fits of Fe:C (µmol mol⁻¹) on dFe (nmol kg⁻¹), with analytic and station-bootstrap intervals, AICc, the primary model's bands, and ANCOVA of the classes' log–log lines. */
export function fitQuotas(input: FitInput, options: FitOptions = {}): FitResults {
  const o = resolveFitOptions(options);
  const n = input.cellClass.length;
  for (const [name, col] of [
    ['station', input.station],
    ['dFe', input.dFe],
    ['feC', input.feC],
    ['feCSigma', input.feCSigma],
  ] as const) {
    if (col.length !== n) throw new RangeError(columnLengths(name, col.length, n));
  }
  const excluded: ExcludedCell[] = [];
  const byClass = new Map<string, number[]>();
  const valid: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = input.dFe[i];
    const y = input.feC[i];
    let bad: ExcludedCell | null = null;
    if (!Number.isFinite(x)) bad = { index: i, reason: 'non-finite-dfe', detail: unusableValue('dFe', x) };
    else if (!(x > 0)) bad = { index: i, reason: 'non-positive-dfe', detail: unusableValue('dFe', x) };
    else if (!Number.isFinite(y)) bad = { index: i, reason: 'non-finite-fe-c', detail: unusableValue('Fe:C', y) };
    else if (!(y > 0)) bad = { index: i, reason: 'non-positive-fe-c', detail: unusableValue('Fe:C', y) };
    if (bad !== null) {
      excluded.push(bad);
      continue;
    }
    valid.push(i);
    const c = input.cellClass[i];
    const list = byClass.get(c);
    if (list === undefined) byClass.set(c, [i]);
    else list.push(i);
  }
  const names = [...byClass.keys()].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const gather = (rows: number[]): ClassData => classData(rows, input.station, input.dFe, input.feC, input.feCSigma);
  const fitOrSkip = (name: string, rows: number[]): { fit: ClassFit; data: ClassData } => {
    const d = gather(rows);
    if (rows.length < o.minCells) {
      return { fit: { class: name, fitted: false, nCells: rows.length, nStations: d.nStations, reason: tooFewCells(rows.length, o.minCells) }, data: d };
    }
    return { fit: fitClass(name, d, o), data: d };
  };
  const perClass = names.map((c) => fitOrSkip(c, byClass.get(c) as number[]));
  const pooled = fitOrSkip(POOLED, valid).fit;
  return {
    options: o,
    excluded,
    classes: perClass.map((c) => c.fit),
    pooled,
    classDifferences: classDifferences(perClass, o.level),
  };
}

function classDifferences(perClass: { fit: ClassFit; data: ClassData }[], level: number): ClassDifferences {
  const used = perClass.filter((c) => c.fit.fitted);
  const classes = used.map((c) => c.fit.class);
  const notes = [
    'on log10 Fe:C against log10 dFe; cells are treated as independent, so with several cells per station the p values are optimistic',
    'pairwise intervals are per comparison (not adjusted for multiplicity)',
  ];
  if (used.length < 2) return { classes, ancova: null, pairwise: [], notes: [tooFewClasses(used.length), ...notes] };
  const groups = used.map((c) => ({ x: c.data.lx, y: c.data.ly }));
  const ancova = ancovaSlopes(groups);
  const pairwise = pairwiseSlopeDifferences(groups, { level, adjust: 'none' }).pairs.map((p) => ({
    ...p,
    classA: classes[p.i],
    classB: classes[p.j],
  }));
  return { classes, ancova, pairwise, notes };
}
