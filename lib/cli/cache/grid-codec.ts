// Grids to bytes and back: a JSON-able header and the raw axis (Float64) and value (Float32) bytes.
import type { Grid } from '../../types.js';

/** A grid's scalar fields and where its arrays sit in the blob. */
export interface GridHeader {
  /** Every non-array field of the grid. */
  meta: Pick<Grid, 'quantity' | 'units' | 'timeKind' | 'periodicLon' | 'source' | 'variable'>;
  /** Per array field: byte offset and element count. */
  arrays: Record<'lon' | 'lat' | 'depth' | 'time' | 'values', { offset: number; count: number }>;
}

const AXES = ['lon', 'lat', 'depth', 'time'] as const;

/** Encode a grid; arrays are 8-byte aligned from `startOffset`. */
export function encodeGrid(grid: Grid, startOffset: number): { header: GridHeader; chunks: Uint8Array[] } {
  const chunks: Uint8Array[] = [];
  let offset = startOffset;
  const arrays = {} as GridHeader['arrays'];
  for (const name of [...AXES, 'values'] as const) {
    const a = grid[name];
    const pad = (8 - (offset % 8)) % 8;
    if (pad) chunks.push(new Uint8Array(pad));
    offset += pad;
    arrays[name] = { offset, count: a.length };
    chunks.push(new Uint8Array(a.buffer.slice(a.byteOffset, a.byteOffset + a.byteLength)));
    offset += a.byteLength;
  }
  const { quantity, units, timeKind, periodicLon, source, variable } = grid;
  return { header: { meta: { quantity, units, timeKind, periodicLon, source, variable }, arrays }, chunks };
}

/** Decode a grid from its header and blob; throws when the layout does not fit the blob. */
export function decodeGrid(header: GridHeader, blob: Uint8Array): Grid {
  const take = (name: keyof GridHeader['arrays'], size: number): ArrayBuffer => {
    const { offset, count } = header.arrays[name];
    if (!(offset >= 0 && count >= 0 && offset + count * size <= blob.length)) throw new Error(`grid array ${name} lies outside the entry`);
    const copy = new Uint8Array(count * size);
    copy.set(blob.subarray(offset, offset + count * size));
    return copy.buffer;
  };
  const grid: Grid = {
    ...header.meta,
    lon: new Float64Array(take('lon', 8)),
    lat: new Float64Array(take('lat', 8)),
    depth: new Float64Array(take('depth', 8)),
    time: new Float64Array(take('time', 8)),
    values: new Float32Array(take('values', 4)),
  };
  if (grid.values.length !== grid.lon.length * grid.lat.length * grid.depth.length * grid.time.length) throw new Error('grid values do not fill its axes');
  return grid;
}
