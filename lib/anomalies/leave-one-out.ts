import { benjaminiHochberg } from '../stats/bh.js';
import { oneSampleT } from '../stats/one-sample-t.js';
import type { AnomalyFlag, LeaveOneOut, StationInfluence, StationResidual } from './anomaly-types.js';

/** Flag of a group from its mean and whether BH rejected it. */
export function flagOf(mean: number, rejected: boolean): AnomalyFlag {
  if (!rejected) return 'none';
  return mean < 0 ? 'lower-than-fit' : mean > 0 ? 'higher-than-fit' : 'none';
}

/**
 * Leave-one-station-out check of group `g`: the t test is recomputed without each station in turn and the
 * BH decision redone with every other group's p fixed (pFamily, NaN for untested groups); a removal leaving
 * fewer than minStations stations leaves the group untested, which counts as no flag.
 */
export function leaveOneOut(
  stations: readonly StationResidual[],
  g: number,
  pFamily: readonly number[],
  flag: AnomalyFlag,
  minStations: number,
  fdrQ: number,
): LeaveOneOut {
  const values = stations.map((s) => s.meanResidual);
  const fullMean = values.reduce((s, v) => s + v, 0) / values.length;
  const removals: StationInfluence[] = stations.map((station, k) => {
    const rest = values.filter((_, i) => i !== k);
    const meanWithout = rest.length > 0 ? rest.reduce((s, v) => s + v, 0) / rest.length : NaN;
    if (rest.length < minStations) {
      return { cruise: station.cruise, station: station.station, meanResidual: station.meanResidual, meanWithout: finite(meanWithout), pWithout: null, flagWithout: 'none' };
    }
    const p = oneSampleT(rest).p;
    const family = pFamily.slice();
    family[g] = p;
    const rejected = !Number.isNaN(p) && benjaminiHochberg(family, fdrQ).rejected[g];
    return { cruise: station.cruise, station: station.station, meanResidual: station.meanResidual, meanWithout: finite(meanWithout), pWithout: finite(p), flagWithout: flagOf(meanWithout, rejected) };
  });
  const flagChanges = removals.filter((r) => r.flagWithout !== flag).length;
  // Ties go to the first station in (cruise, station) order, so the choice is deterministic.
  let most = 0;
  let weakest = 0;
  removals.forEach((r, k) => {
    if (Math.abs(values[k] - fullMean) > Math.abs(values[most] - fullMean)) most = k;
    if ((r.pWithout ?? 1) > (removals[weakest].pWithout ?? 1)) weakest = k;
  });
  return { flagStable: flagChanges === 0, flagChanges, mostInfluential: removals[most], weakestRemoval: removals[weakest] };
}

function finite(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
