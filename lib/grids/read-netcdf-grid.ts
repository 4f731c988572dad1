import type { Grid, InputBytes } from '../types.js';
import { cfGrid } from './cf-grid.js';
import { classicDataset } from './classic-dataset.js';
import { hdf5Dataset } from './hdf5-dataset.js';
import { notNetcdfMagic, unsupportedCdf5 } from './messages.js';
import type { GridReadOptions } from './options.js';

/** File format from the first bytes (NetCDF User Guide, "File format specifications"; HDF5 format signature). */
export function netcdfFormat(bytes: Uint8Array): 'classic' | '64-bit offset' | 'cdf5' | 'netCDF-4' | undefined {
  if (bytes.length >= 4 && bytes[0] === 0x43 && bytes[1] === 0x44 && bytes[2] === 0x46) {
    if (bytes[3] === 1) return 'classic';
    if (bytes[3] === 2) return '64-bit offset';
    if (bytes[3] === 5) return 'cdf5';
  }
  if (bytes.length >= 8 && bytes[0] === 0x89 && bytes[1] === 0x48 && bytes[2] === 0x44 && bytes[3] === 0x46) return 'netCDF-4';
  return undefined;
}

/** Reads one gridded variable from a classic, 64-bit offset or netCDF-4 file through the CF layer; values in canonical units. */
export function readNetcdfGrid(input: InputBytes, options: GridReadOptions): Grid {
  const format = netcdfFormat(input.bytes);
  if (format === undefined) throw new Error(notNetcdfMagic(input.name, input.bytes));
  if (format === 'cdf5') throw new Error(unsupportedCdf5(input.name));
  if (format === 'netCDF-4') {
    const open = hdf5Dataset(input);
    try {
      return cfGrid(open.dataset, options);
    } finally {
      open.close();
    }
  }
  return cfGrid(classicDataset(input), options);
}
