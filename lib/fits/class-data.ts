/** The valid cells of one class (or of the pool) in the arrays the fitters use. */
export interface ClassData {
  /** Input row index of each cell. */
  rows: number[];
  /** dFe, nmol kg⁻¹. */
  dFe: Float64Array;
  /** Fe:C, µmol mol⁻¹. */
  feC: Float64Array;
  /** log10 dFe. */
  lx: Float64Array;
  /** log10 Fe:C. */
  ly: Float64Array;
  /** σ of log10 Fe:C, σ/(Fe:C·ln 10); NaN when unknown. */
  sigmaLy: Float64Array;
  /** Station index 0..nStations−1 of each cell, numbered in order of the sorted station keys. */
  group: Int32Array;
  /** Number of distinct stations. */
  nStations: number;
}

/** Gathers the given input rows into fitting arrays; stations are numbered by sorted key so the bootstrap is order-free. */
export function classData(
  rows: number[],
  station: readonly string[],
  dFe: ArrayLike<number>,
  feC: ArrayLike<number>,
  feCSigma: ArrayLike<number>,
): ClassData {
  const n = rows.length;
  const keys = [...new Set(rows.map((r) => station[r]))].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
  const number = new Map(keys.map((k, i) => [k, i]));
  const out: ClassData = {
    rows,
    dFe: new Float64Array(n),
    feC: new Float64Array(n),
    lx: new Float64Array(n),
    ly: new Float64Array(n),
    sigmaLy: new Float64Array(n),
    group: new Int32Array(n),
    nStations: keys.length,
  };
  for (let k = 0; k < n; k++) {
    const r = rows[k];
    out.dFe[k] = dFe[r];
    out.feC[k] = feC[r];
    out.lx[k] = Math.log10(dFe[r]);
    out.ly[k] = Math.log10(feC[r]);
    const s = feCSigma[r];
    out.sigmaLy[k] = s > 0 && Number.isFinite(s) ? s / (feC[r] * Math.LN10) : NaN;
    out.group[k] = number.get(station[r]) as number;
  }
  return out;
}
