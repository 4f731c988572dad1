/** How each invented lab writes its single-cell quota files: headers, content units and id style. */
import type { Cell } from './cells.js';
import { fixed, sig } from './format.js';
import type { Cruise } from './scenario.js';

/** A cell-file layout. */
export interface CellLayout {
  /** Canonical column → header, in file order. */
  columns: Readonly<Record<string, string>>;
  /** Canonical column → unit as written. */
  units: Readonly<Record<string, string>>;
  /** Size of the content unit in mol/cell. */
  contentUnitMol: number;
  /** Cell id from station index, depth (m) and cell number. */
  cellId(cruise: string, stationIndex: number, depth: number, k: number): string;
  /** The fields of one cell, in header order. */
  fields(cell: Cell): string[];
}

const pad = (n: number, width: number) => String(n).padStart(width, '0');

/** Fields shared by every layout after the identifying columns: contents, size and measured carbon. */
function bodyFields(cell: Cell, unitMol: number, carbonText: (mol: number) => string): string[] {
  const content = (el: keyof Cell['contents']) => [sig(cell.contents[el].value / unitMol, 6), String(Number((cell.contents[el].sigma / unitMol).toPrecision(3)))];
  return [
    ...content('fe'), ...content('p'), ...content('mn'), ...content('zn'),
    Number.isNaN(cell.biovolume) ? '' : String(cell.biovolume),
    cell.shape,
    Number.isNaN(cell.length) ? '' : fixed(cell.length, 2),
    Number.isNaN(cell.width) ? '' : fixed(cell.width, 2),
    cell.carbonMeasured ? carbonText(cell.carbon) : '',
  ];
}

/** Element columns in file order with a header pattern. */
function elementColumns(header: (el: string, sigma: boolean) => string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const el of ['fe', 'p', 'mn', 'zn']) {
    out[el] = header(el, false);
    out[`${el}_sigma`] = header(el, true);
  }
  return out;
}

/** Units for the four element columns and their sigmas. */
function elementUnits(unit: string): Record<string, string> {
  return Object.fromEntries(['fe', 'p', 'mn', 'zn'].flatMap((el) => [[el, unit], [`${el}_sigma`, unit]]));
}

const SIZE_UNITS = { biovolume: 'µm3', cell_length: 'µm', cell_width: 'µm' } as const;

/** The layout a cruise's cell file is written in. */
export function cellLayout(cruise: Cruise): CellLayout {
  switch (cruise.cellFormat) {
    case 'xrf-fmol': {
      const unitMol = 1e-15;
      return {
        columns: {
          cell_id: 'cell', cruise: 'cruise', station: 'station', depth: 'depth_m', phyto_class: 'taxon',
          ...elementColumns((el, s) => `${el[0].toUpperCase()}${el.slice(1)}_${s ? 'err_' : ''}fmol`),
          biovolume: 'biovol_um3', cell_shape: 'shape', cell_length: 'len_um', cell_width: 'wid_um', carbon: 'C_fmol',
        },
        units: { depth: 'm', ...elementUnits('fmol/cell'), ...SIZE_UNITS, carbon: 'fmol/cell' },
        contentUnitMol: unitMol,
        cellId: (c, s, d, k) => `${c}-${pad(s + 1, 2)}-${pad(d, 3)}-${pad(k, 2)}`,
        fields: (cell) => [cell.cellId, cell.cruise, cell.station, fixed(cell.depth, 0), cell.label, ...bodyFields(cell, unitMol, (mol) => sig(mol / unitMol, 6))],
      };
    }
    case 'xrf-amol': {
      const unitMol = 1e-18;
      return {
        columns: {
          cell_id: 'cell_code', cruise: 'cruise_id', station: 'stn', depth: 'sample_depth_m', phyto_class: 'class_label',
          ...elementColumns((el, s) => `${el}_${s ? 'sd_' : ''}amol`),
          biovolume: 'volume_um3', cell_shape: 'geometry', cell_length: 'length_um', cell_width: 'width_um', carbon: 'carbon_pgC',
        },
        units: { depth: 'm', ...elementUnits('amol/cell'), ...SIZE_UNITS, carbon: 'pg C/cell' },
        contentUnitMol: unitMol,
        cellId: (c, s, d, k) => `${c}_s${pad(s + 1, 2)}_z${pad(d, 3)}_c${pad(k, 2)}`,
        fields: (cell) => [cell.cellId, cell.cruise, cell.station, fixed(cell.depth, 0), cell.label, ...bodyFields(cell, unitMol, (mol) => sig(mol * 12.011e12, 6))],
      };
    }
    case 'xrf-mol':
    case 'xrf-mol-positions': {
      const unitMol = 1;
      const positions = cruise.cellFormat === 'xrf-mol-positions';
      return {
        columns: {
          cell_id: 'CellID', cruise: 'Cruise', station: 'Station', ...(positions ? { lat: 'Latitude', lon: 'Longitude' } : {}), depth: 'Depth', phyto_class: 'Group',
          ...elementColumns((el, s) => `${el[0].toUpperCase()}${el.slice(1)}${s ? '_1s' : ''}`),
          biovolume: 'Biovolume', cell_shape: 'Shape', cell_length: 'Length', cell_width: 'Width', carbon: 'Carbon',
        },
        units: { depth: 'm', ...elementUnits('mol/cell'), ...SIZE_UNITS, carbon: 'mol/cell' },
        contentUnitMol: unitMol,
        cellId: (c, s, d, k) => `${c}.${s + 1}.${d}.${k}`,
        fields: (cell) => [
          cell.cellId, cell.cruise, cell.station, ...(positions ? [fixed(cell.lat, 4), fixed(cell.lon, 4)] : []), fixed(cell.depth, 0), cell.label,
          ...bodyFields(cell, unitMol, (mol) => sig(mol, 6)),
        ],
      };
    }
  }
}
