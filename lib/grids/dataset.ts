/** Neutral view of a NetCDF file (classic, 64-bit offset or netCDF-4): variables, attributes and dimensions. */

/** Numeric data of one variable as read from the file, in the file's own type. */
export type NumericArray =
  | Int8Array
  | Uint8Array
  | Int16Array
  | Uint16Array
  | Int32Array
  | Uint32Array
  | Float32Array
  | Float64Array;

/** An attribute value: text, or numbers (a scalar attribute is a one-element list). */
export type AttributeValue = string | number[];

/** External data type names of NetCDF (NetCDF User Guide, "Data types"). */
export type NetcdfType = 'byte' | 'ubyte' | 'char' | 'short' | 'ushort' | 'int' | 'uint' | 'int64' | 'uint64' | 'float' | 'double' | 'string';

/** One variable of a dataset. */
export interface DatasetVariable {
  /** Variable name in the file. */
  name: string;
  /** Dimension names, slowest-varying first (C order). */
  dims: string[];
  /** Length of each dimension, same order as `dims`. */
  shape: number[];
  /** External data type. */
  type: NetcdfType;
  /** Attributes by name; internal bookkeeping attributes of the format are left out. */
  attributes: Record<string, AttributeValue>;
  /** Reads the numeric values in C order; throws for text variables. */
  read(): NumericArray;
}

/** A whole file as the CF layer sees it. */
export interface NetcdfDataset {
  /** Input file name (messages). */
  name: string;
  /** On-disk format, for messages and provenance. */
  format: 'classic' | '64-bit offset' | 'netCDF-4';
  /** Global attributes. */
  attributes: Record<string, AttributeValue>;
  /** Dimension lengths by name. */
  dimensions: Record<string, number>;
  /** Variables in file order. */
  variables: DatasetVariable[];
}

/** Text of an attribute, or undefined when absent or numeric. */
export function textAttribute(attributes: Record<string, AttributeValue>, name: string): string | undefined {
  const v = attributes[name];
  return typeof v === 'string' ? v.trim() : undefined;
}

/** Numbers of an attribute, or undefined when absent or text. */
export function numberAttribute(attributes: Record<string, AttributeValue>, name: string): number[] | undefined {
  const v = attributes[name];
  return Array.isArray(v) ? v : undefined;
}
