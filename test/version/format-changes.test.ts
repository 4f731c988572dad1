import { describe, expect, it } from 'vitest';
import { diffSnapshots, firstVersionChanges, formatChanges, formatParameterValue } from '../../lib/version/index.js';
import { snapshotV1, snapshotV2 } from './snapshots.js';

describe('formatChanges', () => {
  it('formatChanges(diffSnapshots(v1, v2)) prints every block in aligned columns', () => {
    expect(formatChanges(diffSnapshots(snapshotV1(), snapshotV2()))).toBe(`Changes from version 1 (2024-03-01) to version 2 (2024-06-01)

Data
  cruises added: KX-03
  cruises removed: -
  cells: 5 -> 11 (7 added, 1 removed)
  cells added: c06, c07, c08, c09, c10 and 2 more
  cells removed: c02

Stations
  cruise  added  removed
  KX-01   S3     -

Holdings
  cruise   samples   cells
  KX-01   40 -> 52  3 -> 2
  KX-03    0 -> 30  0 -> 7

Fit parameters
  class   model       parameter  old [interval]     new [interval]    beyond old interval
  diatom  ols         intercept  1.2 [1, 1.4]       1.3 [1.15, 1.45]  no
  diatom  ols         slope      0.52 [0.41, 0.63]  0.71 [0.6, 0.82]  yes
  diatom  saturating  k          0.3                0.9 [0.5, 1.3]    -
  diatom  saturating  qmax       absent             42.5 [30, 55]     -

Regions
  region  class   change         old                         new
  R1      diatom  newly flagged  none (fold 1.05)            lower-than-fit (fold 0.55)
  R2      diatom  cleared        lower-than-fit (fold 0.61)  none (fold 0.92)
  R3      diatom  reversed       higher-than-fit (fold 1.8)  lower-than-fit (fold 0.7)

Ledger counts
  table    action    reason    old  new
  cells    excluded  no-match    0    2
  samples  excluded  flag-bad    3    5
`);
  });

  it('formatChanges(diffSnapshots(v, v)) says nothing moved where nothing did', () => {
    const v = { ...snapshotV1(), parameters: [] };
    expect(formatChanges(diffSnapshots(v, v))).toBe(`Changes from version 1 (2024-03-01) to version 1 (2024-03-01)

Data
  cruises added: -
  cruises removed: -
  cells: 5 -> 5 (0 added, 0 removed)

Fit parameters
  none in either version

Regions
  no region changed its flag

Ledger counts
  unchanged
`);
  });

  it('formatChanges(firstVersionChanges(v)) says there is nothing to compare with', () => {
    expect(formatChanges(firstVersionChanges(snapshotV1()))).toBe('Version 1 (2024-03-01). This is the first version; there is nothing to compare with.\n');
  });
});

describe('formatParameterValue', () => {
  it('formatParameterValue(value) writes the estimate and interval to three significant figures', () => {
    expect(formatParameterValue({ estimate: 0.123456, lower: 0.1, upper: 0.15 })).toBe('0.123 [0.1, 0.15]');
    expect(formatParameterValue({ estimate: 2, lower: null, upper: null })).toBe('2');
    expect(formatParameterValue(null)).toBe('absent');
  });
});
