// The bad inputs: each a patch of the base project (make-project.ts) and what `check` must say about it.
import { readFileSync, symlinkSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { CELL_HEADER, SAMPLE_HEADER, cellRows, cellsCsv, sampleRows, samplesCsv, tempDir, type ProjectPatch } from './make-project.js';

/** One corpus case. */
export interface CorpusCase {
  /** Short unique name, used as the test name and the key of its expectation. */
  name: string;
  /** How the case differs from the base project. */
  patch: ProjectPatch;
  /** Work done on the written folder (symlinks). */
  setup?: (dir: string) => void;
}

const fixture = (name: string): Uint8Array => new Uint8Array(readFileSync(fileURLToPath(new URL(`fixtures/${name}`, import.meta.url))));

const SAMPLE_COLS = SAMPLE_HEADER.split(',');
const CELL_COLS = CELL_HEADER.split(',');

/** Samples file with field `column` of data row `row` (0-based) set to `value` (written as is, so quote it yourself). */
function sampleField(row: number, column: string, value: string): Record<string, string> {
  const rows = sampleRows();
  const fields = rows[row].split(',');
  fields[SAMPLE_COLS.indexOf(column)] = value;
  rows[row] = fields.join(',');
  return { 'samples.csv': samplesCsv(rows) };
}

/** Cells file with field `column` of data row `row` set to `value`. */
function cellField(row: number, column: string, value: string): Record<string, string> {
  const rows = cellRows();
  const fields = rows[row].split(',');
  fields[CELL_COLS.indexOf(column)] = value;
  rows[row] = fields.join(',');
  return { 'cells.csv': cellsCsv(rows) };
}

/** A base-file text with one column dropped from header and rows. */
function dropColumn(text: string, column: string): string {
  const lines = text.trimEnd().split('\n').map((l) => l.split(','));
  const i = lines[0].indexOf(column);
  return `${lines.map((f) => f.filter((_, j) => j !== i).join(',')).join('\n')}\n`;
}

type Cfg = Record<string, unknown>;
type Inputs = { samples: Cfg[]; cells: Cfg[]; grids?: Cfg[]; regions?: unknown };
const inputs = (c: Cfg): Inputs => c.inputs as Inputs;
const withSampleInput = (edit: (s: Cfg) => void) => (c: Cfg): Cfg => {
  edit(inputs(c).samples[0]);
  return c;
};
const withCellInput = (edit: (s: Cfg) => void) => (c: Cfg): Cfg => {
  edit(inputs(c).cells[0]);
  return c;
};
const withGrid = (grid: Cfg) => (c: Cfg): Cfg => {
  inputs(c).grids = [grid];
  return c;
};
const withRegions = (regions: unknown) => (c: Cfg): Cfg => {
  inputs(c).regions = regions;
  return c;
};
const sampleUnits = (units: Record<string, string>) => withSampleInput((s) => Object.assign(s.units as Cfg, units));

/** A polygon feature collection (GeoJSON text) with the given rings. */
function geojson(...rings: number[][][]): string {
  return JSON.stringify({ type: 'FeatureCollection', features: rings.map((ring, i) => ({ type: 'Feature', properties: { name: `r${i + 1}` }, geometry: { type: 'Polygon', coordinates: [ring] } })) });
}
/** A box round the base stations, counter-clockwise (RFC 7946 exterior). */
const CCW_BOX = [[-160, 25], [-140, 25], [-140, 40], [-160, 40], [-160, 25]];

/** Ten levels of nine aliases each: a billion-laughs YAML. */
function aliasBomb(): string {
  const lines = ['l0: &l0 ["lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol", "lol"]'];
  for (let i = 1; i < 10; i++) lines.push(`l${i}: &l${i} [${Array(9).fill(`*l${i - 1}`).join(', ')}]`);
  return `${lines.join('\n')}\n`;
}

/** Samples text with cast and bottle columns (bottle numbered by depth), so duplicates can be recognised. */
function withBottles(rows: string[]): string {
  return samplesCsv(rows.map((r) => `${r},1,${r.split(',')[5] === '10' ? 2 : 1}`), `${SAMPLE_HEADER},cast,bottle`);
}

const crlfEvery = (text: string): string => text.split('\n').map((l, i) => (i % 2 === 0 ? `${l}\r` : l)).join('\n');

/** Every case of the corpus. */
export const CASES: CorpusCase[] = [
  // CSV structure
  { name: 'samples file with semicolon delimiter', patch: { files: { 'samples.csv': samplesCsv().replaceAll(',', ';') } } },
  { name: 'tab-separated samples named .csv', patch: { files: { 'samples.csv': samplesCsv().replaceAll(',', '\t') } } },
  { name: 'samples missing the required lat column', patch: { files: { 'samples.csv': dropColumn(samplesCsv(), 'lat') } } },
  { name: 'cells missing the required fe column', patch: { files: { 'cells.csv': dropColumn(cellsCsv(), 'fe') } } },
  { name: 'samples missing both depth and pressure', patch: { files: { 'samples.csv': dropColumn(samplesCsv(), 'depth') } } },
  { name: 'duplicate header in cells', patch: { files: { 'cells.csv': cellsCsv(cellRows().map((r) => `${r},1`), `${CELL_HEADER},fe`) } } },
  { name: 'ragged sample row with an extra field', patch: { files: { 'samples.csv': samplesCsv(sampleRows().map((r, i) => (i === 2 ? `${r},extra` : r))) } } },
  { name: 'ragged cell row with fields missing', patch: { files: { 'cells.csv': cellsCsv(cellRows().map((r, i) => (i === 4 ? r.split(',').slice(0, 5).join(',') : r))) } } },
  { name: 'unterminated quote in samples', patch: { files: sampleField(3, 'station', '"S2') } },
  { name: 'BOM at the start of samples (valid)', patch: { files: { 'samples.csv': `\uFEFF${samplesCsv()}` } } },
  { name: 'mixed CRLF and LF line endings (valid)', patch: { files: { 'samples.csv': crlfEvery(samplesCsv()), 'cells.csv': crlfEvery(cellsCsv()) } } },
  { name: 'blank lines between rows (valid)', patch: { files: { 'cells.csv': cellsCsv(cellRows().flatMap((r, i) => (i % 5 === 0 ? [r, ''] : [r]))) } } },
  { name: 'invalid UTF-8 in cells', patch: { files: { 'cells.csv': Buffer.concat([Buffer.from(`${CELL_HEADER}\n${cellRows()[0]}\n`), Buffer.from([0x63, 0xff, 0xfe, 0x2c]), Buffer.from(cellRows()[1].slice(cellRows()[1].indexOf(',')) + '\n')]) } } },
  { name: 'empty samples file', patch: { files: { 'samples.csv': '' } } },
  { name: 'samples file of blank lines only', patch: { files: { 'samples.csv': '\n\n\n' } } },
  { name: 'header-only cells file', patch: { files: { 'cells.csv': `${CELL_HEADER}\n` } } },
  { name: '10 MB single field in cells', patch: { files: cellField(0, 'phyto_class', 'x'.repeat(10 * 1024 * 1024)) } },
  { name: 'column map names a header the file lacks', patch: { config: withSampleInput((s) => (s.columns = { dissolved_fe: 'dFe_nM' })) } },
  { name: 'same file listed twice as samples', patch: { config: (c) => (inputs(c).samples.push({ ...inputs(c).samples[0] }), c) } },
  // numbers
  { name: 'thousands separator in depth', patch: { files: sampleField(1, 'depth', '"1,050"') } },
  { name: 'decimal comma in dissolved_fe', patch: { files: sampleField(0, 'dissolved_fe', '"0,25"') } },
  { name: 'decimal commas in a semicolon file', patch: { config: withSampleInput((s) => (s.delimiter = ';')), files: { 'samples.csv': samplesCsv().replaceAll(',', ';').replace(/(\d)\.(\d)/g, '$1,$2') } } },
  { name: 'text in numeric depth', patch: { files: sampleField(2, 'depth', 'deep') } },
  { name: 'NaN literal in cell fe', patch: { files: cellField(3, 'fe', 'NaN') } },
  { name: 'Infinity in nitrate', patch: { files: sampleField(2, 'nitrate', 'Infinity') } },
  { name: 'fill value -999 in dissolved_fe', patch: { files: sampleField(0, 'dissolved_fe', '-999') } },
  { name: 'fill value -9999 in depth', patch: { files: sampleField(1, 'depth', '-9999') } },
  { name: 'fill value 9.9e36 in nitrate', patch: { files: sampleField(2, 'nitrate', '9.9e36') } },
  { name: 'fill value -999 in cell fe', patch: { files: cellField(0, 'fe', '-999') } },
  { name: 'below-detection "<0.02" in dissolved_fe (substituted)', patch: { files: sampleField(0, 'dissolved_fe', '<0.02') } },
  { name: 'below-detection "bdl" with no limit', patch: { files: sampleField(0, 'dissolved_fe', 'bdl') } },
  { name: 'below-detection "bdl" with a configured limit', patch: { config: withSampleInput((s) => (s.detection_limits = { dissolved_fe: 0.02 })), files: sampleField(0, 'dissolved_fe', 'bdl') } },
  { name: 'negative cell fe content', patch: { files: cellField(1, 'fe', '-3.5') } },
  { name: 'zero cell fe content', patch: { files: cellField(2, 'fe', '0') } },
  { name: 'zero cell carbon', patch: { files: cellField(2, 'carbon', '0') } },
  { name: 'negative depth', patch: { files: sampleField(0, 'depth', '-10') } },
  // positions
  { name: 'lat and lon swapped onto land', patch: { files: { 'samples.csv': samplesCsv(sampleRows().map((r) => r.replace(/,30,-150,/, ',60,10,'))) } } },
  { name: 'lat out of range', patch: { files: sampleField(2, 'lat', '95') } },
  { name: 'lon out of range', patch: { files: sampleField(2, 'lon', '400') } },
  { name: 'lon 0-360 (valid, normalised)', patch: { files: { 'samples.csv': samplesCsv(sampleRows().map((r) => r.replace(/,(-1\d\d),/, (_, lon: string) => `,${Number(lon) + 360},`))) } } },
  { name: 'empty lat', patch: { files: sampleField(0, 'lat', '') } },
  { name: 'cells station in no sample file and no position', patch: { files: cellField(0, 'station', 'S9') } },
  // units
  { name: 'unknown unit for dissolved_fe', patch: { config: sampleUnits({ dissolved_fe: 'nmol/furlong' }) } },
  { name: 'wrong-dimension unit for dissolved_fe', patch: { config: sampleUnits({ dissolved_fe: 'm' }) } },
  { name: 'wrong-dimension unit for cell fe', patch: { config: withCellInput((s) => ((s.units as Cfg).fe = 'µm3')) } },
  { name: 'per-litre dFe without temperature and salinity (default density)', patch: { config: sampleUnits({ dissolved_fe: 'nmol/L' }), files: { 'samples.csv': dropColumn(dropColumn(samplesCsv(), 'temperature'), 'salinity') } } },
  { name: 'per-litre dFe with one row missing temperature', patch: { config: sampleUnits({ dissolved_fe: 'nmol/L' }), files: sampleField(0, 'temperature', '') } },
  { name: 'no unit for dissolved_fe', patch: { config: withSampleInput((s) => delete (s.units as Cfg).dissolved_fe) } },
  // flags, classes, duplicates
  { name: 'unknown IOC flag value', patch: { files: sampleField(1, 'dissolved_fe_flag', 'X') } },
  { name: 'bad flag excludes the value', patch: { files: sampleField(1, 'dissolved_fe_flag', '4') } },
  { name: 'unknown flag scheme', patch: { config: withSampleInput((s) => (s.flags = 'argo')) } },
  { name: 'unknown phytoplankton class', patch: { files: cellField(0, 'phyto_class', 'ciliate') } },
  { name: 'class alias (valid)', patch: { files: cellField(0, 'phyto_class', 'bacillariophyceae') } },
  { name: 'duplicate cell ids', patch: { files: cellField(1, 'cell_id', 'c001') } },
  { name: 'duplicate bottles', patch: { files: { 'samples.csv': withBottles([...sampleRows(), sampleRows()[0]]) } } },
  { name: 'same bottles in two sample files', patch: { config: (c) => (inputs(c).samples.push({ ...inputs(c).samples[0], path: 'samples-copy.csv' }), c), files: { 'samples.csv': withBottles(sampleRows()), 'samples-copy.csv': withBottles(sampleRows()) } } },
  // times and depths
  { name: 'impossible date 2021-02-30', patch: { files: sampleField(0, 'time', '2021-02-30T01:00:00Z') } },
  { name: 'month 13', patch: { files: sampleField(0, 'time', '2021-13-01T01:00:00Z') } },
  { name: 'timezone-less time', patch: { files: sampleField(0, 'time', '2021-05-01T01:00:00') } },
  { name: 'date written day-first', patch: { files: sampleField(0, 'time', '01/05/2021') } },
  { name: 'depth and pressure disagreeing', patch: { config: sampleUnits({ pressure: 'dbar' }), files: { 'samples.csv': samplesCsv(sampleRows().map((r, i) => `${r},${i === 1 ? 500 : r.split(',')[5]}`), `${SAMPLE_HEADER},pressure`) } } },
  { name: 'cell depth far from every bottle and no grid', patch: { files: cellField(0, 'depth', '3000') } },
  // grids
  { name: 'good NetCDF grid (valid)', patch: { config: withGrid({ path: 'grid.nc', quantity: 'dissolved_fe', variable: 'dfe' }), files: { 'grid.nc': fixture('good-grid.nc') } } },
  { name: 'NetCDF without coordinate attributes', patch: { config: withGrid({ path: 'grid.nc', quantity: 'dissolved_fe', variable: 'dfe' }), files: { 'grid.nc': fixture('no-coord-attrs.nc') } } },
  { name: 'truncated NetCDF', patch: { config: withGrid({ path: 'grid.nc', quantity: 'dissolved_fe', variable: 'dfe' }), files: { 'grid.nc': fixture('truncated.nc') } } },
  { name: 'NetCDF with the variable missing', patch: { config: withGrid({ path: 'grid.nc', quantity: 'dissolved_fe', variable: 'iron' }), files: { 'grid.nc': fixture('good-grid.nc') } } },
  { name: 'text file named .nc', patch: { config: withGrid({ path: 'grid.nc', quantity: 'nitrate', variable: 'no3' }), files: { 'grid.nc': 'lon,lat,value\n0,0,1\n' } } },
  { name: 'CSV grid without a unit', patch: { config: withGrid({ path: 'grid.csv', quantity: 'nitrate' }), files: { 'grid.csv': 'lon,lat,depth,value\n-150,30,0,1\n' } } },
  // config
  { name: 'config with an unknown top-level key', patch: { config: (c) => ({ ...c, colour: 'red' }) } },
  { name: 'config with an unknown key in a samples entry', patch: { config: withSampleInput((s) => (s.sheet = 'Bottles')) } },
  { name: 'config with a wrong type', patch: { config: (c) => ({ ...c, anomalies: { fdr_q: 'high' } }) } },
  { name: 'config missing report', patch: { config: (c) => (delete c.report, c) } },
  { name: 'config YAML syntax error', patch: { configText: 'report:\n  title: "unclosed\n  authors: [x]\n' } },
  { name: 'config that is a list', patch: { configText: '- a\n- b\n' } },
  { name: 'empty config', patch: { configText: '' } },
  { name: 'YAML alias bomb', patch: { configText: aliasBomb() } },
  { name: 'duplicate keys in config', patch: { configText: 'report:\n  title: x\n  title: y\n' } },
  { name: 'path outside the project', patch: { config: withSampleInput((s) => (s.path = '../samples.csv')) } },
  { name: 'absolute path', patch: { config: withSampleInput((s) => (s.path = '/etc/hostname')) } },
  { name: 'missing input file', patch: { config: withCellInput((s) => (s.path = 'cells/missing.csv')) } },
  {
    name: 'symlink pointing outside the project',
    patch: { config: withCellInput((s) => (s.path = 'linked.csv')) },
    setup: (dir) => {
      const outside = tempDir('bq-outside-');
      writeFileSync(join(outside, 'cells.csv'), cellsCsv());
      symlinkSync(join(outside, 'cells.csv'), join(dir, 'linked.csv'));
    },
  },
  { name: 'class id with capitals', patch: { config: (c) => ({ ...c, classes: { Diatom: { carbon: 'measured' } } }) } },
  // regions
  { name: 'unknown region scheme', patch: { config: withRegions('ices-areas') } },
  { name: 'GeoJSON regions (valid)', patch: { config: withRegions({ path: 'regions.geojson' }), files: { 'regions.geojson': geojson(CCW_BOX) } } },
  { name: 'GeoJSON with an open ring', patch: { config: withRegions({ path: 'regions.geojson' }), files: { 'regions.geojson': geojson(CCW_BOX.slice(0, 4)) } } },
  { name: 'GeoJSON with clockwise winding', patch: { config: withRegions({ path: 'regions.geojson' }), files: { 'regions.geojson': geojson([...CCW_BOX].reverse()) } } },
  { name: 'region file with no polygons', patch: { config: withRegions({ path: 'regions.geojson' }), files: { 'regions.geojson': JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [0, 0] } }] }) } } },
  { name: 'region file that is not JSON', patch: { config: withRegions({ path: 'regions.geojson' }), files: { 'regions.geojson': '{ "type": "FeatureCollection", ' } } },
];
