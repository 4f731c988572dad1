import { landMask } from '../geo/index.js';
import { negativeDepth, positionMissing, positionOnLand, positionOutOfRange } from './messages.js';
import type { RowLedger } from './rowLedger.js';

/** Longitude in degrees mapped to [-180, 180). */
export function normaliseLongitude(lon: number): number {
  return ((((lon + 180) % 360) + 360) % 360) - 180;
}

/** Exclude rows with |lat| > 90 or |lon| > 360 ('position-out-of-range'), flag missing positions ('position-missing') when asked, normalise longitudes in place. */
export function checkPositionRange(lat: Float64Array, lon: Float64Array, rows: RowLedger, flagMissing = true): void {
  for (let i = 0; i < lat.length; i++) {
    if (Math.abs(lat[i]) > 90 || Math.abs(lon[i]) > 360) {
      rows.exclude(i, 'position-out-of-range', positionOutOfRange(lat[i], lon[i]));
      continue;
    }
    if (flagMissing && (!Number.isFinite(lat[i]) || !Number.isFinite(lon[i]))) rows.add(i, 'flagged', 'position-missing', positionMissing(lat[i], lon[i]));
    if (Number.isFinite(lon[i])) lon[i] = normaliseLongitude(lon[i]);
  }
}

/** Exclude rows with a negative depth ('negative-depth'). */
export function checkNegativeDepth(depth: Float64Array, rows: RowLedger): void {
  for (let i = 0; i < depth.length; i++) if (depth[i] < 0) rows.exclude(i, 'negative-depth', negativeDepth(depth[i]));
}

/** Exclude kept rows on land ('position-on-land'), with a hint when swapping latitude and longitude would put the point at sea. */
export function checkOnLand(lat: Float64Array, lon: Float64Array, rows: RowLedger, coastToleranceKm: number, resolution: '50m' | '110m'): void {
  const mask = landMask({ coastToleranceKm, resolution });
  for (let i = 0; i < lat.length; i++) {
    if (rows.excluded[i] || !Number.isFinite(lat[i]) || !Number.isFinite(lon[i])) continue;
    if (!mask.isOnLand(lon[i], lat[i])) continue;
    const swapAtSea = Math.abs(lon[i]) <= 90 && !mask.isOnLand(lat[i], lon[i]);
    rows.exclude(i, 'position-on-land', positionOnLand(lat[i], lon[i], swapAtSea));
  }
}
