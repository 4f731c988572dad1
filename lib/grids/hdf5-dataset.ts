import * as h5wasm from 'h5wasm/node';
import type { InputBytes } from '../types.js';
import type { AttributeValue, DatasetVariable, NetcdfDataset, NetcdfType, NumericArray } from './dataset.js';
import { notNetcdf, truncatedHdf5 } from './messages.js';

// The wasm module loads once per process, when this module is first imported (about 0.2 s).
await h5wasm.ready;

/** HDF5 attributes the netCDF-4 library writes for its own bookkeeping (NetCDF User Guide, "netCDF-4 format"). */
const INTERNAL_ATTRIBUTES = new Set([
  'CLASS',
  'NAME',
  'REFERENCE_LIST',
  'DIMENSION_LIST',
  '_Netcdf4Dimid',
  '_Netcdf4Coordinates',
  '_nc3_strict',
  '_NCProperties',
  '_SuperblockVersion',
  '_IsNetcdf4',
]);

/** Marker the netCDF-4 library puts in NAME of a dimension that has no coordinate variable. */
const DIMENSION_ONLY = 'This is a netCDF dimension but not a netCDF variable';

let openCount = 0;

/**
 * End-of-file address stored in the HDF5 superblock (HDF5 File Format Specification, "Superblock",
 * versions 0–3), read before opening so a truncated file gets a clear message instead of the
 * library's diagnostics on stderr.
 */
export function hdf5StoredEof(bytes: Uint8Array): number | undefined {
  if (bytes.length < 16) return undefined;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const version = bytes[8];
  const sizeOfOffsets = version >= 2 ? bytes[9] : bytes[13];
  const base = version >= 2 ? 12 : version === 1 ? 28 : 24;
  const at = base + 2 * sizeOfOffsets;
  if (version > 3 || at + sizeOfOffsets > bytes.length) return undefined;
  if (sizeOfOffsets === 8) return Number(view.getBigUint64(at, true));
  if (sizeOfOffsets === 4) return view.getUint32(at, true);
  return undefined;
}

interface Hdf5Metadata {
  type: number;
  size: number;
  signed: boolean;
}

function netcdfType(meta: Hdf5Metadata): NetcdfType {
  // HDF5 type classes: 0 integer, 1 float, 3 string (HDF5 H5T_class_t).
  if (meta.type === 3) return 'string';
  if (meta.type === 1) return meta.size === 4 ? 'float' : 'double';
  const signed = meta.signed;
  switch (meta.size) {
    case 1:
      return signed ? 'byte' : 'ubyte';
    case 2:
      return signed ? 'short' : 'ushort';
    case 4:
      return signed ? 'int' : 'uint';
    default:
      return signed ? 'int64' : 'uint64';
  }
}

function toNumbers(value: unknown): number[] | undefined {
  if (typeof value === 'number') return [value];
  if (typeof value === 'bigint') return [Number(value)];
  if (ArrayBuffer.isView(value) || Array.isArray(value)) {
    const out: number[] = [];
    for (const v of Array.from(value as ArrayLike<unknown>)) {
      if (typeof v === 'number') out.push(v);
      else if (typeof v === 'bigint') out.push(Number(v));
      else return undefined;
    }
    return out;
  }
  return undefined;
}

function attributeValue(value: unknown): AttributeValue | undefined {
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && value.every((v) => typeof v === 'string')) return value.join('');
  return toNumbers(value);
}

function attributeMap(attrs: Record<string, { value: unknown }>): Record<string, AttributeValue> {
  const out: Record<string, AttributeValue> = {};
  for (const name of Object.keys(attrs)) {
    if (INTERNAL_ATTRIBUTES.has(name)) continue;
    const v = attributeValue(attrs[name].value);
    if (v !== undefined) out[name] = v;
  }
  return out;
}

function asNumeric(value: unknown): NumericArray {
  if (value instanceof BigInt64Array || value instanceof BigUint64Array) return Float64Array.from(value, (v) => Number(v));
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) return value as NumericArray;
  const numbers = toNumbers(value);
  if (numbers === undefined) throw new Error('not numeric');
  return Float64Array.from(numbers);
}

/** An open netCDF-4 dataset; `close` releases the wasm file and its in-memory copy. */
export interface OpenHdf5Dataset {
  /** The neutral view; `read` works only until `close`. */
  dataset: NetcdfDataset;
  /** Closes the file and removes its bytes from the wasm file system. */
  close(): void;
}

/** Opens a netCDF-4 (HDF5) file with h5wasm as a neutral dataset; only the root group is read (NetCDF User Guide, "netCDF-4 format"). */
export function hdf5Dataset(input: InputBytes): OpenHdf5Dataset {
  const FS = h5wasm.FS;
  if (FS === null) throw new Error(notNetcdf(input.name, 'the HDF5 library did not load'));
  const storedEof = hdf5StoredEof(input.bytes);
  if (storedEof === undefined || storedEof > input.bytes.length) {
    throw new Error(truncatedHdf5(input.name, storedEof, input.bytes.length));
  }
  // MEMFS path inside the wasm module, never the real disk.
  const path = `/basinquota-grid-${++openCount}.nc`;
  FS.writeFile(path, input.bytes);
  let file: InstanceType<typeof h5wasm.File>;
  try {
    file = new h5wasm.File(path, 'r');
    if (file.file_id < 0n) throw new Error('HDF5 could not open the file');
  } catch (error) {
    FS.unlink(path);
    throw new Error(notNetcdf(input.name, error instanceof Error ? error.message : String(error)), { cause: error });
  }
  const close = (): void => {
    try {
      file.close();
    } finally {
      FS.unlink(path);
    }
  };
  try {
    const dimensions: Record<string, number> = {};
    const variables: DatasetVariable[] = [];
    for (const key of file.keys()) {
      const entity = file.get(key);
      if (!(entity instanceof h5wasm.Dataset)) continue;
      const shape = entity.shape ?? [];
      const nameAttr = entity.attrs.NAME?.value;
      const isScale = entity.attrs.CLASS?.value === 'DIMENSION_SCALE';
      if (isScale && shape.length === 1) dimensions[key] = shape[0];
      if (typeof nameAttr === 'string' && nameAttr.startsWith(DIMENSION_ONLY)) continue;
      const dims = shape.map((size, i) => {
        const scales = isScale && shape.length === 1 ? [key] : entity.get_attached_scales(i);
        const dim = scales.length > 0 ? scales[0].replace(/^.*\//, '') : `phony_dim_${i}`;
        dimensions[dim] ??= size;
        return dim;
      });
      const dataset = entity;
      variables.push({
        name: key,
        dims,
        shape: shape.slice(),
        type: netcdfType(entity.metadata as Hdf5Metadata),
        attributes: attributeMap(entity.attrs as Record<string, { value: unknown }>),
        read: () => asNumeric(dataset.value),
      });
    }
    return {
      dataset: { name: input.name, format: 'netCDF-4', attributes: attributeMap(file.attrs as Record<string, { value: unknown }>), dimensions, variables },
      close,
    };
  } catch (error) {
    close();
    throw new Error(notNetcdf(input.name, error instanceof Error ? error.message : String(error)), { cause: error });
  }
}
