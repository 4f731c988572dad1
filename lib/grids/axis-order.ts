/** An axis sorted ascending: `values[i]` came from input position `source[i]`. */
export interface AxisOrder {
  /** Coordinates, strictly ascending. */
  values: Float64Array;
  /** Input index of each output position. */
  source: Int32Array;
}

function sortedOrder(values: ArrayLike<number>): Int32Array {
  const idx = Int32Array.from({ length: values.length }, (_, i) => i);
  // Ties broken by input position keep the result deterministic.
  return idx.sort((a, b) => values[a] - values[b] || a - b);
}

/** Sorts an axis ascending (descending latitudes, upward depths); returns a message on NaN or repeated values. */
export function ascendingOrder(values: ArrayLike<number>): AxisOrder | string {
  for (let i = 0; i < values.length; i++) if (!Number.isFinite(values[i])) return `has a non-finite value at index ${i}`;
  const source = sortedOrder(values);
  const sorted = Float64Array.from(source, (i) => values[i]);
  for (let i = 1; i < sorted.length; i++) if (sorted[i] === sorted[i - 1]) return `repeats the value ${sorted[i]}`;
  return { values: sorted, source };
}

/** Wraps a longitude in degrees into [-180, 180). */
export function wrapLongitude(lon: number): number {
  const w = (((lon + 180) % 360) + 360) % 360 - 180;
  return w === 180 ? -180 : w;
}

/**
 * Wraps longitudes (0–360 or any range) into [-180, 180) and sorts them; a column repeated 360° apart
 * (0 and 360) is kept once. `periodic` when the wrap-around gap and every spacing are within 1.5× the
 * median spacing, i.e. the axis goes round the globe without a hole.
 */
export function longitudeOrder(values: ArrayLike<number>): { order: AxisOrder; periodic: boolean } | string {
  for (let i = 0; i < values.length; i++) if (!Number.isFinite(values[i])) return `has a non-finite value at index ${i}`;
  const wrapped = Float64Array.from(values as ArrayLike<number>, wrapLongitude);
  const all = sortedOrder(wrapped);
  const keep: number[] = [];
  for (let k = 0; k < all.length; k++) {
    const i = all[k];
    if (keep.length > 0 && wrapped[keep[keep.length - 1]] === wrapped[i]) {
      const prev = keep[keep.length - 1];
      if (Math.abs(values[prev] - values[i]) % 360 !== 0 || values[prev] === values[i]) return `repeats the longitude ${values[i]}`;
      continue;
    }
    keep.push(i);
  }
  const source = Int32Array.from(keep);
  const sorted = Float64Array.from(source, (i) => wrapped[i]);
  const n = sorted.length;
  let periodic = false;
  if (n >= 3) {
    const gaps = Float64Array.from({ length: n - 1 }, (_, i) => sorted[i + 1] - sorted[i]).sort();
    const median = gaps[(n - 1) >> 1];
    const wrapGap = sorted[0] + 360 - sorted[n - 1];
    periodic = wrapGap <= 1.5 * median && gaps[n - 2] <= 1.5 * median;
  }
  return { order: { values: sorted, source }, periodic };
}
