import type { Grid, GridTimeKind } from '../types.js';
import type { DatasetVariable, NetcdfDataset } from './dataset.js';
import { textAttribute } from './dataset.js';
import { ascendingOrder, longitudeOrder, type AxisOrder } from './axis-order.js';
import { findGridAxes, LENGTH_UNITS, MONTH_OF_YEAR, PRESSURE_UNITS } from './cf-axes.js';
import { decodeCfTime } from './cf-time.js';
import { findDataVariable } from './cf-variable.js';
import { unpackingOf } from './cf-packing.js';
import { defaultToCanonical } from './default-to-canonical.js';
import * as msg from './messages.js';
import { CANONICAL_GRID_UNITS, type GridReadOptions } from './options.js';

function note(options: GridReadOptions, file: string, reason: string, detail: string): void {
  options.ledger?.add({ table: 'grid', file, line: 0, stage: 'load', action: 'converted', reason, detail });
}

function ordered(file: string, coordinate: DatasetVariable, values: ArrayLike<number>): AxisOrder {
  const order = ascendingOrder(values);
  if (typeof order === 'string') throw new Error(msg.axisNotMonotonic(file, coordinate.name, order));
  return order;
}

function identity(): AxisOrder {
  return { values: Float64Array.of(0), source: Int32Array.of(0) };
}

/** Vertical axis in m positive down: length units scaled, pressure converted, positive="up" negated (CF Conventions 1.10 §4.3). */
function depthAxis(file: string, coordinate: DatasetVariable, midLat: number, options: GridReadOptions): AxisOrder {
  const raw = Float64Array.from(coordinate.read());
  const units = (textAttribute(coordinate.attributes, 'units') ?? '').toLowerCase();
  const positive = textAttribute(coordinate.attributes, 'positive')?.toLowerCase();
  let depth: Float64Array;
  if (PRESSURE_UNITS.has(units)) {
    const formula = options.pressureToDepth;
    depth = raw.map((p) => (formula ? formula(p, midLat) : p));
    const how = formula ? `with the supplied formula at the grid's central latitude ${midLat}°` : 'as 1 dbar ≈ 1 m';
    note(options, file, 'pressure-as-depth', msg.pressureAsDepth(coordinate.name, how));
  } else if (units in LENGTH_UNITS) {
    const sign = positive === 'up' ? -1 : 1;
    // + 0 turns the -0 of a negated surface level into 0.
    depth = raw.map((z) => sign * z * LENGTH_UNITS[units] + 0);
  } else {
    throw new Error(msg.unsupportedLayout(file, coordinate.name, `vertical axis units "${units}"; expected m or dbar`));
  }
  return ordered(file, coordinate, depth);
}

/** Time axis: month-of-year climatology, a single step, or absolute time (CF Conventions 1.10 §4.4, §7.4). */
function timeAxis(file: string, coordinate: DatasetVariable, options: GridReadOptions): { kind: GridTimeKind; order: AxisOrder } {
  const raw = coordinate.read();
  const units = textAttribute(coordinate.attributes, 'units') ?? '';
  if (MONTH_OF_YEAR.test(units)) {
    for (const m of raw) if (!Number.isInteger(m) || m < 1 || m > 12) throw new Error(msg.unsupportedLayout(file, coordinate.name, `month-of-year value ${m}; expected 1..12`));
    return { kind: 'month', order: ordered(file, coordinate, raw) };
  }
  const ms = decodeCfTime(raw, units, textAttribute(coordinate.attributes, 'calendar'), { file, variable: coordinate.name });
  const dates = [...ms].map((t) => new Date(t));
  const months = Float64Array.from(dates, (d) => d.getUTCMonth() + 1);
  if (coordinate.attributes.climatology !== undefined) {
    if (ms.length === 1) return { kind: 'none', order: identity() };
    if (ms.length !== 12) throw new Error(msg.climatologyLength(file, coordinate.name, ms.length));
    return { kind: 'month', order: ordered(file, coordinate, months) };
  }
  const year = dates[0]?.getUTCFullYear();
  if (ms.length === 12 && dates.every((d, i) => d.getUTCMonth() === i && d.getUTCFullYear() === year)) {
    note(options, file, 'monthly-as-climatology', msg.monthlyAsClimatology(coordinate.name, year));
    return { kind: 'month', order: ordered(file, coordinate, months) };
  }
  return { kind: 'time', order: ordered(file, coordinate, ms) };
}

/**
 * Turns one variable of a neutral NetCDF dataset into a Grid through the CF conventions (1.10): axes by
 * attributes, lon wrapped to [-180, 180), lat/depth/time sorted ascending, any dimension order transposed
 * to [t][z][y][x], fills and valid range applied to packed values, then unpacked and converted to canonical units.
 */
export function cfGrid(dataset: NetcdfDataset, options: GridReadOptions): Grid {
  const file = dataset.name;
  const variable = findDataVariable(dataset, options);
  const { axes, scalarDepth } = findGridAxes(dataset, variable);
  const lonResult = longitudeOrder(axes.lon!.coordinate.read());
  if (typeof lonResult === 'string') throw new Error(msg.axisNotMonotonic(file, axes.lon!.coordinate.name, lonResult));
  const lon = lonResult.order;
  const lat = ordered(file, axes.lat!.coordinate, axes.lat!.coordinate.read());
  const midLat = (lat.values[0] + lat.values[lat.values.length - 1]) / 2;
  let depth = identity();
  if (axes.depth) depth = depthAxis(file, axes.depth.coordinate, midLat, options);
  else if (scalarDepth) depth = depthAxis(file, scalarDepth, midLat, options);
  const time = axes.time ? timeAxis(file, axes.time.coordinate, options) : { kind: 'none' as const, order: identity() };

  const canonical = options.canonicalUnits ?? CANONICAL_GRID_UNITS[options.quantity];
  if (canonical === undefined) throw new Error(msg.unknownQuantity(file, options.quantity));
  const unitsText = textAttribute(variable.attributes, 'units') ?? options.units;
  if (unitsText === undefined) throw new Error(msg.noUnits(file, variable.name));
  const conversion = (options.toCanonical ?? defaultToCanonical(canonical))(unitsText);
  if (typeof conversion === 'string') throw new Error(msg.badUnits(file, variable.name, conversion));
  if (conversion.note) note(options, file, 'unit-assumption', conversion.note);

  const raw = variable.read();
  const expected = variable.shape.reduce((a, b) => a * b, 1);
  if (raw.length !== expected) throw new Error(msg.unsupportedLayout(file, variable.name, `${raw.length} values for shape [${variable.shape.join(', ')}]`));
  const strides = variable.shape.map((_, k) => variable.shape.slice(k + 1).reduce((a, b) => a * b, 1));
  const stride = (role: keyof typeof axes): number => (axes[role] ? strides[axes[role].position] : 0);
  const nx = lon.values.length;
  const ny = lat.values.length;
  const nz = depth.values.length;
  const nt = time.order.values.length;
  const xOffset = Int32Array.from(lon.source, (i) => i * stride('lon'));
  const values = new Float32Array(nt * nz * ny * nx);
  const u = unpackingOf(variable);
  const { fill1, fill2, validMin, validMax } = u;
  const scale = u.scale * conversion.factor;
  const offset = u.offset * conversion.factor;
  let out = 0;
  for (let t = 0; t < nt; t++) {
    const tBase = time.order.source[t] * stride('time');
    for (let z = 0; z < nz; z++) {
      const zBase = tBase + depth.source[z] * stride('depth');
      for (let y = 0; y < ny; y++) {
        const base = zBase + lat.source[y] * stride('lat');
        for (let x = 0; x < nx; x++) {
          const r = raw[base + xOffset[x]];
          // (raw·scale + offset)·factor, folded: CF Conventions 1.10 §8.1 then the unit factor.
          values[out++] = r !== r || r === fill1 || r === fill2 || r < validMin || r > validMax ? NaN : r * scale + offset;
        }
      }
    }
  }
  return {
    quantity: options.quantity,
    units: canonical,
    lon: lon.values,
    lat: lat.values,
    depth: depth.values,
    timeKind: time.kind,
    time: time.kind === 'none' ? Float64Array.of(0) : time.order.values,
    values,
    periodicLon: lonResult.periodic,
    source: file,
    variable: variable.name,
  };
}
