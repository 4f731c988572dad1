import type { DatasetVariable, NetcdfDataset } from './dataset.js';
import { textAttribute } from './dataset.js';
import { isTimeUnits } from './cf-time.js';
import { noAxis, unsupportedLayout } from './messages.js';

/** Role of a coordinate axis in the grid. */
export type AxisRole = 'lon' | 'lat' | 'depth' | 'time';

/** Longitude units accepted by CF Conventions 1.10 §4.1. */
const LON_UNITS = new Set(['degrees_east', 'degree_east', 'degree_e', 'degrees_e', 'degreee', 'degreese']);
/** Latitude units accepted by CF Conventions 1.10 §4.1. */
const LAT_UNITS = new Set(['degrees_north', 'degree_north', 'degree_n', 'degrees_n', 'degreen', 'degreesn']);
/** Vertical coordinate standard names (CF standard name table). */
const Z_NAMES = new Set(['depth', 'height', 'altitude', 'sea_water_pressure', 'depth_below_geoid', 'height_above_mean_sea_level']);
/** Pressure units of a vertical axis. */
export const PRESSURE_UNITS = new Set(['dbar', 'decibar', 'decibars', 'dbars']);
/** Length units of a vertical axis, with their factor to m. */
export const LENGTH_UNITS: Record<string, number> = { m: 1, meter: 1, meters: 1, metre: 1, metres: 1, km: 1000, cm: 0.01 };

/** Month-of-year units of a climatology axis without a reference date. */
export const MONTH_OF_YEAR = /^(months?|months?[ _]of[ _](the[ _])?year|month_of_year)$/i;

/** Classifies a coordinate variable by its axis, standard_name and units attributes (CF Conventions 1.10 §4), never by name. */
export function axisRole(v: DatasetVariable): AxisRole | undefined {
  const axis = textAttribute(v.attributes, 'axis')?.toUpperCase();
  const standardName = textAttribute(v.attributes, 'standard_name')?.toLowerCase();
  const units = (textAttribute(v.attributes, 'units') ?? '').toLowerCase();
  const positive = textAttribute(v.attributes, 'positive')?.toLowerCase();
  const degreeLike = units === '' || /^degrees?$/.test(units);
  if (LON_UNITS.has(units) || standardName === 'longitude' || (axis === 'X' && degreeLike)) return 'lon';
  if (LAT_UNITS.has(units) || standardName === 'latitude' || (axis === 'Y' && degreeLike)) return 'lat';
  if (axis === 'T' || standardName === 'time' || isTimeUnits(units) || MONTH_OF_YEAR.test(units)) return 'time';
  if (axis === 'Z' || positive === 'up' || positive === 'down' || (standardName !== undefined && Z_NAMES.has(standardName)) || PRESSURE_UNITS.has(units)) return 'depth';
  return undefined;
}

/** The variable's dimensions by role, with the coordinate variable of each and the position among the dimensions. */
export interface GridAxes {
  /** Coordinate variable and dimension position per role; depth and time may be absent. */
  axes: Partial<Record<AxisRole, { coordinate: DatasetVariable; position: number }>>;
  /** A scalar vertical coordinate named by the `coordinates` attribute, when there is no depth dimension. */
  scalarDepth?: DatasetVariable;
}

/** A coordinate variable (CF Conventions 1.10 §1.3): one-dimensional, named after its own dimension. */
function coordinateOf(dataset: NetcdfDataset, dim: string): DatasetVariable | undefined {
  return dataset.variables.find((v) => v.name === dim && v.dims.length === 1 && v.dims[0] === dim);
}

/** Finds lon, lat, depth and time among the dimensions of `variable`; size-1 unknown dimensions are ignored. */
export function findGridAxes(dataset: NetcdfDataset, variable: DatasetVariable): GridAxes {
  const axes: GridAxes['axes'] = {};
  const unknown: string[] = [];
  variable.dims.forEach((dim, position) => {
    const coordinate = coordinateOf(dataset, dim);
    const role = coordinate ? axisRole(coordinate) : undefined;
    if (!coordinate || !role) {
      if (variable.shape[position] !== 1) unknown.push(`${dim} (length ${variable.shape[position]})`);
      return;
    }
    if (axes[role]) throw new Error(unsupportedLayout(dataset.name, variable.name, `dimensions ${axes[role].coordinate.name} and ${dim} are both ${role} axes`));
    axes[role] = { coordinate, position };
  });
  if (!axes.lat) throw new Error(noAxis(dataset.name, variable.name, variable.dims, 'latitude'));
  if (!axes.lon) throw new Error(noAxis(dataset.name, variable.name, variable.dims, 'longitude'));
  if (unknown.length > 0) {
    throw new Error(unsupportedLayout(dataset.name, variable.name, `dimension ${unknown.join(', ')} is not a longitude, latitude, vertical or time axis`));
  }
  let scalarDepth: DatasetVariable | undefined;
  if (!axes.depth) {
    const names = (textAttribute(variable.attributes, 'coordinates') ?? '').split(/\s+/);
    scalarDepth = dataset.variables.find((v) => names.includes(v.name) && v.dims.length === 0 && axisRole(v) === 'depth');
  }
  return { axes, scalarDepth };
}
