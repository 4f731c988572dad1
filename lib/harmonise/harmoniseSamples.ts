import * as aq from 'arquero';
import type { Ledger } from '../ledger/index.js';
import { SAMPLE_COLUMNS, SAMPLE_QUANTITIES } from '../load/canonical.js';
import type { QualityFlag } from '../types.js';
import { depthFromPressure, pressureFromDepth, seawaterDensity, t68FromT90 } from '../units/index.js';
import { booleanColumn, numberColumn, sourceLines, textColumn } from './columns.js';
import { isIdentity, requireStatedUnits, resolveConversions } from './conversions.js';
import { keptTable } from './keptTable.js';
import { replaceFillValues } from './fillValues.js';
import { defaultDensity, depthPressureMismatch, duplicateBottle } from './messages.js';
import { DEFAULT_DENSITY, DEFAULT_FILL_VALUES, type SampleHarmoniseOptions } from './options.js';
import { checkNegativeDepth, checkOnLand, checkPositionRange } from './positionChecks.js';
import { applyQuality } from './quality.js';
import { sortConversions, type ConversionCount, type HarmoniseResult } from './result.js';
import { RowLedger } from './rowLedger.js';

const NUMERIC = Object.entries(SAMPLE_COLUMNS)
  .filter(([, kind]) => kind === 'number')
  .map(([name]) => name);

const FOLLOWERS = Object.fromEntries(SAMPLE_QUANTITIES.map((q) => [`${q}_dl`, q]));

/**
 * Harmonise one bottle file: fill values, position range and longitude, depth from pressure (Saunders & Fofonoff via
 * UNESCO 1983), units to canonical (per litre → per kg with EOS-80 in-situ density), flags to the internal scale,
 * detection limits, duplicate bottles and positions on land. Rows in = rows out + 'excluded' ledger rows.
 */
export function harmoniseSamples(table: aq.ColumnTable, options: SampleHarmoniseOptions, ledger: Ledger): HarmoniseResult {
  const file = options.file;
  const tableName = options.table ?? 'samples';
  const n = table.numRows();
  const rows = new RowLedger(ledger, tableName, file, sourceLines(table, file));
  const conversions = resolveConversions(options.units, file, FOLLOWERS);
  requireStatedUnits(table.columnNames(), (c) => (table.array(c) as ArrayLike<unknown>).length > 0 && Array.from(table.array(c) as ArrayLike<unknown>).some((v) => typeof v === 'number' && Number.isFinite(v)), conversions, file);
  const names = table.columnNames();
  const present = (c: string) => names.includes(c);

  const num: Record<string, Float64Array> = {};
  for (const c of NUMERIC) if (present(c)) num[c] = numberColumn(table, c);
  replaceFillValues(num, options.fillValues ?? DEFAULT_FILL_VALUES, rows);
  const col = (c: string) => num[c] ?? new Float64Array(n).fill(NaN);
  const lat = col('lat'), lon = col('lon'), depth = col('depth'), pressure = col('pressure');
  const temperature = col('temperature'), salinity = col('salinity');
  const counts: ConversionCount[] = [];

  // Plain-factor columns first (depth, pressure, temperature, salinity), so later steps see canonical units.
  for (const c of ['depth', 'pressure', 'temperature', 'salinity']) {
    const conv = conversions.get(c);
    if (!conv || isIdentity(conv) || !num[c]) continue;
    for (let i = 0; i < n; i++) num[c][i] *= conv.factor;
  }

  checkPositionRange(lat, lon, rows);

  // Depth from pressure where missing; the pressure used for density, from depth where missing.
  const tolerance = options.depthPressureToleranceM ?? 10;
  const seaPressure = new Float64Array(n).fill(NaN);
  let depthFromP = 0;
  for (let i = 0; i < n; i++) {
    const p = pressure[i], d = depth[i], phi = lat[i];
    if (Number.isFinite(p) && Number.isFinite(phi)) {
      const z = depthFromPressure(p, phi);
      if (!Number.isFinite(d)) {
        depth[i] = z;
        if (!rows.excluded[i]) depthFromP++;
      } else if (Math.abs(z - d) > tolerance && !rows.excluded[i]) {
        rows.add(i, 'flagged', 'depth-pressure-mismatch', depthPressureMismatch(d, p, z, tolerance));
      }
    }
    seaPressure[i] = Number.isFinite(p) ? p : Number.isFinite(depth[i]) && Number.isFinite(phi) ? pressureFromDepth(depth[i], phi) : NaN;
  }
  checkNegativeDepth(depth, rows);

  // Duplicate bottles: the later of two rows with the same cruise/station/cast/bottle is excluded.
  const ids = ['cruise', 'station', 'cast', 'bottle'].map((c) => textColumn(table, c));
  const seen = new Map<string, number>();
  if (ids[3]) {
    for (let i = 0; i < n; i++) {
      if (rows.excluded[i]) continue;
      const bottle = ids[3][i];
      if (bottle === null || bottle.trim() === '') continue;
      const key = ids.map((c) => c?.[i] ?? '–').join('/');
      const first = seen.get(key);
      if (first === undefined) seen.set(key, i);
      else rows.exclude(i, 'duplicate-bottle', duplicateBottle(key, rows.lines[first], rows.lines[i]));
    }
  }

  if (options.landCheck ?? true) checkOnLand(lat, lon, rows, options.coastToleranceKm ?? 10, options.landResolution ?? '50m');
  const kept = rows.kept();

  // Density, only where a per-volume unit needs it.
  const perVolume = SAMPLE_QUANTITIES.filter((q) => conversions.get(q)?.perVolume || conversions.get(`${q}_dl`)?.perVolume);
  const rhoDefault = options.defaultDensity ?? DEFAULT_DENSITY;
  const density = new Float64Array(n).fill(NaN);
  const defaulted = new Uint8Array(n);
  if (perVolume.length > 0) {
    for (const i of kept) {
      const needed = perVolume.filter((q) => Number.isFinite(col(q)[i]) || Number.isFinite(col(`${q}_dl`)[i]));
      if (needed.length === 0) continue;
      if (Number.isFinite(temperature[i]) && Number.isFinite(salinity[i]) && Number.isFinite(seaPressure[i])) {
        const t68 = options.temperatureScale === 'ipts68' ? temperature[i] : t68FromT90(temperature[i]);
        density[i] = seawaterDensity(salinity[i], t68, Math.max(0, seaPressure[i]));
      } else {
        density[i] = rhoDefault;
        defaulted[i] = 1;
        const missing = [['temperature', temperature], ['salinity', salinity], ['pressure', seaPressure]]
          .filter(([, a]) => !Number.isFinite((a as Float64Array)[i]))
          .map(([name]) => (name === 'pressure' ? 'pressure and depth' : (name as string)));
        rows.add(i, 'converted', 'default-density', defaultDensity(needed, rhoDefault, missing));
      }
    }
  }

  const extra: Record<string, (QualityFlag | null)[]> = {};
  let substituted = 0;
  for (const q of SAMPLE_QUANTITIES) {
    const values = col(q), limits = col(`${q}_dl`);
    for (const [c, arr] of [[q, values], [`${q}_dl`, limits]] as const) {
      const conv = conversions.get(c);
      if (isIdentity(conv) || !conv) continue;
      let byFactor = 0, byEos = 0, byDefault = 0;
      for (const i of kept) {
        if (!Number.isFinite(arr[i])) continue;
        arr[i] = conv.perVolume ? (arr[i] * conv.factor) / density[i] : arr[i] * conv.factor;
        if (!conv.perVolume) byFactor++;
        else if (defaulted[i]) byDefault++;
        else byEos++;
      }
      counts.push({ column: c, from: conv.from, to: conv.to, method: 'factor', rows: byFactor });
      counts.push({ column: c, from: conv.from, to: conv.to, method: 'eos80-density', rows: byEos });
      counts.push({ column: c, from: conv.from, to: conv.to, method: 'default-density', rows: byDefault });
    }
    const { quality, substituted: s } = applyQuality(
      { quantity: q, values, limits, flags: textColumn(table, `${q}_flag`), belowDl: booleanColumn(table, `${q}_below_dl`) },
      {
        scheme: options.flags ?? 'none',
        accept: options.accept ?? ['good', 'questionable', 'below_detection'],
        policy: options.detectionLimitPolicy ?? 'half',
        defaultLimit: options.defaultDetectionLimits?.[q] ?? NaN,
      },
      rows,
      kept,
    );
    substituted += s;
    num[q] = values;
    if (present(`${q}_dl`)) num[`${q}_dl`] = limits;
    extra[`${q}_quality`] = quality;
  }
  if (!present('depth') && depthFromP > 0) num.depth = depth;
  for (const c of ['depth', 'pressure', 'temperature', 'salinity']) {
    const conv = conversions.get(c);
    if (conv && !isIdentity(conv)) counts.push({ column: c, from: conv.from, to: conv.to, method: 'factor', rows: kept.filter((i) => Number.isFinite(col(c)[i])).length });
  }
  counts.push({ column: 'depth', from: 'dbar', to: 'm', method: 'depth-from-pressure', rows: depthFromP });

  const order = [...names, ...Object.keys(num).filter((c) => !names.includes(c)), ...Object.keys(extra)];
  return {
    table: keptTable(table, order, { ...extra, ...num }, kept),
    summary: {
      table: tableName,
      file,
      rowsIn: n,
      rowsOut: kept.length,
      excluded: n - kept.length,
      conversions: sortConversions(counts),
      belowDetectionSubstituted: substituted,
    },
  };
}
