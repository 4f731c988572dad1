import { badGroupIndex } from './messages.js';

/** Rows of each group stored contiguously (compressed sparse rows). */
export interface GroupRows {
  /** Number of group ids, 1 + the largest id. */
  groups: number;
  /** Rows of group j are rows[start[j]..start[j+1]). */
  start: Int32Array;
  /** Row indices ordered by group, input order within a group. */
  rows: Int32Array;
  /** Ids of the groups that have rows, ascending. */
  present: Int32Array;
}

/** Indexes the rows of each group id in one counting-sort pass, O(n + groups) (Knuth, TAOCP vol. 3, §5.2, distribution counting). */
export function groupRows(group: Int32Array): GroupRows {
  const n = group.length;
  let g = 0;
  for (let i = 0; i < n; i++) {
    if (!(group[i] >= 0)) throw new RangeError(badGroupIndex(i, group[i]));
    if (group[i] + 1 > g) g = group[i] + 1;
  }
  const start = new Int32Array(g + 1);
  for (let i = 0; i < n; i++) start[group[i] + 1]++;
  for (let j = 0; j < g; j++) start[j + 1] += start[j];
  const rows = new Int32Array(n);
  const fill = start.slice(0, g);
  for (let i = 0; i < n; i++) rows[fill[group[i]]++] = i;
  let m = 0;
  for (let j = 0; j < g; j++) if (start[j + 1] > start[j]) m++;
  const present = new Int32Array(m);
  m = 0;
  for (let j = 0; j < g; j++) if (start[j + 1] > start[j]) present[m++] = j;
  return { groups: g, start, rows, present };
}
