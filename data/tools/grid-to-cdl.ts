import type { Grid } from '../../lib/types.js';

/** What gridToCdl writes besides the grid itself. */
export interface CdlMeta {
  /** Global `title` attribute. */
  title: string;
  /** Name of the data variable, a valid NetCDF name. */
  variableName: string;
  /** CF standard_name of the data variable, e.g. mole_concentration_of_dissolved_iron_in_sea_water. */
  standardName: string;
  /** Units attribute, e.g. "nmol/kg". */
  units: string;
  /** Optional long_name of the data variable. */
  longName?: string;
  /** Name after `netcdf` in the CDL; default the variable name. */
  datasetName?: string;
  /** Years a month climatology spans, for its climatology bounds (CF 1.10 §7.4); default [2000, 2000]. */
  climatologyYears?: [number, number];
  /** Extra global attributes (text), written in key order. */
  globalAttributes?: Record<string, string>;
}

/** Default float fill written for NaN (NetCDF User Guide, NC_FILL_FLOAT). */
const FILL = '9.96921e+36f';
const NAME = /^[A-Za-z_][A-Za-z0-9_]*$/;
const MONTH_START_2000 = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335, 366];

function text(s: string): string {
  return `"${s.replace(/\\/g, '\\\\').replace(/"/g, '\\"').replace(/\n/g, '\\n')}"`;
}

function list(values: string[]): string {
  const lines: string[] = [];
  for (let i = 0; i < values.length; i += 10) lines.push(`    ${values.slice(i, i + 10).join(', ')}`);
  return `\n${lines.join(',\n')}`;
}

function double(v: number): string {
  if (!Number.isFinite(v)) throw new Error(`gridToCdl: coordinate value ${v} is not finite`);
  return String(v);
}

/** Float32 value as text that reads back to the same float32 (9 significant digits suffice); NaN as the fill marker. */
function float(v: number): string {
  if (Number.isNaN(v)) return '_';
  if (!Number.isFinite(v)) throw new Error(`gridToCdl: value ${v} is not finite`);
  return String(Number(v.toPrecision(9)));
}

function daysSince(year: number, month: number): number {
  return (Date.UTC(year, month - 1, 1) - Date.UTC(2000, 0, 1)) / 86_400_000;
}

/**
 * CF-1.10 CDL text of a Grid for ncgen: float data with _FillValue, coordinate variables with axis,
 * standard_name and units; a month climatology becomes `time` in "days since 2000-01-01" at mid-month
 * (of 2000) with a `climatology` bounds variable (CF Conventions 1.10 §7.4); absolute time in seconds since 1970.
 */
export function gridToCdl(grid: Grid, meta: CdlMeta): string {
  if (!NAME.test(meta.variableName)) throw new Error(`gridToCdl: variable name "${meta.variableName}" is not a valid NetCDF name`);
  const dataset = meta.datasetName ?? meta.variableName;
  const hasTime = grid.timeKind !== 'none';
  const dims: string[] = [];
  const vars: string[] = [];
  const data: string[] = [];
  if (hasTime) dims.push(`\ttime = ${grid.time.length} ;`);
  if (grid.timeKind === 'month') {
    const [first, last] = meta.climatologyYears ?? [2000, 2000];
    dims.push('\tnv = 2 ;');
    vars.push(
      '\tdouble time(time) ;',
      '\t\ttime:standard_name = "time" ;',
      '\t\ttime:axis = "T" ;',
      '\t\ttime:units = "days since 2000-01-01 00:00:00" ;',
      '\t\ttime:calendar = "standard" ;',
      '\t\ttime:climatology = "climatology_bounds" ;',
      '\tdouble climatology_bounds(time, nv) ;',
    );
    const months = [...grid.time];
    data.push(` time = ${list(months.map((m) => double((MONTH_START_2000[m - 1] + MONTH_START_2000[m]) / 2)))} ;`);
    data.push(` climatology_bounds = ${list(months.flatMap((m) => [double(daysSince(first, m)), double(m === 12 ? daysSince(last + 1, 1) : daysSince(last, m + 1))]))} ;`);
  } else if (grid.timeKind === 'time') {
    vars.push(
      '\tdouble time(time) ;',
      '\t\ttime:standard_name = "time" ;',
      '\t\ttime:axis = "T" ;',
      '\t\ttime:units = "seconds since 1970-01-01 00:00:00" ;',
      '\t\ttime:calendar = "proleptic_gregorian" ;',
    );
    data.push(` time = ${list([...grid.time].map((ms) => double(ms / 1000)))} ;`);
  }
  dims.push(`\tdepth = ${grid.depth.length} ;`, `\tlat = ${grid.lat.length} ;`, `\tlon = ${grid.lon.length} ;`);
  vars.push(
    '\tdouble depth(depth) ;',
    '\t\tdepth:standard_name = "depth" ;',
    '\t\tdepth:axis = "Z" ;',
    '\t\tdepth:units = "m" ;',
    '\t\tdepth:positive = "down" ;',
    '\tdouble lat(lat) ;',
    '\t\tlat:standard_name = "latitude" ;',
    '\t\tlat:axis = "Y" ;',
    '\t\tlat:units = "degrees_north" ;',
    '\tdouble lon(lon) ;',
    '\t\tlon:standard_name = "longitude" ;',
    '\t\tlon:axis = "X" ;',
    '\t\tlon:units = "degrees_east" ;',
    `\tfloat ${meta.variableName}(${hasTime ? 'time, ' : ''}depth, lat, lon) ;`,
    `\t\t${meta.variableName}:standard_name = ${text(meta.standardName)} ;`,
    ...(meta.longName ? [`\t\t${meta.variableName}:long_name = ${text(meta.longName)} ;`] : []),
    `\t\t${meta.variableName}:units = ${text(meta.units)} ;`,
    `\t\t${meta.variableName}:_FillValue = ${FILL} ;`,
  );
  data.push(
    ` depth = ${list([...grid.depth].map(double))} ;`,
    ` lat = ${list([...grid.lat].map(double))} ;`,
    ` lon = ${list([...grid.lon].map(double))} ;`,
    ` ${meta.variableName} = ${list([...grid.values].map(float))} ;`,
  );
  const globals = { Conventions: 'CF-1.10', title: meta.title, ...meta.globalAttributes };
  const globalLines = Object.keys(globals)
    .sort()
    .map((k) => `\t\t:${k} = ${text(globals[k as keyof typeof globals] as string)} ;`);
  return [
    `netcdf ${dataset} {`,
    'dimensions:',
    ...dims,
    'variables:',
    ...vars,
    '',
    '// global attributes:',
    ...globalLines,
    'data:',
    '',
    data.join('\n\n'),
    '}',
    '',
  ].join('\n');
}
