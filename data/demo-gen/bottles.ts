/** CTD casts and their bottles for one cruise, drawn from the truth fields with measurement noise. */
import { pressureFromDepth } from '../../lib/units/index.js';
import type { Rng } from './rng.js';
import { BOTTLE_DEPTHS, stationName, type Cruise } from './scenario.js';
import { CROSSOVER_OFFSET } from './truth-model.js';
import { truthField } from './truth-fields.js';

/** One bottle in canonical units (before the file layout converts and rounds). */
export interface Bottle {
  /** Cruise id. */
  cruise: string;
  /** Station name. */
  station: string;
  /** 0-based station index within the cruise. */
  stationIndex: number;
  /** Cast number as text. */
  cast: string;
  /** Bottle (rosette position) number, 1 = deepest. */
  bottle: number;
  /** Latitude, degrees north. */
  lat: number;
  /** Longitude, degrees east. */
  lon: number;
  /** Sampling time, ISO 8601 UTC. */
  time: string;
  /** Month 1–12 of the sampling time. */
  month: number;
  /** Nominal depth, m. */
  depth: number;
  /** Sea pressure at the nominal depth, dbar. */
  pressure: number;
  /** In-situ temperature, °C (ITS-90). */
  temperature: number;
  /** Practical salinity. */
  salinity: number;
  /** dFe, nmol/kg, including any injected crossover offset. */
  dissolvedFe: number;
  /** Nitrate, µmol/kg. */
  nitrate: number;
  /** Phosphate, µmol/kg. */
  phosphate: number;
  /** Silicate, µmol/kg. */
  silicate: number;
}

/** Station time: one station every ~1.6 days from the cruise start, casts at varying hours (UTC). */
function stationTime(start: string, index: number, rng: Rng): string {
  const ms = Date.parse(`${start}T00:00:00Z`) + Math.round((index * 1.6 + rng.between(0.1, 0.5)) * 86_400) * 1000;
  // Whole minutes keep the files tidy.
  return new Date(Math.round(ms / 60_000) * 60_000).toISOString().replace('.000Z', 'Z');
}

/** All bottles of a cruise, station by station, deepest bottle first within a cast as the rosette is numbered. */
export function makeBottles(cruise: Cruise, rng: Rng): Bottle[] {
  const out: Bottle[] = [];
  cruise.stations.forEach(([lat, lon], s) => {
    const time = stationTime(cruise.start, s, rng);
    const month = Number(time.slice(5, 7));
    const depths = [...BOTTLE_DEPTHS].reverse();
    depths.forEach((depth, k) => {
      const at = (q: Parameters<typeof truthField>[0]) => truthField(q, lon, lat, depth, month);
      let fe = at('dissolved_fe') * Math.exp(rng.normal(0, 0.05));
      if (cruise.id === CROSSOVER_OFFSET.cruise && depth >= CROSSOVER_OFFSET.min_depth_m) fe += CROSSOVER_OFFSET.offset_nmol_kg;
      const nutrient = (q: 'nitrate' | 'phosphate' | 'silicate', floor: number) => Math.max(floor, at(q) * (1 + rng.normal(0, 0.01)) + rng.normal(0, floor));
      out.push({
        cruise: cruise.id,
        station: stationName(cruise.id, s),
        stationIndex: s,
        cast: '1',
        bottle: k + 1,
        lat,
        lon,
        time,
        month,
        depth,
        pressure: pressureFromDepth(depth, lat),
        temperature: at('temperature') + rng.normal(0, 0.005),
        salinity: at('salinity') + rng.normal(0, 0.002),
        dissolvedFe: fe,
        nitrate: nutrient('nitrate', 0.01),
        phosphate: nutrient('phosphate', 0.005),
        silicate: nutrient('silicate', 0.05),
      });
    });
  });
  return out;
}
