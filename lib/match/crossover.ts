/** Cross-cruise consistency: deep dissolved-Fe differences at crossover stations, per cruise pair. Reported, never applied. */
import type * as aq from 'arquero';
import { haversineKm } from '../geo/haversine.js';
import { meanLongitude, stationKey } from './bottle-index.js';
import { numberColumn, textColumn } from './table-columns.js';

/** Options of `crossoverOffsets`. */
export interface CrossoverOptions {
  /** Largest distance (km) between two stations of different cruises; default 200 km. */
  maxDistanceKm?: number;
  /**
   * Largest time between the stations (days); default Infinity (no limit), because dFe below 1000 m changes little over the
   * years that usually separate cruises, and intercalibration crossovers are compared across years. Pairs with a missing
   * station time are skipped when a finite limit is set.
   */
  maxDaysApart?: number;
  /** Shallowest depth compared (m); default 1000 m, below the seasonally and biologically variable upper ocean. */
  minDepthM?: number;
  /** Spacing of the common depths (m) from minDepthM down; default 250 m. Ignored when commonDepths is given. */
  depthStepM?: number;
  /** Explicit common depths (m); default every depthStepM from minDepthM. */
  commonDepths?: number[];
  /** Largest gap (m) between two bottles interpolated to a common depth; default 500 m. No extrapolation. */
  maxGapM?: number;
  /** Offsets larger than this (nmol/kg) and beyond 2 standard errors are flagged; default 0.1 nmol/kg (our choice). */
  thresholdNmolKg?: number;
  /** Quality flags of bottles used; default ['good']. */
  qualities?: string[];
}

/** Deep dFe difference of one station pair (cruise_a − cruise_b, nmol/kg); cruise_a sorts before cruise_b. */
export interface StationPairDifference {
  cruise_a: string;
  station_a: string;
  cruise_b: string;
  station_b: string;
  /** Distance between the mean station positions, km. */
  distance_km: number;
  /** |time_a − time_b| in days; NaN when a time is missing. */
  days_apart: number;
  /** Common depths both profiles cover. */
  n_depths: number;
  /** Mean of the differences at the common depths, nmol/kg. */
  mean_difference: number;
}

/** Offset of one cruise pair: cruise_a reads `offset_nmol_kg` higher than cruise_b. */
export interface CruiseOffset {
  cruise_a: string;
  cruise_b: string;
  /** Mean of the station-pair mean differences, nmol/kg. */
  offset_nmol_kg: number;
  /** Standard error, nmol/kg: sd of station-pair means / √n_station_pairs; with one pair, sd of its depth differences / √n_depths. */
  se_nmol_kg: number;
  /** What the standard error is computed from. */
  se_basis: 'station-pairs' | 'depths';
  /** Common depths compared over all station pairs. */
  n_depths: number;
  /** Station pairs compared. */
  n_station_pairs: number;
  /** |offset| > threshold and |offset| > 2·SE (false when SE is undefined). */
  flagged: boolean;
}

interface StationProfile {
  cruise: string;
  station: string;
  lat: number;
  lon: number;
  timeMs: number;
  depth: number[];
  value: number[];
}

const DAY_MS = 86_400_000;

function profileAt(p: StationProfile, z: number, maxGapM: number): number {
  const { depth, value } = p;
  for (let k = 0; k < depth.length; k++) {
    if (depth[k] === z) return value[k];
    if (depth[k] > z) {
      if (k === 0 || depth[k] - depth[k - 1] > maxGapM) return Number.NaN;
      const w = (z - depth[k - 1]) / (depth[k] - depth[k - 1]);
      return value[k - 1] + w * (value[k] - value[k - 1]);
    }
  }
  return Number.NaN;
}

function stationProfiles(samples: aq.ColumnTable, qualities: Set<string>): StationProfile[] {
  const cruise = textColumn(samples, 'cruise');
  const station = textColumn(samples, 'station');
  const lat = numberColumn(samples, 'lat');
  const lon = numberColumn(samples, 'lon');
  const time = numberColumn(samples, 'time');
  const depth = numberColumn(samples, 'depth');
  const fe = numberColumn(samples, 'dissolved_fe');
  const hasQuality = samples.columnNames().includes('dissolved_fe_quality');
  const quality = textColumn(samples, 'dissolved_fe_quality');
  const rows = new Map<string, number[]>();
  for (let i = 0; i < samples.numRows(); i++) {
    const key = stationKey(cruise[i], station[i]);
    let list = rows.get(key);
    if (list === undefined) rows.set(key, (list = []));
    list.push(i);
  }
  const out: StationProfile[] = [];
  for (const list of rows.values()) {
    const first = list[0];
    const positioned = list.filter((i) => Number.isFinite(lat[i]) && Number.isFinite(lon[i]));
    if (positioned.length === 0) continue;
    const timed = list.filter((i) => Number.isFinite(time[i]));
    // Replicates at one depth are averaged so the profile is a function of depth.
    const byDepth = new Map<number, number[]>();
    for (const i of list) {
      if (!Number.isFinite(fe[i]) || !Number.isFinite(depth[i])) continue;
      if (hasQuality && !qualities.has(quality[i] || 'good')) continue;
      let vs = byDepth.get(depth[i]);
      if (vs === undefined) byDepth.set(depth[i], (vs = []));
      vs.push(fe[i]);
    }
    const depths = [...byDepth.keys()].sort((a, b) => a - b);
    out.push({
      cruise: cruise[first],
      station: station[first],
      lat: positioned.reduce((s, i) => s + lat[i], 0) / positioned.length,
      lon: meanLongitude(positioned.map((i) => lon[i])),
      timeMs: timed.length > 0 ? timed.reduce((s, i) => s + time[i], 0) / timed.length : Number.NaN,
      depth: depths,
      value: depths.map((z) => {
        const vs = byDepth.get(z)!;
        return vs.reduce((s, v) => s + v, 0) / vs.length;
      }),
    });
  }
  return out.sort((a, b) => (a.cruise < b.cruise ? -1 : a.cruise > b.cruise ? 1 : a.station < b.station ? -1 : a.station > b.station ? 1 : 0));
}

function sampleSd(xs: number[], mean: number): number {
  if (xs.length < 2) return Number.NaN;
  return Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / (xs.length - 1));
}

/**
 * Station pairs from different cruises within maxDistanceKm (haversine) and maxDaysApart: both dFe profiles interpolated
 * linearly to common depths below minDepthM and differenced (a − b); per cruise pair the mean offset, its standard error,
 * n depths, n station pairs and a flag. Crossover comparison in the manner of intercalibration practice (common practice).
 */
export function crossoverOffsets(samples: aq.ColumnTable, options: CrossoverOptions = {}): { pairs: StationPairDifference[]; offsets: CruiseOffset[] } {
  const maxKm = options.maxDistanceKm ?? 200;
  const maxDays = options.maxDaysApart ?? Number.POSITIVE_INFINITY;
  const minDepth = options.minDepthM ?? 1000;
  const step = options.depthStepM ?? 250;
  const maxGap = options.maxGapM ?? 500;
  const threshold = options.thresholdNmolKg ?? 0.1;
  const profiles = stationProfiles(samples, new Set(options.qualities ?? ['good']));
  const deepest = Math.max(0, ...profiles.map((p) => p.depth[p.depth.length - 1] ?? 0));
  const common = options.commonDepths ?? Array.from({ length: Math.max(0, Math.floor((deepest - minDepth) / step) + 1) }, (_, k) => minDepth + k * step);

  const pairs: (StationPairDifference & { differences: number[] })[] = [];
  for (let i = 0; i < profiles.length; i++) {
    for (let j = i + 1; j < profiles.length; j++) {
      const a = profiles[i];
      const b = profiles[j];
      if (a.cruise === b.cruise) continue;
      const km = haversineKm(a.lon, a.lat, b.lon, b.lat);
      if (km > maxKm) continue;
      const days = Math.abs(a.timeMs - b.timeMs) / DAY_MS;
      if (Number.isFinite(maxDays) && !(days <= maxDays)) continue;
      const differences: number[] = [];
      for (const z of common) {
        const d = profileAt(a, z, maxGap) - profileAt(b, z, maxGap);
        if (Number.isFinite(d)) differences.push(d);
      }
      if (differences.length === 0) continue;
      pairs.push({
        cruise_a: a.cruise,
        station_a: a.station,
        cruise_b: b.cruise,
        station_b: b.station,
        distance_km: km,
        days_apart: days,
        n_depths: differences.length,
        mean_difference: differences.reduce((s, x) => s + x, 0) / differences.length,
        differences,
      });
    }
  }

  const groups = new Map<string, typeof pairs>();
  for (const p of pairs) {
    const key = JSON.stringify([p.cruise_a, p.cruise_b]);
    let list = groups.get(key);
    if (list === undefined) groups.set(key, (list = []));
    list.push(p);
  }
  const offsets: CruiseOffset[] = [...groups.keys()].sort().map((key) => {
    const list = groups.get(key)!;
    const means = list.map((p) => p.mean_difference);
    const offset = means.reduce((s, x) => s + x, 0) / means.length;
    // Depths within one station pair are not independent; the station pair is the unit whenever there are two or more.
    const onePair = list.length === 1;
    const se = onePair
      ? sampleSd(list[0].differences, offset) / Math.sqrt(list[0].differences.length)
      : sampleSd(means, offset) / Math.sqrt(means.length);
    return {
      cruise_a: list[0].cruise_a,
      cruise_b: list[0].cruise_b,
      offset_nmol_kg: offset,
      se_nmol_kg: se,
      se_basis: onePair ? 'depths' : 'station-pairs',
      n_depths: list.reduce((s, p) => s + p.n_depths, 0),
      n_station_pairs: list.length,
      flagged: Math.abs(offset) > threshold && Math.abs(offset) > 2 * se,
    };
  });
  return { pairs: pairs.map(({ differences: _d, ...rest }) => rest), offsets };
}
