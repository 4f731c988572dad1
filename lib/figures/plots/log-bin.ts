// 2-D binning on log10 axes for dense point layers, done before Vega-Lite so an SVG stays small.

/** One occupied bin: edges in original units (for log axes) and its count. */
export interface LogBin {
  /** Facet key the bin belongs to. */
  group: string;
  x0: number;
  x1: number;
  y0: number;
  y1: number;
  /** Number of points in the bin. */
  count: number;
}

/** Counts of positive (x, y) points in `bins` × `bins` equal log10 intervals per group; non-positive points are skipped. */
export function logBin2d(points: readonly { group: string; x: number; y: number }[], bins = 40): LogBin[] {
  const lx = points.filter((p) => p.x > 0 && p.y > 0);
  if (!lx.length) return [];
  let ax = Infinity, bx = -Infinity, ay = Infinity, by = -Infinity;
  for (const p of lx) {
    const x = Math.log10(p.x), y = Math.log10(p.y);
    ax = Math.min(ax, x); bx = Math.max(bx, x); ay = Math.min(ay, y); by = Math.max(by, y);
  }
  const wx = (bx - ax || 1) / bins;
  const wy = (by - ay || 1) / bins;
  const counts = new Map<string, LogBin>();
  for (const p of lx) {
    const i = Math.min(bins - 1, Math.floor((Math.log10(p.x) - ax) / wx));
    const j = Math.min(bins - 1, Math.floor((Math.log10(p.y) - ay) / wy));
    const key = `${p.group}\u0000${i}\u0000${j}`;
    const bin = counts.get(key);
    if (bin) bin.count++;
    else counts.set(key, { group: p.group, x0: 10 ** (ax + i * wx), x1: 10 ** (ax + (i + 1) * wx), y0: 10 ** (ay + j * wy), y1: 10 ** (ay + (j + 1) * wy), count: 1 });
  }
  // Sorted output: same points in any order give the same spec.
  return [...counts.values()].sort((a, b) => (a.group < b.group ? -1 : a.group > b.group ? 1 : a.x0 - b.x0 || a.y0 - b.y0));
}
