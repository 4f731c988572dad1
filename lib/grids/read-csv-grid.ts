import { parse } from 'csv-parse/sync';
import type { Grid, InputText } from '../types.js';
import { ascendingOrder, longitudeOrder, wrapLongitude, type AxisOrder } from './axis-order.js';
import { defaultToCanonical } from './default-to-canonical.js';
import * as msg from './messages.js';
import { CANONICAL_GRID_UNITS, type GridReadOptions } from './options.js';

interface Row {
  line: number;
  lon: number;
  lat: number;
  depth: number;
  month: number;
  value: number;
}

function indexOf(order: AxisOrder, inputValues: number[]): Map<number, number> {
  const map = new Map<number, number>();
  order.source.forEach((src, i) => map.set(inputValues[src], i));
  return map;
}

/**
 * Reads a plain CSV grid with header lon,lat,depth[,month],value (any row order) into a Grid; every node of the
 * lon × lat × depth (× month) lattice must appear once, an empty value (or NaN) marks a missing node.
 * Units come from `options.units`, converted like NetCDF grids.
 */
export function readCsvGrid(input: InputText, options: GridReadOptions): Grid {
  const file = input.name;
  let records: { info: { lines: number }; record: string[] }[];
  try {
    records = parse(input.text, { info: true, skip_empty_lines: true, trim: true, comment: '#', relax_column_count: false, bom: true }) as unknown as typeof records;
  } catch (error) {
    const line = (error as { lines?: number }).lines ?? 0;
    throw new Error(msg.csvParse(file, line, error instanceof Error ? error.message : String(error)), { cause: error });
  }
  const header = (records[0]?.record ?? []).map((h) => h.toLowerCase());
  const hasMonth = header.length === 5;
  const expected = hasMonth ? ['lon', 'lat', 'depth', 'month', 'value'] : ['lon', 'lat', 'depth', 'value'];
  if (header.join(',') !== expected.join(',')) throw new Error(msg.csvHeader(file, records[0]?.record ?? []));
  const canonical = options.canonicalUnits ?? CANONICAL_GRID_UNITS[options.quantity];
  if (canonical === undefined) throw new Error(msg.unknownQuantity(file, options.quantity));
  if (options.units === undefined) throw new Error(msg.noUnits(file, 'value'));
  const conversion = (options.toCanonical ?? defaultToCanonical(canonical))(options.units);
  if (typeof conversion === 'string') throw new Error(msg.badUnits(file, 'value', conversion));
  if (conversion.note) options.ledger?.add({ table: 'grid', file, line: 0, stage: 'load', action: 'converted', reason: 'unit-assumption', detail: conversion.note });

  const rows: Row[] = records.slice(1).map(({ info, record }) => {
    const line = info.lines;
    const num = (k: number, allowEmpty: boolean): number => {
      const text = record[k];
      if (allowEmpty && (text === '' || /^nan$/i.test(text))) return NaN;
      const v = Number(text);
      if (text === '' || !Number.isFinite(v)) throw new Error(msg.csvNotNumber(file, line, expected[k], text));
      return v;
    };
    const month = hasMonth ? num(3, false) : 0;
    if (hasMonth && (!Number.isInteger(month) || month < 1 || month > 12)) throw new Error(msg.csvBadMonth(file, line, record[3]));
    return { line, lon: num(0, false), lat: num(1, false), depth: num(2, false), month, value: num(hasMonth ? 4 : 3, true) };
  });

  const unique = (key: 'lon' | 'lat' | 'depth' | 'month'): number[] => [...new Set(rows.map((r) => (key === 'lon' ? wrapLongitude(r.lon) : r[key])))];
  const lonValues = unique('lon');
  const lonResult = longitudeOrder(lonValues);
  const latValues = unique('lat');
  const depthValues = unique('depth');
  const monthValues = unique('month');
  const orders = [ascendingOrder(latValues), ascendingOrder(depthValues), ascendingOrder(monthValues)];
  if (typeof lonResult === 'string') throw new Error(msg.axisNotMonotonic(file, 'lon', lonResult));
  const [lat, depth, month] = orders.map((o) => {
    if (typeof o === 'string') throw new Error(msg.axisNotMonotonic(file, 'column', o));
    return o;
  });
  const lon = lonResult.order;
  const xi = indexOf(lon, lonValues);
  const yi = indexOf(lat, latValues);
  const zi = indexOf(depth, depthValues);
  const ti = indexOf(month, monthValues);
  const nx = lon.values.length;
  const ny = lat.values.length;
  const nz = depth.values.length;
  const nt = month.values.length;
  const values = new Float32Array(nt * nz * ny * nx);
  const lineOf = new Int32Array(values.length);
  const nodeText = (x: number, y: number, z: number, t: number): string =>
    `(lon ${lon.values[x]}, lat ${lat.values[y]}, depth ${depth.values[z]}${hasMonth ? `, month ${month.values[t]}` : ''})`;
  for (const r of rows) {
    const x = xi.get(wrapLongitude(r.lon))!;
    const y = yi.get(r.lat)!;
    const z = zi.get(r.depth)!;
    const t = ti.get(r.month)!;
    const k = ((t * nz + z) * ny + y) * nx + x;
    if (lineOf[k] !== 0) throw new Error(msg.csvDuplicateNode(file, r.line, lineOf[k], nodeText(x, y, z, t)));
    lineOf[k] = r.line;
    values[k] = r.value * conversion.factor;
  }
  const absent = lineOf.indexOf(0);
  if (absent >= 0) {
    const x = absent % nx;
    const y = Math.floor(absent / nx) % ny;
    const z = Math.floor(absent / (nx * ny)) % nz;
    const t = Math.floor(absent / (nx * ny * nz));
    throw new Error(msg.csvMissingNode(file, nodeText(x, y, z, t), rows.length, hasMonth ? [nx, ny, nz, nt] : [nx, ny, nz]));
  }
  return {
    quantity: options.quantity,
    units: canonical,
    lon: lon.values,
    lat: lat.values,
    depth: depth.values,
    timeKind: hasMonth ? 'month' : 'none',
    time: hasMonth ? month.values : Float64Array.of(0),
    values,
    periodicLon: lonResult.periodic,
    source: file,
    variable: 'value',
  };
}
