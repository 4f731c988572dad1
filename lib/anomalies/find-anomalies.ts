import type { Ledger } from '../ledger/ledger.js';
import { benjaminiHochberg } from '../stats/bh.js';
import { oneSampleT } from '../stats/one-sample-t.js';
import { wilcoxonSignedRank } from '../stats/wilcoxon.js';
import type { AnomalyGroup, AnomalyInput, AnomalyOptions, AnomalyResults, AnomalySettings } from './anomaly-types.js';
import { flagOf, leaveOneOut } from './leave-one-out.js';
import { badOption, noResidual, outsideRegions } from './messages.js';
import { pooledSd, samplingGap } from './sampling-gap.js';
import { stationMeans } from './station-means.js';

/** Defaults of the anomalies options (config `anomalies:`). */
export const ANOMALY_DEFAULTS: Readonly<Required<AnomalyOptions>> = { minStations: 5, fdrQ: 0.1, targetFold: 1.5, power: 0.8, level: 0.95 };

/**
 * Regional anomalies of fit residuals: cells averaged to stations, then per region × class a one-sample t test
 * of the station means against 0 with a Wilcoxon signed-rank check, Benjamini–Hochberg control of the false
 * discovery rate across all tested groups (Benjamini & Hochberg 1995, JRSS B 57:289), fold difference 10^mean,
 * leave-one-station-out robustness and the sampling gap. Cells without a residual or region are counted and,
 * with a ledger, recorded as 'flagged'.
 */
export function findAnomalies(cells: AnomalyInput, options: AnomalyOptions = {}, ledger?: Ledger): AnomalyResults {
  const settings = resolve(options);
  let cellsNoResidual = 0;
  let cellsNoRegion = 0;
  for (const cell of cells) {
    const reason = !Number.isFinite(cell.residual) ? 'no-residual' : cell.regionId === null ? 'no-region' : null;
    if (reason === null) continue;
    if (reason === 'no-residual') cellsNoResidual++;
    else cellsNoRegion++;
    ledger?.add({
      table: 'cells', file: cell.sourceFile ?? '', line: cell.sourceLine ?? 0, stage: 'anomalies', action: 'flagged', reason,
      detail: reason === 'no-residual' ? noResidual(cell.phytoClass) : outsideRegions(cell.lon, cell.lat),
    });
  }
  const grouped = stationMeans(cells);
  const values = grouped.map((g) => g.stations.map((s) => s.meanResidual));
  const pooled = pooledSd(values);
  const tests = values.map((xs) => oneSampleT(xs, 0, settings.level));
  const tested = values.map((xs) => xs.length >= settings.minStations);
  const pFamily = tests.map((t, g) => (tested[g] ? t.p : NaN));
  const bh = benjaminiHochberg(pFamily, settings.fdrQ);
  const groups: AnomalyGroup[] = grouped.map((g, k) => {
    const t = tests[k];
    const isTested = tested[k];
    const flag = isTested ? flagOf(t.mean, bh.rejected[k]) : 'not-tested';
    const w = isTested ? wilcoxonSignedRank(values[k]) : null;
    const half = (g.stations.length * (g.stations.length + 1)) / 4;
    const wilcoxonDirection = w ? Math.sign(w.statistic - half) : 0;
    const robustCheck = w === null ? null : w.p <= settings.fdrQ && wilcoxonDirection === Math.sign(t.mean) ? 'agrees' : 'disagrees';
    return {
      region: g.region,
      phytoClass: g.phytoClass,
      nStations: g.stations.length,
      nCells: g.stations.reduce((s, st) => s + st.nCells, 0),
      status: isTested ? 'tested' : 'not-tested',
      flag,
      meanResidual: num(t.mean),
      sd: num(t.sd),
      se: num(t.se),
      ciLow: num(t.ciLow),
      ciHigh: num(t.ciHigh),
      fold: num(10 ** t.mean),
      foldLow: num(10 ** t.ciLow),
      foldHigh: num(10 ** t.ciHigh),
      t: num(t.t),
      df: t.n >= 2 ? t.df : null,
      pValue: isTested ? num(t.p) : null,
      pAdjusted: isTested ? num(bh.adjusted[k]) : null,
      wilcoxon: w === null ? null : { statistic: w.statistic, p: num(w.p), method: w.method },
      robustCheck,
      leaveOneOut: isTested ? leaveOneOut(g.stations, k, pFamily, flag, settings.minStations, settings.fdrQ) : null,
      samplingGap: samplingGap(g.stations.length, pooled.sd, settings.alphaForPower, settings.power, settings.targetFold, settings.minStations),
      stations: g.stations,
    };
  });
  const stationKeys = new Set(grouped.flatMap((g) => g.stations.map((s) => `${s.cruise}\u0000${s.station}`)));
  return {
    settings,
    counts: {
      cellsIn: cells.length,
      cellsUsed: cells.length - cellsNoResidual - cellsNoRegion,
      cellsNoResidual,
      cellsNoRegion,
      stations: stationKeys.size,
      groups: groups.length,
      groupsTested: tested.filter(Boolean).length,
      groupsFlagged: groups.filter((g) => g.flag === 'lower-than-fit' || g.flag === 'higher-than-fit').length,
    },
    pooled,
    groups,
  };
}

function resolve(options: AnomalyOptions): AnomalySettings {
  const o = { ...ANOMALY_DEFAULTS, ...options };
  if (!(Number.isInteger(o.minStations) && o.minStations >= 2)) throw new RangeError(badOption('min_stations', o.minStations, 'an integer of at least 2'));
  if (!(o.fdrQ > 0 && o.fdrQ < 1)) throw new RangeError(badOption('fdr_q', o.fdrQ, 'strictly between 0 and 1'));
  if (!(o.targetFold > 1 && Number.isFinite(o.targetFold))) throw new RangeError(badOption('target_fold', o.targetFold, 'a number above 1'));
  if (!(o.power > o.fdrQ && o.power < 1)) throw new RangeError(badOption('power', o.power, 'above fdr_q and below 1'));
  if (!(o.level > 0 && o.level < 1)) throw new RangeError(badOption('level', o.level, 'strictly between 0 and 1'));
  return { minStations: o.minStations, fdrQ: o.fdrQ, targetFold: o.targetFold, power: o.power, alphaForPower: o.fdrQ, level: o.level };
}

function num(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
