import { describe, expect, it } from 'vitest';
import { bootstrapByGroup } from '../../lib/stats/bootstrap-by-group.js';
import { bootstrapGroupCounts } from '../../lib/stats/bootstrap-group-counts.js';

describe('bootstrapGroupCounts', () => {
  it('bootstrapGroupCounts draws the same groups as bootstrapByGroup for the same seed', () => {
    const group = Int32Array.from([0, 1, 1, 3, 3, 3, 4, 4, 4, 4, 5]);
    const seen: string[] = [];
    bootstrapByGroup(
      group,
      (idx, len) => {
        const c = new Array(6).fill(0);
        for (let k = 0; k < len; k++) c[group[idx[k]]]++;
        seen.push(c.map((v, j) => v / Math.max(1, group.filter((g) => g === j).length)).join(','));
        return [len];
      },
      { replicates: 30, seed: 9 },
    );
    const got: string[] = [];
    const r = bootstrapGroupCounts(group, (counts) => (got.push(Array.from(counts).join(',')), [counts[0]]), { replicates: 30, seed: 9 });
    expect(got).toEqual(seen);
    // group 2 has no rows and is never drawn; 5 groups are resampled
    expect(r.groups).toBe(5);
    expect(r.estimate).toEqual([1]);
  });
});
