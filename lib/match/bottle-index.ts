/** Bottles indexed once by cruise|station (and cast), with depth-sorted profiles per quantity. */
import type * as aq from 'arquero';
import { booleanColumn, numberColumn, textColumn } from './table-columns.js';

/** Usable bottles of one quantity, sorted by depth (ties by input row). */
export interface Profile {
  /** Depth in m, ascending. */
  depth: Float64Array;
  /** Value in canonical units. */
  value: Float64Array;
  /** Internal quality flag of each bottle ('good' when the table has none). */
  quality: string[];
  /** Below the detection limit (value already substituted upstream). */
  belowDl: boolean[];
  /** Cast label of each bottle ('' when none). */
  cast: string[];
}

/** One station: mean bottle position and time, and profiles of all its bottles and per cast. */
export interface StationBottles {
  /** Mean latitude of the positioned bottles, NaN when none. */
  lat: number;
  /** Circular mean longitude in [-180, 180), NaN when none. */
  lon: number;
  /** Mean bottle time, epoch ms, NaN when none. */
  timeMs: number;
  /** Profiles of all the station's bottles by quantity. */
  all: Map<string, Profile>;
  /** Profiles per cast label ('' for bottles without one) by quantity. */
  byCast: Map<string, Map<string, Profile>>;
  /** Per quantity, the cast profiles in label order (bracketing stays within one cast). */
  castList: Map<string, Profile[]>;
  /** True when any bottle of the station names its cast. */
  labelled: boolean;
}

/** Key of a station within a cruise. */
export function stationKey(cruise: string, station: string): string {
  return `${cruise}\u0000${station}`;
}

/** Circular mean of longitudes in degrees, so stations spanning the dateline stay put; result in [-180, 180). */
export function meanLongitude(lons: number[]): number {
  if (lons.length === 0) return Number.NaN;
  let s = 0;
  let c = 0;
  for (const lon of lons) {
    s += Math.sin((lon * Math.PI) / 180);
    c += Math.cos((lon * Math.PI) / 180);
  }
  const mean = (Math.atan2(s, c) * 180) / Math.PI;
  return mean >= 180 ? mean - 360 : mean;
}

const UNUSABLE = new Set(['bad', 'missing']);

function profileOf(rows: number[], depth: Float64Array, value: Float64Array, quality: string[], belowDl: boolean[], cast: string[]): Profile {
  const sorted = [...rows].sort((a, b) => depth[a] - depth[b] || a - b);
  return {
    depth: Float64Array.from(sorted, (i) => depth[i]),
    value: Float64Array.from(sorted, (i) => value[i]),
    quality: sorted.map((i) => quality[i]),
    belowDl: sorted.map((i) => belowDl[i]),
    cast: sorted.map((i) => cast[i]),
  };
}

/** Index the samples by cruise|station; a bottle is usable for a quantity when its value and depth are finite and its flag is not bad or missing. */
export function buildBottleIndex(samples: aq.ColumnTable, quantities: readonly string[]): Map<string, StationBottles> {
  const cruise = textColumn(samples, 'cruise');
  const station = textColumn(samples, 'station');
  const cast = textColumn(samples, 'cast');
  const lat = numberColumn(samples, 'lat');
  const lon = numberColumn(samples, 'lon');
  const time = numberColumn(samples, 'time');
  const depth = numberColumn(samples, 'depth');
  const hasQuality = new Set(samples.columnNames());
  const rowsByStation = new Map<string, number[]>();
  for (let i = 0; i < samples.numRows(); i++) {
    const key = stationKey(cruise[i], station[i]);
    let rows = rowsByStation.get(key);
    if (rows === undefined) rowsByStation.set(key, (rows = []));
    rows.push(i);
  }
  const columns = quantities.map((q) => ({
    q,
    value: numberColumn(samples, q),
    // An empty flag means the upstream stage gave none: treated as good, as for columns without flags.
    quality: hasQuality.has(`${q}_quality`)
      ? textColumn(samples, `${q}_quality`).map((f) => f || 'good')
      : new Array<string>(samples.numRows()).fill('good'),
    belowDl: booleanColumn(samples, `${q}_below_dl`),
  }));
  const index = new Map<string, StationBottles>();
  for (const [key, rows] of rowsByStation) {
    const positioned = rows.filter((i) => Number.isFinite(lat[i]) && Number.isFinite(lon[i]));
    const timed = rows.filter((i) => Number.isFinite(time[i]));
    const record: StationBottles = {
      lat: positioned.length > 0 ? positioned.reduce((s, i) => s + lat[i], 0) / positioned.length : Number.NaN,
      lon: meanLongitude(positioned.map((i) => lon[i])),
      timeMs: timed.length > 0 ? timed.reduce((s, i) => s + time[i], 0) / timed.length : Number.NaN,
      all: new Map(),
      byCast: new Map(),
      castList: new Map(),
      labelled: rows.some((i) => cast[i] !== ''),
    };
    for (const { q, value, quality, belowDl } of columns) {
      const usable = rows.filter((i) => Number.isFinite(value[i]) && Number.isFinite(depth[i]) && !UNUSABLE.has(quality[i]));
      if (usable.length === 0) continue;
      record.all.set(q, profileOf(usable, depth, value, quality, belowDl, cast));
      const castRows = new Map<string, number[]>();
      for (const i of usable) {
        let list = castRows.get(cast[i]);
        if (list === undefined) castRows.set(cast[i], (list = []));
        list.push(i);
      }
      for (const [label, list] of castRows) {
        let perCast = record.byCast.get(label);
        if (perCast === undefined) record.byCast.set(label, (perCast = new Map()));
        perCast.set(q, profileOf(list, depth, value, quality, belowDl, cast));
      }
      const labels = [...castRows.keys()].sort();
      record.castList.set(q, labels.map((label) => record.byCast.get(label)!.get(q)!));
    }
    index.set(key, record);
  }
  return index;
}
