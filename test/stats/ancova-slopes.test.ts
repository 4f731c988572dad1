import { describe, expect, it } from 'vitest';
import { ancovaSlopes } from '../../lib/stats/ancova-slopes.js';
import { fUpperP } from '../../lib/stats/distributions.js';
import { linearModel } from '../../lib/stats/linear-model.js';
import { pairwiseSlopeDifferences } from '../../lib/stats/pairwise-slope-differences.js';
import { expectRel } from './close.js';

// A small invented three-group dataset (no published answer: the check is against an independent dummy-coded fit).
const groups = [
  { x: [1, 2, 3, 4, 5, 6], y: [2.1, 2.9, 4.2, 4.8, 6.1, 7.2] },
  { x: [1.5, 2.5, 3.5, 4.5, 5.5], y: [3.9, 5.2, 5.8, 7.1, 8.4] },
  { x: [2, 3, 4, 5, 6, 7, 8], y: [1.0, 2.4, 2.9, 4.8, 5.1, 6.9, 7.7] },
];

/** Dummy-coded design columns: one indicator per group, then either one x column or one x·indicator per group. */
function design(separateSlopes: boolean, singleIntercept: boolean): { cols: number[][]; y: number[] } {
  const y = groups.flatMap((g) => g.y);
  const cols: number[][] = [];
  const k = groups.length;
  if (singleIntercept) cols.push(y.map(() => 1));
  else for (let j = 0; j < k; j++) cols.push(groups.flatMap((g, gj) => g.x.map(() => (gj === j ? 1 : 0))));
  if (separateSlopes) for (let j = 0; j < k; j++) cols.push(groups.flatMap((g, gj) => g.x.map((v) => (gj === j ? v : 0))));
  else cols.push(groups.flatMap((g) => g.x));
  return { cols, y };
}

describe('ancovaSlopes', () => {
  it('ancovaSlopes(groups) agrees with nested dummy-coded linear models', () => {
    const a = ancovaSlopes(groups);
    const full = design(true, false);
    const common = design(false, false);
    const single = design(false, true);
    const fFull = linearModel(full.cols, full.y);
    const fCommon = linearModel(common.cols, common.y);
    const fSingle = linearModel(single.cols, single.y);
    expectRel(a.rssSeparate, fFull.rss, 1e-10);
    expectRel(a.rssCommonSlope, fCommon.rss, 1e-10);
    expectRel(a.rssSingleLine, fSingle.rss, 1e-10);
    expectRel(a.commonSlope, fCommon.coefficients[3], 1e-10);
    for (let j = 0; j < 3; j++) {
      expectRel(a.slopes[j], fFull.coefficients[3 + j], 1e-10);
      expectRel(a.commonSlopeIntercepts[j], fCommon.coefficients[j], 1e-10);
    }
    const fS = (fCommon.rss - fFull.rss) / 2 / (fFull.rss / fFull.df);
    const fI = (fSingle.rss - fCommon.rss) / 2 / (fCommon.rss / fCommon.df);
    expect(a.equalSlopes.df1).toBe(2);
    expect(a.equalSlopes.df2).toBe(18 - 6);
    expect(a.equalIntercepts.df2).toBe(18 - 4);
    expectRel(a.equalSlopes.f, fS, 1e-9);
    expectRel(a.equalIntercepts.f, fI, 1e-9);
    expectRel(a.equalSlopes.p, fUpperP(fS, 2, 12), 1e-9);
  });

  it('ancovaSlopes finds no slope difference between parallel exact lines, and a large one between crossing lines', () => {
    const x = [1, 2, 3, 4, 5];
    const noise = [0.1, -0.1, 0.05, -0.05, 0];
    const parallel = ancovaSlopes([
      { x, y: x.map((v, i) => 1 + 2 * v + noise[i]) },
      { x, y: x.map((v, i) => 3 + 2 * v + noise[i]) },
    ]);
    // identical scatter about parallel lines: F = 0 for the slopes
    expect(parallel.equalSlopes.p).toBeGreaterThan(0.99);
    expect(parallel.equalIntercepts.p).toBeLessThan(1e-6);
    const crossing = ancovaSlopes([
      { x, y: x.map((v, i) => 1 + 2 * v + noise[i]) },
      { x, y: x.map((v, i) => 10 - 2 * v - noise[i]) },
    ]);
    expect(crossing.equalSlopes.p).toBeLessThan(1e-6);
  });

  it('ancovaSlopes rejects a single group', () => {
    expect(() => ancovaSlopes([groups[0]])).toThrow(
      'the comparison of slopes needs at least 2 groups of at least 3 points each, got 1 usable groups',
    );
  });
});

describe('pairwiseSlopeDifferences', () => {
  it('pairwiseSlopeDifferences(groups) matches the contrast of the dummy-coded separate-lines model', () => {
    const full = design(true, false);
    const f = linearModel(full.cols, full.y);
    const r = pairwiseSlopeDifferences(groups);
    expect(r.adjust).toBe('none');
    expect(r.pairs.map((p) => [p.i, p.j])).toEqual([
      [0, 1],
      [0, 2],
      [1, 2],
    ]);
    const p = f.covariance;
    const P = f.p;
    for (const d of r.pairs) {
      const a = 3 + d.i;
      const b = 3 + d.j;
      expectRel(d.difference, f.coefficients[a] - f.coefficients[b], 1e-10);
      const v = p[a * P + a] + p[b * P + b] - 2 * p[a * P + b];
      expectRel(d.se, Math.sqrt(v), 1e-9);
    }
  });

  it('pairwiseSlopeDifferences with bonferroni widens the intervals and inflates p', () => {
    const a = pairwiseSlopeDifferences(groups);
    const b = pairwiseSlopeDifferences(groups, { adjust: 'bonferroni' });
    expect(b.pairs[0].interval.upper - b.pairs[0].interval.lower).toBeGreaterThan(
      a.pairs[0].interval.upper - a.pairs[0].interval.lower,
    );
    expectRel(b.pairs[1].p, Math.min(1, 3 * a.pairs[1].p), 1e-12);
  });
});
