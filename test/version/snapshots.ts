// Hand-made snapshots of two versions: v2 adds a cruise, a station and cells, moves fits and changes region flags.
import type { VersionSnapshot } from '../../lib/version/index.js';

/** Version 1: two cruises. */
export function snapshotV1(): VersionSnapshot {
  return {
    version: 1,
    date: '2024-03-01',
    cruises: [
      { cruise: 'KX-01', stations: ['S1', 'S2'], samples: 40, cells: 3 },
      { cruise: 'KX-02', stations: ['S1'], samples: 12, cells: 2 },
    ],
    cellIds: ['c01', 'c02', 'c03', 'c04', 'c05'],
    parameters: [
      { class: 'diatom', model: 'ols', parameter: 'intercept', estimate: 1.2, lower: 1.0, upper: 1.4 },
      { class: 'diatom', model: 'ols', parameter: 'slope', estimate: 0.52, lower: 0.41, upper: 0.63 },
      { class: 'diatom', model: 'saturating', parameter: 'k', estimate: 0.3, lower: NaN, upper: NaN },
    ],
    regions: [
      { region: 'R1', class: 'diatom', flag: 'none', fold: 1.05 },
      { region: 'R2', class: 'diatom', flag: 'lower-than-fit', fold: 0.61 },
      { region: 'R3', class: 'diatom', flag: 'higher-than-fit', fold: 1.8 },
      { region: 'R4', class: 'diatom', flag: 'not-tested', fold: NaN },
    ],
    ledger: [
      { table: 'samples', action: 'excluded', reason: 'flag-bad', count: 3 },
      { table: 'samples', action: 'flagged', reason: 'below-detection', count: 7 },
    ],
  };
}

/** Version 2: cruise KX-03 added, station S3 on KX-01, cells c06…c12 added and c02 removed. */
export function snapshotV2(): VersionSnapshot {
  return {
    version: 2,
    date: '2024-06-01',
    cruises: [
      { cruise: 'KX-01', stations: ['S1', 'S2', 'S3'], samples: 52, cells: 2 },
      { cruise: 'KX-02', stations: ['S1'], samples: 12, cells: 2 },
      { cruise: 'KX-03', stations: ['A1', 'A2'], samples: 30, cells: 7 },
    ],
    cellIds: ['c01', 'c03', 'c04', 'c05', 'c06', 'c07', 'c08', 'c09', 'c10', 'c11', 'c12'],
    parameters: [
      { class: 'diatom', model: 'ols', parameter: 'intercept', estimate: 1.3, lower: 1.15, upper: 1.45 },
      { class: 'diatom', model: 'ols', parameter: 'slope', estimate: 0.71, lower: 0.6, upper: 0.82 },
      { class: 'diatom', model: 'saturating', parameter: 'k', estimate: 0.9, lower: 0.5, upper: 1.3 },
      { class: 'diatom', model: 'saturating', parameter: 'qmax', estimate: 42.5, lower: 30, upper: 55 },
    ],
    regions: [
      { region: 'R1', class: 'diatom', flag: 'lower-than-fit', fold: 0.55 },
      { region: 'R2', class: 'diatom', flag: 'none', fold: 0.92 },
      { region: 'R3', class: 'diatom', flag: 'lower-than-fit', fold: 0.7 },
      { region: 'R4', class: 'diatom', flag: 'not-tested', fold: NaN },
    ],
    ledger: [
      { table: 'cells', action: 'excluded', reason: 'no-match', count: 2 },
      { table: 'samples', action: 'excluded', reason: 'flag-bad', count: 5 },
      { table: 'samples', action: 'flagged', reason: 'below-detection', count: 7 },
    ],
  };
}
