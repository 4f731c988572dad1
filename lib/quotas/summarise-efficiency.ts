/** Group summaries of implied C:Fe efficiency (or any positive quota): median, geometric mean and its interval. */
import * as aq from 'arquero';
import { median } from 'd3-array';
import { tQuantile } from '../stats/distributions.js';
import { numberColumn, textColumn } from '../match/table-columns.js';

/** Options of `summariseEfficiency`. */
export interface SummariseOptions {
  /** Column summarised; default 'c_fe' (mol C per mol Fe). Values ≤ 0 or missing are left out of n. */
  column?: string;
  /** Two-sided confidence level of the interval; default 0.95. */
  level?: number;
}

/**
 * Per group of `by`: n, median, geometric mean and its t interval on log10 values
 * (10^(mean ± t(1−α/2, n−1)·sd/√n); Student 1908, back-transformed), in the column's unit.
 * Output columns: ...by, n, median, geometric_mean, geometric_mean_lower, geometric_mean_upper; groups sorted by key.
 * The interval is NaN for n < 2.
 */
export function summariseEfficiency(table: aq.ColumnTable, by: string[] = ['class'], options: SummariseOptions = {}): aq.ColumnTable {
  const column = options.column ?? 'c_fe';
  const level = options.level ?? 0.95;
  const values = numberColumn(table, column);
  const keys = by.map((name) => textColumn(table, name));
  const groups = new Map<string, { labels: string[]; values: number[] }>();
  for (let i = 0; i < values.length; i++) {
    const labels = keys.map((k) => k[i]);
    const id = JSON.stringify(labels);
    let group = groups.get(id);
    if (group === undefined) groups.set(id, (group = { labels, values: [] }));
    if (Number.isFinite(values[i]) && values[i] > 0) group.values.push(values[i]);
  }
  const ids = [...groups.keys()].sort();
  const data: Record<string, unknown[]> = {};
  for (const name of by) data[name] = [];
  const cols = ['n', 'median', 'geometric_mean', 'geometric_mean_lower', 'geometric_mean_upper'];
  for (const name of cols) data[name] = [];
  for (const id of ids) {
    const { labels, values: xs } = groups.get(id)!;
    by.forEach((name, j) => data[name].push(labels[j]));
    const n = xs.length;
    const logs = xs.map(Math.log10);
    const mean = n > 0 ? logs.reduce((s, x) => s + x, 0) / n : Number.NaN;
    let half = Number.NaN;
    if (n >= 2) {
      const sd = Math.sqrt(logs.reduce((s, x) => s + (x - mean) ** 2, 0) / (n - 1));
      half = tQuantile(1 - (1 - level) / 2, n - 1) * (sd / Math.sqrt(n));
    }
    data.n.push(n);
    data.median.push(n > 0 ? (median(xs) ?? Number.NaN) : Number.NaN);
    data.geometric_mean.push(10 ** mean);
    data.geometric_mean_lower.push(10 ** (mean - half));
    data.geometric_mean_upper.push(10 ** (mean + half));
  }
  return aq.table(data, [...by, ...cols]);
}
