// A minimal writer of classic (CDF-1) NetCDF files: fixed dimensions, float/double variables, text attributes.
// Used by the benchmark to write a large grid quickly; ncgen on a CDL of 25 million values would take minutes.

/** One variable to write. */
export interface ClassicVariable {
  /** Variable name. */
  name: string;
  /** Dimension names, slowest first. */
  dims: string[];
  /** 'float' (32-bit) or 'double' (64-bit). */
  type: 'float' | 'double';
  /** Text attributes. */
  attributes: Record<string, string>;
  /** Values in C order. */
  values: ArrayLike<number>;
}

const NC_DIMENSION = 10;
const NC_VARIABLE = 11;
const NC_ATTRIBUTE = 12;
const NC_CHAR = 2;
const NC_FLOAT = 5;
const NC_DOUBLE = 6;

const pad4 = (n: number): number => (n + 3) & ~3;

/** Encode dimensions and variables as a classic NetCDF file (NetCDF Classic Format Specification, CDF-1). */
export function writeClassicNetcdf(dims: Record<string, number>, variables: ClassicVariable[]): Uint8Array {
  const header: number[] = [];
  const int = (v: number) => header.push((v >>> 24) & 255, (v >>> 16) & 255, (v >>> 8) & 255, v & 255);
  const name = (s: string) => {
    const bytes = new TextEncoder().encode(s);
    int(bytes.length);
    header.push(...bytes, ...new Array(pad4(bytes.length) - bytes.length).fill(0));
  };
  const dimNames = Object.keys(dims);
  header.push(0x43, 0x44, 0x46, 1);
  int(0);
  int(NC_DIMENSION);
  int(dimNames.length);
  for (const d of dimNames) {
    name(d);
    int(dims[d]);
  }
  int(0);
  int(0);
  int(NC_VARIABLE);
  int(variables.length);
  const beginAt: number[] = [];
  const sizes = variables.map((v) => pad4(v.dims.reduce((p, d) => p * dims[d], 1) * (v.type === 'float' ? 4 : 8)));
  for (const v of variables) {
    name(v.name);
    int(v.dims.length);
    for (const d of v.dims) int(dimNames.indexOf(d));
    const attrs = Object.entries(v.attributes);
    int(attrs.length ? NC_ATTRIBUTE : 0);
    int(attrs.length);
    for (const [k, text] of attrs) {
      name(k);
      int(NC_CHAR);
      name(text);
    }
    int(v.type === 'float' ? NC_FLOAT : NC_DOUBLE);
    int(sizes[beginAt.length]);
    beginAt.push(header.length);
    int(0);
  }
  let offset = header.length;
  const out = new Uint8Array(header.length + sizes.reduce((a, b) => a + b, 0));
  out.set(header);
  const view = new DataView(out.buffer);
  variables.forEach((v, k) => {
    view.setInt32(beginAt[k], offset);
    const step = v.type === 'float' ? 4 : 8;
    for (let i = 0; i < v.values.length; i++) {
      if (step === 4) view.setFloat32(offset + i * 4, v.values[i]);
      else view.setFloat64(offset + i * 8, v.values[i]);
    }
    offset += sizes[k];
  });
  return out;
}
