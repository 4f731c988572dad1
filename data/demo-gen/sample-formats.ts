/** How each invented lab writes its bottle files: headers, units, flag scheme and number formatting. */
import { seawaterDensity, t68FromT90 } from '../../lib/units/index.js';
import type { Bottle } from './bottles.js';
import { fixed, roundTo } from './format.js';
import type { Cruise } from './scenario.js';

/** A bottle-file layout. */
export interface SampleLayout {
  /** File extension (csv or tsv). */
  ext: 'csv' | 'tsv';
  /** Field delimiter. */
  delimiter: string;
  /** Flag scheme of the file as the config names it. */
  flags: 'ioc' | 'woce';
  /** Flag written for a good value. */
  goodFlag: string;
  /** Canonical column → header, in file order. */
  columns: Readonly<Record<string, string>>;
  /** Canonical column → unit as written. */
  units: Readonly<Record<string, string>>;
  /** The fields of one bottle, in header order. */
  fields(bottle: Bottle): string[];
  /** dFe of one bottle in nmol/kg as a reader of the written fields gets it (after any per-litre conversion). */
  readBackFe(bottle: Bottle): number;
}

/** Density in kg/L from the written temperature, salinity and pressure; EOS-80 as the tool uses it. */
function densityKgPerL(b: Bottle): number {
  const t = roundTo(b.temperature, 3);
  const s = roundTo(b.salinity, 3);
  const p = roundTo(b.pressure, 1);
  return seawaterDensity(s, t68FromT90(t), p) / 1000;
}

const LAB_A_COLUMNS = {
  cruise: 'Cruise', station: 'Station', cast: 'Cast', bottle: 'Niskin', time: 'Date_UTC', lat: 'Lat_N', lon: 'Lon_E', depth: 'Depth_m',
  temperature: 'Temp_C', salinity: 'Sal', dissolved_fe: 'dFe_nmolkg', dissolved_fe_flag: 'dFe_QC', nitrate: 'NO3_umolkg', nitrate_flag: 'NO3_QC',
  phosphate: 'PO4_umolkg', phosphate_flag: 'PO4_QC', silicate: 'SiOH4_umolkg', silicate_flag: 'SiOH4_QC',
} as const;

const LAB_B_COLUMNS = {
  cruise: 'cruise_id', station: 'stn', cast: 'cast_no', bottle: 'bottle_no', time: 'sampled_at', lat: 'lat_dd', lon: 'lon_dd', pressure: 'pres_dbar',
  temperature: 'temp_c', salinity: 'salinity', dissolved_fe: 'fe_d', dissolved_fe_flag: 'fe_d_q', nitrate: 'no3', nitrate_flag: 'no3_q',
  phosphate: 'po4', phosphate_flag: 'po4_q', silicate: 'sil', silicate_flag: 'sil_q',
} as const;

const LITRE_COLUMNS = { ...LAB_B_COLUMNS, dissolved_fe: 'fe_d_nM', nitrate: 'no3_uM', phosphate: 'po4_uM', silicate: 'sil_uM' } as const;

const COMMON_UNITS = { temperature: 'degC', salinity: 'PSU' } as const;

/** The layout a cruise's bottle file is written in. */
export function sampleLayout(cruise: Cruise): SampleLayout {
  const head = (b: Bottle, withDepth: boolean): string[] => [
    b.cruise, b.station, b.cast, String(b.bottle), b.time, fixed(b.lat, 4), fixed(b.lon, 4),
    withDepth ? fixed(b.depth, 1) : fixed(b.pressure, 1), fixed(b.temperature, 3), fixed(b.salinity, 3),
  ];
  const measured = (values: [string, string, string, string], good: string): string[] => values.flatMap((v) => [v, good]);
  switch (cruise.sampleFormat) {
    case 'lab-a':
      return {
        ext: 'csv', delimiter: ',', flags: 'ioc', goodFlag: '1', columns: LAB_A_COLUMNS,
        units: { depth: 'm', ...COMMON_UNITS, dissolved_fe: 'nmol/kg', nitrate: 'µmol/kg', phosphate: 'µmol/kg', silicate: 'µmol/kg' },
        fields: (b) => [...head(b, true), ...measured([fixed(b.dissolvedFe, 3), fixed(b.nitrate, 2), fixed(b.phosphate, 3), fixed(b.silicate, 2)], '1')],
        readBackFe: (b) => roundTo(b.dissolvedFe, 3),
      };
    case 'lab-b':
      return {
        ext: 'tsv', delimiter: '\t', flags: 'woce', goodFlag: '2', columns: LAB_B_COLUMNS,
        units: { pressure: 'dbar', ...COMMON_UNITS, dissolved_fe: 'nmol/kg', nitrate: 'umol/kg', phosphate: 'umol/kg', silicate: 'umol/kg' },
        fields: (b) => [...head(b, false), ...measured([fixed(b.dissolvedFe, 3), fixed(b.nitrate, 2), fixed(b.phosphate, 3), fixed(b.silicate, 2)], '2')],
        readBackFe: (b) => roundTo(b.dissolvedFe, 3),
      };
    case 'lab-b-litre':
      return {
        ext: 'csv', delimiter: ',', flags: 'woce', goodFlag: '2', columns: LITRE_COLUMNS,
        units: { pressure: 'dbar', ...COMMON_UNITS, dissolved_fe: 'nmol/L', nitrate: 'µM', phosphate: 'µM', silicate: 'µM' },
        fields: (b) => {
          const rho = densityKgPerL(b);
          return [...head(b, false), ...measured([fixed(b.dissolvedFe * rho, 3), fixed(b.nitrate * rho, 2), fixed(b.phosphate * rho, 3), fixed(b.silicate * rho, 2)], '2')];
        },
        readBackFe: (b) => roundTo(b.dissolvedFe * densityKgPerL(b), 3) / densityKgPerL(b),
      };
  }
}
