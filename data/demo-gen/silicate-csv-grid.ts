/** A plain CSV silicate grid (lon, lat, depth, month, value) for users without NetCDF, from the truth fields. */
import { landMask } from '../../lib/geo/index.js';
import { truthField } from './truth-fields.js';

/** Depth levels of the CSV grid (m). */
export const SILICATE_DEPTHS = [0, 100, 500, 2000] as const;

/** CSV text of a 10° × 10° monthly silicate climatology (µmol/kg, 3 significant digits); land nodes keep an empty value. */
export function silicateCsvGrid(): string {
  const land = landMask({ resolution: '110m', coastToleranceKm: 0 });
  const lines = ['lon,lat,depth,month,value'];
  for (let month = 1; month <= 12; month++) {
    for (const depth of SILICATE_DEPTHS) {
      for (let lat = -85; lat <= 85; lat += 10) {
        for (let lon = -175; lon <= 175; lon += 10) {
          const value = land.insideLand(lon, lat) ? '' : String(Number(truthField('silicate', lon, lat, depth, month).toPrecision(3)));
          lines.push(`${lon},${lat},${depth},${month},${value}`);
        }
      }
    }
  }
  return `${lines.join('\n')}\n`;
}
