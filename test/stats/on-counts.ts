import { groupRows } from '../../lib/stats/group-rows.js';

/** A small grouped data set, a draw of group counts, and the rows that draw expands to (repeats included). */
export function smallResample() {
  const x = [0.1, 0.15, 0.3, 0.45, 0.6, 0.8, 1.1, 1.5, 2.0, 2.7, 3.5, 4.4];
  const y = x.map((v, i) => (12 * v) / (0.5 + v) * (1 + 0.07 * Math.sin(3 * i)));
  const group = Int32Array.from([0, 0, 1, 1, 1, 2, 3, 3, 4, 4, 5, 5]);
  const index = groupRows(group);
  const counts = Int32Array.from([2, 0, 1, 3, 0, 1]);
  const rows: number[] = [];
  for (let j = 0; j < counts.length; j++) for (let c = 0; c < counts[j]; c++) for (let t = index.start[j]; t < index.start[j + 1]; t++) rows.push(index.rows[t]);
  return { x, y, group, index, counts, rows };
}
