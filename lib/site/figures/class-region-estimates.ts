// Geometric means of a per-cell quantity by class × region, with intervals, for the luxury and C:Fe figures.
import { type ClassRegionEstimate } from '../../figures/index.js';
import { rowsCsv } from './rows-csv.js';
import type { CellRow } from './cell-rows.js';
import { geometricMean } from './geometric-mean.js';

/** Estimates (geometric mean with its interval) per class × region of `value(row)`; groups with < 2 values are left out. */
export function classRegionEstimates(rows: readonly CellRow[], value: (r: CellRow) => number, regionName: (id: string) => string, level: number): (ClassRegionEstimate & { n: number })[] {
  const groups = new Map<string, { phytoClass: string; region: string; values: number[] }>();
  for (const r of rows) {
    const v = value(r);
    if (!(v > 0)) continue;
    const region = regionName(r.region);
    const key = `${r.phytoClass}\u0000${region}`;
    const g = groups.get(key) ?? { phytoClass: r.phytoClass, region, values: [] };
    g.values.push(v);
    groups.set(key, g);
  }
  const out: (ClassRegionEstimate & { n: number })[] = [];
  for (const key of [...groups.keys()].sort()) {
    const g = groups.get(key)!;
    const m = geometricMean(g.values, level);
    if (m) out.push({ phytoClass: g.phytoClass, region: g.region, value: m.value, lower: m.lower, upper: m.upper, n: m.n });
  }
  return out;
}

/** CSV of class × region estimates with a named value column. */
export function estimatesCsv(estimates: readonly (ClassRegionEstimate & { n: number })[], valueHeader: string): string {
  return rowsCsv(estimates, [{ key: 'phytoClass', header: 'class' }, 'region', 'n', { key: 'value', header: valueHeader }, 'lower', 'upper']);
}
