/** Canonical column names of the sample (bottle) and cell tables, with their kind; our own plain words. */

/** Value kind of a canonical column as the loader parses it. */
export type ColumnKind = 'text' | 'number' | 'time';

/** Sample (bottle) table columns. `*_flag` hold the raw flag as text; `*_dl` a per-row detection limit. */
export const SAMPLE_COLUMNS = {
  cruise: 'text',
  station: 'text',
  cast: 'text',
  bottle: 'text',
  lat: 'number',
  lon: 'number',
  time: 'time',
  depth: 'number',
  pressure: 'number',
  temperature: 'number',
  salinity: 'number',
  dissolved_fe: 'number',
  dissolved_fe_flag: 'text',
  dissolved_fe_dl: 'number',
  nitrate: 'number',
  nitrate_flag: 'text',
  nitrate_dl: 'number',
  phosphate: 'number',
  phosphate_flag: 'text',
  phosphate_dl: 'number',
  silicate: 'number',
  silicate_flag: 'text',
  silicate_dl: 'number',
} as const satisfies Record<string, ColumnKind>;

/** Elements whose cell contents basinquota knows (lower-case symbols); contents are per cell. */
export const ELEMENTS = ['fe', 'p', 'si', 'mn', 'zn', 'ni', 'cu', 'co', 's', 'cd'] as const;

/** One element symbol from ELEMENTS. */
export type Element = (typeof ELEMENTS)[number];

/** Cell table columns. Element contents are `<el>` with 1-sigma `<el>_sigma`, e.g. `fe`, `fe_sigma`. */
export const CELL_COLUMNS = {
  cell_id: 'text',
  cruise: 'text',
  station: 'text',
  cast: 'text',
  lat: 'number',
  lon: 'number',
  time: 'time',
  depth: 'number',
  phyto_class: 'text',
  biovolume: 'number',
  cell_shape: 'text',
  cell_length: 'number',
  cell_width: 'number',
  cell_height: 'number',
  carbon: 'number',
  carbon_sigma: 'number',
  ...Object.fromEntries(ELEMENTS.flatMap((el) => [[el, 'number'], [`${el}_sigma`, 'number']])),
} as Record<string, ColumnKind>;

/** Columns every loaded row carries: the input file (relative to the project) and its physical line (header = 1). */
export const PROVENANCE_COLUMNS = ['source_file', 'source_line'] as const;

/** Measured quantities of the sample table that carry flags and detection limits. */
export const SAMPLE_QUANTITIES = ['dissolved_fe', 'nitrate', 'phosphate', 'silicate'] as const;
