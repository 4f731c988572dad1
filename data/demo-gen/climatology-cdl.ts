/** CDL text (for ncgen) of a monthly climatology Grid, following CF-1.10: lon, lat, depth, climatological time. */
import type { Grid } from '../../lib/types.js';

/** Descriptive metadata of a climatology file. */
export interface ClimatologyMeta {
  /** Dataset name in the CDL header. */
  name: string;
  /** Units attribute of the data variable (UDUNITS form, e.g. "nmol kg-1"). */
  units: string;
  /** long_name of the data variable. */
  longName: string;
  /** CF standard_name, when one exists for the quantity and unit. */
  standardName?: string;
  /** Write longitudes as 0–360 instead of -180–180. */
  lon360: boolean;
  /** Global title. */
  title: string;
  /** Global comment. */
  comment: string;
}

/** Days from 2000-01-01 to the first of each month of 2000 and to 2001-01-01 (2000 is a leap year). */
const MONTH_START_2000 = [0, 31, 60, 91, 121, 152, 182, 213, 244, 274, 305, 335, 366];

/** Days from 2000-01-01 to the first of month m (1–13) of 2020, for the upper climatology bounds. */
function dayOf2020(m: number): number {
  const start2020 = Date.UTC(2020, 0, 1) - Date.UTC(2000, 0, 1);
  return start2020 / 86_400_000 + MONTH_START_2000[m - 1];
}

function list(values: ArrayLike<number>, format: (v: number) => string): string {
  return Array.from(values, format).join(', ');
}

const escape = (s: string) => s.replace(/\\/g, '\\\\').replace(/"/g, '\\"');

/** CDL of one climatology grid; missing values written as the fill value "_" of ncgen. */
export function climatologyCdl(grid: Grid, meta: ClimatologyMeta): string {
  const nx = grid.lon.length, ny = grid.lat.length, nz = grid.depth.length, nt = grid.time.length;
  // A 0–360 file starts at the first longitude east of Greenwich: rotate the columns.
  const order = Array.from({ length: nx }, (_, i) => i);
  if (meta.lon360) order.sort((a, b) => ((grid.lon[a] + 360) % 360) - ((grid.lon[b] + 360) % 360));
  const lon = order.map((i) => (meta.lon360 ? (grid.lon[i] + 360) % 360 : grid.lon[i]));
  const v = grid.variable;
  const mid = Array.from({ length: nt }, (_, t) => (MONTH_START_2000[t] + MONTH_START_2000[t + 1]) / 2);
  const bounds = Array.from({ length: nt }, (_, t) => `${MONTH_START_2000[t]}, ${dayOf2020(t + 2)}`);
  const lines: string[] = [
    `netcdf ${meta.name} {`,
    'dimensions:',
    `\tlon = ${nx} ;`, `\tlat = ${ny} ;`, `\tdepth = ${nz} ;`, `\ttime = ${nt} ;`, '\tnv = 2 ;',
    'variables:',
    '\tdouble lon(lon) ;', '\t\tlon:standard_name = "longitude" ;', '\t\tlon:long_name = "longitude" ;', '\t\tlon:units = "degrees_east" ;', '\t\tlon:axis = "X" ;',
    '\tdouble lat(lat) ;', '\t\tlat:standard_name = "latitude" ;', '\t\tlat:long_name = "latitude" ;', '\t\tlat:units = "degrees_north" ;', '\t\tlat:axis = "Y" ;',
    '\tdouble depth(depth) ;', '\t\tdepth:standard_name = "depth" ;', '\t\tdepth:long_name = "depth below sea surface" ;', '\t\tdepth:units = "m" ;', '\t\tdepth:positive = "down" ;', '\t\tdepth:axis = "Z" ;',
    '\tdouble time(time) ;', '\t\ttime:standard_name = "time" ;', '\t\ttime:long_name = "climatological month (mid-month of 2000)" ;', '\t\ttime:units = "days since 2000-01-01 00:00:00" ;',
    '\t\ttime:calendar = "standard" ;', '\t\ttime:axis = "T" ;', '\t\ttime:climatology = "climatology_bounds" ;',
    '\tdouble climatology_bounds(time, nv) ;', '\t\tclimatology_bounds:long_name = "climatology bounds: first and last month averaged, 2000–2020" ;',
    `\tfloat ${v}(time, depth, lat, lon) ;`,
    `\t\t${v}:long_name = "${escape(meta.longName)}" ;`,
    ...(meta.standardName ? [`\t\t${v}:standard_name = "${meta.standardName}" ;`] : []),
    `\t\t${v}:units = "${meta.units}" ;`,
    `\t\t${v}:_FillValue = 9.96921e+36f ;`,
    `\t\t${v}:cell_methods = "time: mean within years time: mean over years" ;`,
    '',
    '// global attributes:',
    '\t\t:Conventions = "CF-1.10" ;',
    `\t\t:title = "${escape(meta.title)}" ;`,
    `\t\t:comment = "${escape(meta.comment)}" ;`,
    '\t\t:source = "data/generate-demo.ts (seeded, invented demo data)" ;',
    'data:',
    '',
    ` lon = ${list(lon, (x) => x.toFixed(1))} ;`,
    '',
    ` lat = ${list(grid.lat, (x) => x.toFixed(1))} ;`,
    '',
    ` depth = ${list(grid.depth, (x) => x.toFixed(0))} ;`,
    '',
    ` time = ${list(mid, (x) => x.toFixed(1))} ;`,
    '',
    ` climatology_bounds = ${bounds.join(', ')} ;`,
    '',
    ` ${v} =`,
  ];
  const rows: string[] = [];
  for (let t = 0; t < nt; t++) {
    for (let z = 0; z < nz; z++) {
      for (let y = 0; y < ny; y++) {
        const base = ((t * nz + z) * ny + y) * nx;
        rows.push(`  ${order.map((x) => { const value = grid.values[base + x]; return Number.isNaN(value) ? '_' : String(Number(value.toPrecision(4))); }).join(', ')}`);
      }
    }
  }
  lines.push(`${rows.join(',\n')} ;`, '}', '');
  return lines.join('\n');
}
