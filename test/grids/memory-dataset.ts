import type { AttributeValue, DatasetVariable, NetcdfDataset, NetcdfType, NumericArray } from '../../lib/grids/index.js';

/** Test helper: one in-memory variable of a neutral dataset. */
export function memoryVariable(
  name: string,
  dims: [string, number][],
  data: NumericArray,
  attributes: Record<string, AttributeValue> = {},
  type: NetcdfType = data instanceof Float32Array ? 'float' : data instanceof Int16Array ? 'short' : 'double',
): DatasetVariable {
  return { name, dims: dims.map((d) => d[0]), shape: dims.map((d) => d[1]), type, attributes, read: () => data };
}

/** Test helper: a neutral dataset from variables; dimensions collected from them. */
export function memoryDataset(variables: DatasetVariable[], name = 'memory.nc'): NetcdfDataset {
  const dimensions: Record<string, number> = {};
  for (const v of variables) v.dims.forEach((d, i) => (dimensions[d] = v.shape[i]));
  return { name, format: 'netCDF-4', attributes: {}, dimensions, variables };
}

/** Test helper: a coordinate variable. */
export function coordinate(name: string, values: number[], attributes: Record<string, AttributeValue>): DatasetVariable {
  return memoryVariable(name, [[name, values.length]], Float64Array.from(values), attributes);
}
