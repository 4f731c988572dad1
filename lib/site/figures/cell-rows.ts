// Plain per-cell records read from the merged cell table, for the figure builders.
import type * as aq from 'arquero';

/** One cell with the fields the figures use; NaN where a value is missing. */
export interface CellRow {
  /** Cruise identifier. */
  cruise: string;
  /** Station identifier. */
  station: string;
  /** Phytoplankton class. */
  phytoClass: string;
  /** Degrees north. */
  lat: number;
  /** Degrees east. */
  lon: number;
  /** Ambient dissolved Fe, nmol kg⁻¹. */
  dfe: number;
  /** Where dFe came from ('bottle', 'grid', …). */
  dfeSource: string;
  /** Fe:C, µmol mol⁻¹. */
  feC: number;
  /** Luxury-uptake index (Fe:C over the class minimum). */
  luxury: number;
  /** Implied C:Fe, mol mol⁻¹. */
  cFe: number;
  /** Residual of log10 Fe:C from the primary fit. */
  residual: number;
  /** Region id, '' when none. */
  region: string;
}

/** A column as an array, or an array of undefined when the table lacks it. */
export function columnValues(table: aq.ColumnTable, name: string): unknown[] {
  const n = table.numRows();
  if (!table.columnNames().includes(name)) return new Array<unknown>(n).fill(undefined);
  return Array.from(table.array(name) as ArrayLike<unknown>);
}

const num = (v: unknown) => (typeof v === 'number' ? v : Number.NaN);
const str = (v: unknown) => (v === null || v === undefined ? '' : String(v));

/** Every row of the merged cell table as a CellRow, in table order. */
export function cellRows(cells: aq.ColumnTable): CellRow[] {
  const c = (name: string) => columnValues(cells, name);
  const [cruise, station, cls, lat, lon, dfe, src, feC, lux, cFe, res, region] = [
    'cruise', 'station', 'class', 'lat', 'lon', 'ambient_dissolved_fe', 'ambient_dissolved_fe_source', 'fe_c', 'luxury_index', 'c_fe', 'residual_log10', 'region',
  ].map(c);
  return cruise.map((_, i) => ({
    cruise: str(cruise[i]),
    station: str(station[i]),
    phytoClass: str(cls[i]),
    lat: num(lat[i]),
    lon: num(lon[i]),
    dfe: num(dfe[i]),
    dfeSource: str(src[i]),
    feC: num(feC[i]),
    luxury: num(lux[i]),
    cFe: num(cFe[i]),
    residual: num(res[i]),
    region: str(region[i]),
  }));
}

/** Distinct cruise/station keys of the rows. */
export function stationCount(rows: readonly { cruise: string; station: string }[]): number {
  return new Set(rows.map((r) => `${r.cruise}\u0000${r.station}`)).size;
}

/** Distinct sorted values of a key. */
export function distinct<T>(rows: readonly T[], key: (row: T) => string): string[] {
  return [...new Set(rows.map(key))].sort();
}

/** Median of the finite values (NaN when none). */
export function median(values: readonly number[]): number {
  const v = values.filter(Number.isFinite).sort((a, b) => a - b);
  if (!v.length) return Number.NaN;
  const m = v.length >> 1;
  return v.length % 2 ? v[m] : (v[m - 1] + v[m]) / 2;
}
