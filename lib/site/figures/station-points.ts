// Distinct sampling stations of the bottle table, with their mean position.
import type * as aq from 'arquero';
import { columnValues } from './cell-rows.js';

/** One station: cruise, station id and mean position in degrees. */
export interface StationRow {
  /** Cruise identifier. */
  cruise: string;
  /** Station identifier. */
  station: string;
  /** Degrees north. */
  lat: number;
  /** Degrees east. */
  lon: number;
  /** Bottle rows at the station. */
  samples: number;
}

/** Stations of a table with cruise, station, lat and lon columns, sorted by cruise then station. */
export function stationPoints(table: aq.ColumnTable): StationRow[] {
  const [cruise, station, lat, lon] = ['cruise', 'station', 'lat', 'lon'].map((c) => columnValues(table, c));
  const by = new Map<string, StationRow & { sumLat: number; sumLon: number }>();
  for (let i = 0; i < cruise.length; i++) {
    const la = lat[i];
    const lo = lon[i];
    if (typeof la !== 'number' || typeof lo !== 'number' || !Number.isFinite(la) || !Number.isFinite(lo)) continue;
    const key = `${String(cruise[i])}\u0000${String(station[i])}`;
    const s = by.get(key) ?? { cruise: String(cruise[i]), station: String(station[i]), lat: 0, lon: 0, samples: 0, sumLat: 0, sumLon: 0 };
    s.samples++;
    s.sumLat += la;
    s.sumLon += lo;
    by.set(key, s);
  }
  return [...by.values()]
    .map((s) => ({ cruise: s.cruise, station: s.station, lat: s.sumLat / s.samples, lon: s.sumLon / s.samples, samples: s.samples }))
    .sort((a, b) => (a.cruise < b.cruise ? -1 : a.cruise > b.cruise ? 1 : a.station < b.station ? -1 : a.station > b.station ? 1 : 0));
}
