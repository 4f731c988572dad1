/** The match stage: ambient dissolved Fe, nutrients and hydrography for every cell, from bottles, else grids. */
import type * as aq from 'arquero';
import type { Ledger } from '../ledger/ledger.js';
import type { Grid } from '../types.js';
import { buildBottleIndex, stationKey } from './bottle-index.js';
import type { Profile, StationBottles } from './bottle-index.js';
import {
  DEFAULT_MAX_BRACKET_GAP_M,
  DEFAULT_MAX_GRID_DISTANCE_KM,
  defaultDepthTolerance,
  MATCH_QUANTITIES,
  REQUIRED_QUANTITIES,
} from './match-options.js';
import type { MatchOptions } from './match-options.js';
import {
  castNotFound,
  noAmbient,
  noBottleAtStation,
  noCellDepth,
  noGridValue,
  noPosition,
  noSampler,
  outsideTolerance,
  stationPosition,
} from './messages.js';
import { bracketingValue, nearestBottle } from './profile-lookup.js';
import { keepRowsWith, numberColumn, textColumn } from './table-columns.js';

/** Where an ambient value came from. */
export type AmbientSource = 'bottle' | 'bottle-interpolated' | 'grid' | 'none';

/** Output columns per quantity. */
interface QuantityColumns {
  value: Float64Array;
  source: AmbientSource[];
  offset: Float64Array;
  distance: Float64Array;
  quality: string[];
  belowDl: boolean[];
}

/** Columns sized for every input cell; written at the output row, trimmed at the end. */
function quantityColumns(n: number): QuantityColumns {
  return {
    value: new Float64Array(n),
    source: new Array<AmbientSource>(n),
    offset: new Float64Array(n),
    distance: new Float64Array(n),
    quality: new Array<string>(n),
    belowDl: new Array<boolean>(n),
  };
}

/** Suffixes of the per-quantity output columns, in output order. */
export const AMBIENT_SUFFIXES = ['', '_source', '_offset_m', '_distance_km', '_quality', '_below_dl'] as const;

function worse(a: string, b: string): string {
  const rank = (f: string) => (f === 'good' ? 0 : f === 'below_detection' ? 1 : 2);
  return rank(a) >= rank(b) ? a : b;
}

const NO_PROFILES: Profile[] = [];

/** Profiles the cell may use for one quantity: its own cast when both give one, else all the station's bottles. */
function candidateProfiles(record: StationBottles, q: string, cellCast: string): { nearest: Profile | null; casts: Profile[]; castMissing: boolean } {
  if (cellCast !== '' && record.labelled) {
    const own = record.byCast.get(cellCast)?.get(q) ?? null;
    return { nearest: own, casts: own === null ? NO_PROFILES : [own], castMissing: own === null };
  }
  return { nearest: record.all.get(q) ?? null, casts: record.castList.get(q) ?? NO_PROFILES, castMissing: false };
}

function put(cols: QuantityColumns, o: number, value: number, source: AmbientSource, offset: number, distance: number, quality: string, belowDl: boolean): void {
  cols.value[o] = value;
  cols.source[o] = source;
  cols.offset[o] = offset;
  cols.distance[o] = distance;
  cols.quality[o] = quality;
  cols.belowDl[o] = belowDl;
}

/**
 * Match each cell to ambient values of each quantity q, adding `ambient_<q>`, `ambient_<q>_source`, `ambient_<q>_offset_m`
 * (bottle depth offset, m), `ambient_<q>_distance_km` (grid), `ambient_<q>_quality`, `ambient_<q>_below_dl`, and
 * `position_source` ('cell' | 'station'). Order of preference: nearest bottle of the same cruise, station (and cast) within
 * the depth tolerance; linear interpolation between bracketing bottles of one cast; the first grid of q with a value.
 * A cell with no ambient dFe or nitrate stays (ledger 'flagged', 'no-ambient-<q>'); only a cell with no position is excluded.
 */
export function matchCells(
  cells: aq.ColumnTable,
  samples: aq.ColumnTable,
  grids: { quantity: string; grid: Grid }[],
  options: MatchOptions,
  ledger: Ledger,
): aq.ColumnTable {
  if (grids.length > 0 && options.sampleGrid === undefined) throw new Error(noSampler());
  const tableName = options.table ?? 'cells';
  const sampleNames = new Set(samples.columnNames());
  const quantities =
    options.quantities ??
    MATCH_QUANTITIES.filter(
      (q) => (REQUIRED_QUANTITIES as readonly string[]).includes(q) || sampleNames.has(q) || grids.some((g) => g.quantity === q),
    );
  const tolerance = options.depthToleranceM ?? defaultDepthTolerance;
  const toleranceAt = typeof tolerance === 'number' ? () => tolerance : tolerance;
  const interpolate = options.interpolateBracketing ?? true;
  const maxGap = options.maxBracketGapM ?? DEFAULT_MAX_BRACKET_GAP_M;
  const maxKm = options.maxGridDistanceKm ?? DEFAULT_MAX_GRID_DISTANCE_KM;
  const index = buildBottleIndex(samples, quantities);
  const gridsOf = new Map(quantities.map((q) => [q, grids.filter((g) => g.quantity === q).map((g) => g.grid)]));

  const cruise = textColumn(cells, 'cruise');
  const station = textColumn(cells, 'station');
  const cast = textColumn(cells, 'cast');
  const lat = numberColumn(cells, 'lat');
  const lon = numberColumn(cells, 'lon');
  const time = numberColumn(cells, 'time');
  const depth = numberColumn(cells, 'depth');
  const files = textColumn(cells, 'source_file');
  const lines = numberColumn(cells, 'source_line');
  const note = (i: number, action: 'excluded' | 'flagged' | 'converted', reason: string, detail: string) =>
    ledger.add({ table: tableName, file: files[i], line: Number.isFinite(lines[i]) ? lines[i] : 0, stage: 'match', action, reason, detail });

  const keep: number[] = [];
  const outLat: number[] = [];
  const outLon: number[] = [];
  const positionSource: string[] = [];
  const out = new Map<string, QuantityColumns>(
    quantities.map((q) => [q, quantityColumns(cells.numRows())]),
  );

  for (let i = 0; i < cells.numRows(); i++) {
    const record = index.get(stationKey(cruise[i], station[i]));
    let cellLat = lat[i];
    let cellLon = lon[i];
    let fromStation = false;
    if (!(Number.isFinite(cellLat) && Number.isFinite(cellLon))) {
      if (record === undefined || !Number.isFinite(record.lat)) {
        note(i, 'excluded', 'no-position', noPosition(cruise[i], station[i]));
        continue;
      }
      cellLat = record.lat;
      cellLon = record.lon;
      fromStation = true;
      note(i, 'converted', 'station-position', stationPosition(cruise[i], station[i], cellLat, cellLon));
    }
    const o = keep.length;
    keep.push(i);
    outLat.push(cellLat);
    outLon.push(cellLon);
    positionSource.push(fromStation ? 'station' : 'cell');
    const d = depth[i];
    const tol = toleranceAt(d);
    const timeMs = Number.isFinite(time[i]) ? time[i] : (record?.timeMs ?? Number.NaN);
    const month = Number.isFinite(timeMs) ? new Date(timeMs).getUTCMonth() + 1 : undefined;

    for (const q of quantities) {
      const cols = out.get(q)!;
      // Messages are built only for cells that end up flagged: most cells match, and strings cost.
      let why: () => string;
      if (!Number.isFinite(d)) why = noCellDepth;
      else if (record === undefined) why = () => noBottleAtStation(cruise[i], station[i]);
      else {
        const { nearest, casts, castMissing } = candidateProfiles(record, q, cast[i]);
        why = castMissing ? () => castNotFound(cast[i]) : () => noBottleAtStation(cruise[i], station[i]);
        if (nearest !== null) {
          const k = nearestBottle(nearest, d);
          const offset = nearest.depth[k] - d;
          if (Math.abs(offset) <= tol) {
            put(cols, o, nearest.value[k], 'bottle', offset, Number.NaN, nearest.quality[k], nearest.belowDl[k]);
            continue;
          }
          why = () => outsideTolerance(Math.abs(offset), tol);
          if (interpolate) {
            let best: { value: number; upper: number; lower: number } | null = null;
            let bestProfile: Profile | null = null;
            let bestGap = Number.POSITIVE_INFINITY;
            for (const profile of casts) {
              const b = bracketingValue(profile, d, maxGap);
              if (b === null) continue;
              const gap = profile.depth[b.lower] - profile.depth[b.upper];
              if (gap < bestGap) {
                best = b;
                bestProfile = profile;
                bestGap = gap;
              }
            }
            if (best !== null && bestProfile !== null) {
              const profile = bestProfile;
              const { upper, lower } = best;
              const up = d - profile.depth[upper];
              const down = profile.depth[lower] - d;
              // The offset reported is to the nearer of the two bottles, signed like a bottle match.
              const offsetNear = up <= down ? -up : down;
              put(cols, o, best.value, 'bottle-interpolated', offsetNear, Number.NaN, worse(profile.quality[upper], profile.quality[lower]), profile.belowDl[upper] || profile.belowDl[lower]);
              continue;
            }
          }
        }
      }
      const qGrids = gridsOf.get(q) ?? [];
      let hit: { value: number; distanceKm: number } | null = null;
      if (Number.isFinite(d)) {
        for (const grid of qGrids) {
          hit = options.sampleGrid!(grid, { lon: cellLon, lat: cellLat, depth: d, month, timeMs: Number.isFinite(timeMs) ? timeMs : undefined }, { maxDistanceKm: maxKm });
          if (hit !== null && Number.isFinite(hit.value)) break;
          hit = null;
        }
      }
      if (hit !== null) {
        put(cols, o, hit.value, 'grid', Number.NaN, hit.distanceKm, 'good', false);
        continue;
      }
      put(cols, o, Number.NaN, 'none', Number.NaN, Number.NaN, 'missing', false);
      // Only the quantities every cell needs are ledgered; an optional one (phosphate, T, S …) missing is normal.
      if ((REQUIRED_QUANTITIES as readonly string[]).includes(q)) note(i, 'flagged', `no-ambient-${q}`, noAmbient(q, `${why()}; ${noGridValue(maxKm, qGrids.length)}`));
    }
  }

  const added: [string, ArrayLike<unknown>][] = [
    ['lat', outLat],
    ['lon', outLon],
    ['position_source', positionSource],
  ];
  for (const q of quantities) {
    const c = out.get(q)!;
    const base = `ambient_${q}`;
    const m = keep.length;
    added.push(
      [base, c.value.subarray(0, m)],
      [`${base}_source`, c.source.slice(0, m)],
      [`${base}_offset_m`, c.offset.subarray(0, m)],
      [`${base}_distance_km`, c.distance.subarray(0, m)],
      [`${base}_quality`, c.quality.slice(0, m)],
      [`${base}_below_dl`, c.belowDl.slice(0, m)],
    );
  }
  return keepRowsWith(cells, keep, added);
}
