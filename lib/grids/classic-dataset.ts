import { NetCDFReader } from 'netcdfjs';
import type { InputBytes } from '../types.js';
import type { AttributeValue, DatasetVariable, NetcdfDataset, NetcdfType, NumericArray } from './dataset.js';
import { notNetcdf, truncatedVariable } from './messages.js';

interface RawAttribute {
  name: string;
  type: string;
  value: number | string | number[];
}

const BYTES: Record<string, number> = { byte: 1, char: 1, short: 2, int: 4, float: 4, double: 8 };

function attributeMap(list: RawAttribute[]): Record<string, AttributeValue> {
  const out: Record<string, AttributeValue> = {};
  for (const a of list) {
    if (typeof a.value === 'string') out[a.name] = a.value;
    else if (Array.isArray(a.value)) out[a.name] = a.type === 'byte' ? a.value.map((b) => (b > 127 ? b - 256 : b)) : a.value.slice();
    else out[a.name] = [a.value];
  }
  return out;
}

// netcdfjs returns one boxed number per value (and nested arrays for record variables), which costs
// seconds and gigabytes on a 10^7-value climatology; its header is used and the big-endian data are
// decoded here straight into typed arrays.
function decode(view: DataView, type: string, at: number, out: NumericArray, start: number, count: number): void {
  switch (type) {
    case 'byte':
      for (let i = 0; i < count; i++) out[start + i] = view.getInt8(at + i);
      return;
    case 'short':
      for (let i = 0; i < count; i++) out[start + i] = view.getInt16(at + 2 * i, false);
      return;
    case 'int':
      for (let i = 0; i < count; i++) out[start + i] = view.getInt32(at + 4 * i, false);
      return;
    case 'float':
      for (let i = 0; i < count; i++) out[start + i] = view.getFloat32(at + 4 * i, false);
      return;
    case 'double':
      for (let i = 0; i < count; i++) out[start + i] = view.getFloat64(at + 8 * i, false);
      return;
  }
}

function allocate(type: string, n: number): NumericArray {
  switch (type) {
    case 'byte':
      return new Int8Array(n);
    case 'short':
      return new Int16Array(n);
    case 'int':
      return new Int32Array(n);
    case 'float':
      return new Float32Array(n);
    default:
      return new Float64Array(n);
  }
}

/** Opens a classic or 64-bit offset NetCDF file (NetCDF User Guide, "File format specifications") as a neutral dataset. */
export function classicDataset(input: InputBytes): NetcdfDataset {
  let reader: NetCDFReader;
  try {
    reader = new NetCDFReader(input.bytes);
  } catch (error) {
    throw new Error(notNetcdf(input.name, error instanceof Error ? error.message : String(error)), { cause: error });
  }
  const header = reader.header;
  const numRecords = header.recordDimension.length;
  const recordStep = header.recordDimension.recordStep ?? 0;
  const dimNames = header.dimensions.map((d) => d.name);
  const dimensions: Record<string, number> = {};
  header.dimensions.forEach((d, i) => {
    dimensions[d.name] = i === header.recordDimension.id ? numRecords : d.size;
  });
  const bytes = input.bytes;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const variables: DatasetVariable[] = header.variables.map((v) => {
    const dims = v.dimensions.map((id) => dimNames[id]);
    const shape = dims.map((d) => dimensions[d]);
    const type = v.type as NetcdfType;
    return {
      name: v.name,
      dims,
      shape,
      type,
      attributes: attributeMap(v.attributes as RawAttribute[]),
      read(): NumericArray {
        if (type === 'char') throw new Error(`${input.name}: variable ${v.name} holds text, not numbers`);
        const width = BYTES[type];
        const n = shape.reduce((a, b) => a * b, 1);
        const out = allocate(type, n);
        if (!v.record) {
          if (v.offset + n * width > bytes.byteLength) throw new Error(truncatedVariable(input.name, v.name, v.offset + n * width, bytes.byteLength));
          decode(view, type, v.offset, out, 0, n);
          return out;
        }
        const perRecord = numRecords > 0 ? n / numRecords : 0;
        const last = v.offset + (numRecords - 1) * recordStep + perRecord * width;
        if (numRecords > 0 && last > bytes.byteLength) throw new Error(truncatedVariable(input.name, v.name, last, bytes.byteLength));
        for (let r = 0; r < numRecords; r++) decode(view, type, v.offset + r * recordStep, out, r * perRecord, perRecord);
        return out;
      },
    };
  });
  return {
    name: input.name,
    format: header.version === 2 ? '64-bit offset' : 'classic',
    attributes: attributeMap(header.globalAttributes as RawAttribute[]),
    dimensions,
    variables,
  };
}
