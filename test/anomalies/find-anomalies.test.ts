import { describe, expect, it } from 'vitest';
import { findAnomalies } from '../../lib/anomalies/find-anomalies.js';
import { Ledger } from '../../lib/ledger/ledger.js';
import { benjaminiHochberg } from '../../lib/stats/bh.js';
import { powerMinDetectable, stationsNeeded } from '../../lib/stats/power.js';
import { stationDraws, syntheticCells } from './helpers.js';

const regions = ['r1', 'r2', 'r3', 'r4', 'r5'];
const spec = regions.map((region, k) => ({ region, stationMeans: stationDraws(12, region === 'r3' ? -0.3 : 0, 0.1, 0.11 + k / 10) }));
const cells = syntheticCells(spec);

describe('findAnomalies', () => {
  it('findAnomalies(cells) flags the one depleted region lower-than-fit and no null region', () => {
    const r = findAnomalies(cells, { fdrQ: 0.1, minStations: 5 });
    expect(r.groups.map((g) => [g.region, g.flag])).toEqual([
      ['r1', 'none'], ['r2', 'none'], ['r3', 'lower-than-fit'], ['r4', 'none'], ['r5', 'none'],
    ]);
    const r3 = r.groups[2];
    expect(r3.nStations).toBe(12);
    expect(r3.nCells).toBe(48);
    expect(r3.robustCheck).toBe('agrees');
    // The planted depletion is −0.3 log10, a fold of 10^−0.3 ≈ 0.50; the interval must cover it.
    expect(r3.foldLow as number).toBeLessThan(10 ** -0.3);
    expect(r3.foldHigh as number).toBeGreaterThan(10 ** -0.3);
    expect(r3.fold).toBeCloseTo(10 ** (r3.meanResidual as number), 12);
    expect(r3.leaveOneOut?.flagStable).toBe(true);
    expect(r.counts).toEqual({ cellsIn: 240, cellsUsed: 240, cellsNoResidual: 0, cellsNoRegion: 0, stations: 60, groups: 5, groupsTested: 5, groupsFlagged: 1 });
  });

  it('findAnomalies(cells) adjusts p across all tested groups by Benjamini–Hochberg', () => {
    const r = findAnomalies(cells);
    const bh = benjaminiHochberg(r.groups.map((g) => g.pValue as number), 0.1);
    r.groups.forEach((g, k) => expect(g.pAdjusted).toBeCloseTo(bh.adjusted[k], 14));
  });

  it('findAnomalies(cells) flags a raised region higher-than-fit', () => {
    const raised = syntheticCells([{ region: 'up', stationMeans: stationDraws(10, 0.25, 0.1, 0.3) }, { region: 'zero', stationMeans: stationDraws(10, 0, 0.1, 0.4) }]);
    expect(findAnomalies(raised).groups.map((g) => g.flag)).toEqual(['higher-than-fit', 'none']);
  });

  it('findAnomalies(cells, { minStations }) leaves small groups not-tested and out of the BH family', () => {
    const small = syntheticCells([...spec, { region: 'r0', stationMeans: [-0.5, -0.6, -0.55] }]);
    const r = findAnomalies(small, { minStations: 5 });
    const r0 = r.groups[0];
    expect(r0.region).toBe('r0');
    expect(r0.status).toBe('not-tested');
    expect(r0.flag).toBe('not-tested');
    expect(r0.pValue).toBeNull();
    expect(r0.pAdjusted).toBeNull();
    expect(r0.leaveOneOut).toBeNull();
    expect(r0.meanResidual).toBeCloseTo(-0.55, 12);
    expect(r.counts.groupsTested).toBe(5);
    // The family is the 5 tested groups, as without r0.
    expect(r.groups.slice(1).map((g) => g.pAdjusted)).toEqual(findAnomalies(cells).groups.map((g) => g.pAdjusted));
  });

  it('findAnomalies(cells) names the station a fragile flag leans on (leave-one-station-out)', () => {
    // Six stations near zero, two moderately low and the planted station lowest: p ≈ 0.11 with it, ≈ 0.24 without.
    const crafted = syntheticCells([{ region: 'frag', stationMeans: [-0.06, 0.04, -0.03, 0.05, -0.01, 0.02, -0.14, -0.16, -0.2] }]);
    const planted = 'frag-s08';
    const g = findAnomalies(crafted, { fdrQ: 0.12, minStations: 5 }).groups[0];
    expect(g.flag).toBe('lower-than-fit');
    expect(g.leaveOneOut?.flagStable).toBe(false);
    expect(g.leaveOneOut?.weakestRemoval.station).toBe(planted);
    expect(g.leaveOneOut?.weakestRemoval.cruise).toBe('C1');
    expect(g.leaveOneOut?.weakestRemoval.flagWithout).toBe('none');
    expect(g.leaveOneOut?.mostInfluential.station).toBe(planted);
  });

  it('findAnomalies(cells) names an outlying station as most influential on the mean', () => {
    const means = [...stationDraws(9, -0.3, 0.05, 0.9), 0.4];
    const g = findAnomalies(syntheticCells([{ region: 'out', stationMeans: means }])).groups[0];
    expect(g.leaveOneOut?.mostInfluential.station).toBe('out-s09');
    expect(g.leaveOneOut?.mostInfluential.meanWithout).toBeCloseTo(means.slice(0, 9).reduce((a, b) => a + b) / 9, 12);
  });

  it('findAnomalies(cells) gives the sampling gap from the pooled between-station SD at α = fdrQ', () => {
    const mixed = syntheticCells([...spec, { region: 'r6', stationMeans: stationDraws(30, 0, 0.1, 0.77) }]);
    const r = findAnomalies(mixed, { fdrQ: 0.1, targetFold: 1.5 });
    const sd = r.pooled.sd as number;
    expect(r.pooled.df).toBe(5 * 11 + 29);
    const g1 = r.groups[0];
    expect(g1.samplingGap.minDetectableFold).toBeCloseTo(10 ** powerMinDetectable(12, sd, 0.1, 0.8), 12);
    expect(g1.samplingGap.stationsForTargetFold).toBe(Math.max(5, stationsNeeded(Math.log10(1.5), sd, 0.1, 0.8)));
    expect(g1.samplingGap.additionalStations).toBe(Math.max(0, (g1.samplingGap.stationsForTargetFold as number) - 12));
    const g6 = r.groups[5];
    expect(g6.samplingGap.minDetectableFold as number).toBeLessThan(g1.samplingGap.minDetectableFold as number);
    expect(r.settings.alphaForPower).toBe(0.1);
  });

  it('findAnomalies(cells, options, ledger) counts and ledgers cells without residual or region', () => {
    const extra = [
      { ...cells[0], residual: NaN, sourceLine: 900 },
      { ...cells[1], regionId: null, lon: 1.5, lat: -2, sourceLine: 901 },
    ];
    const ledger = new Ledger();
    const r = findAnomalies([...cells, ...extra], {}, ledger);
    expect(r.counts.cellsNoResidual).toBe(1);
    expect(r.counts.cellsNoRegion).toBe(1);
    expect(r.counts.cellsUsed).toBe(240);
    expect(ledger.entries).toEqual([
      { table: 'cells', file: 'cells.csv', line: 900, stage: 'anomalies', action: 'flagged', reason: 'no-residual', detail: 'cell of class diatom has no residual from the fit; it is left out of the regional anomaly tests' },
      { table: 'cells', file: 'cells.csv', line: 901, stage: 'anomalies', action: 'flagged', reason: 'no-region', detail: 'cell at lon 1.5, lat -2 lies in none of the regions; it is left out of the regional anomaly tests' },
    ]);
  });

  it('findAnomalies(cells) averages cells to stations before testing', () => {
    // One station with many cells must weigh as one station.
    const heavy = syntheticCells([{ region: 'h', stationMeans: [0.1, -0.1, 0.05, -0.05, 0.0] }]);
    const more = syntheticCells([{ region: 'h', stationMeans: [0.1], cellsPerStation: 40 }], 0.9).map((c) => ({ ...c, stationKey: 'h-s00' }));
    const g = findAnomalies([...heavy, ...more]).groups[0];
    expect(g.nStations).toBe(5);
    expect(g.nCells).toBe(60);
    expect(g.meanResidual).toBeCloseTo(0, 12);
  });

  it('findAnomalies(cells) is deterministic, order-independent, with stable keys, and does not mutate input', () => {
    const copy = JSON.parse(JSON.stringify(cells));
    const a = JSON.stringify(findAnomalies(cells));
    const shuffled = cells.slice().reverse();
    expect(JSON.stringify(findAnomalies(shuffled))).toBe(a);
    expect(JSON.parse(JSON.stringify(cells))).toEqual(copy);
    expect(Object.keys(findAnomalies(cells).groups[0])).toEqual([
      'region', 'phytoClass', 'nStations', 'nCells', 'status', 'flag', 'meanResidual', 'sd', 'se', 'ciLow', 'ciHigh',
      'fold', 'foldLow', 'foldHigh', 't', 'df', 'pValue', 'pAdjusted', 'wilcoxon', 'robustCheck', 'leaveOneOut', 'samplingGap', 'stations',
    ]);
    expect(a.includes('NaN')).toBe(false);
  });

  it('findAnomalies(cells, options) refuses out-of-range options', () => {
    expect(() => findAnomalies(cells, { fdrQ: 1.5 })).toThrow('anomalies.fdr_q must be strictly between 0 and 1, got 1.5');
    expect(() => findAnomalies(cells, { minStations: 1 })).toThrow('anomalies.min_stations must be an integer of at least 2, got 1');
  });
});
