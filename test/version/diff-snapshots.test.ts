import { describe, expect, it } from 'vitest';
import { diffSnapshots, firstVersionChanges, prettyJson } from '../../lib/version/index.js';
import { snapshotV1, snapshotV2 } from './snapshots.js';

describe('diffSnapshots', () => {
  const changes = diffSnapshots(snapshotV1(), snapshotV2());

  it('diffSnapshots(v1, v2) names both versions', () => {
    expect(changes.previous).toEqual({ version: 1, date: '2024-03-01' });
    expect(changes.current).toEqual({ version: 2, date: '2024-06-01' });
  });

  it('diffSnapshots(v1, v2) reports an added cruise once, not station by station', () => {
    expect(changes.cruises).toEqual({ added: ['KX-03'], removed: [] });
    expect(changes.stations).toEqual([{ cruise: 'KX-01', added: ['S3'], removed: [] }]);
  });

  it('diffSnapshots(v1, v2) lists per-cruise counts that differ, with 0 for a new cruise', () => {
    expect(changes.holdings).toEqual([
      { cruise: 'KX-01', samplesBefore: 40, samplesAfter: 52, cellsBefore: 3, cellsAfter: 2 },
      { cruise: 'KX-03', samplesBefore: 0, samplesAfter: 30, cellsBefore: 0, cellsAfter: 7 },
    ]);
  });

  it('diffSnapshots(v1, v2) counts cells added and removed and lists the first five ids', () => {
    expect(changes.cells).toEqual({ before: 5, after: 11, added: 7, removed: 1, addedIds: ['c06', 'c07', 'c08', 'c09', 'c10'], removedIds: ['c02'] });
  });

  it('diffSnapshots(v1, v2) marks a parameter that moved beyond its old interval and one that stayed within', () => {
    const slope = changes.parameters.find((p) => p.parameter === 'slope')!;
    const intercept = changes.parameters.find((p) => p.parameter === 'intercept')!;
    expect(slope).toEqual({ class: 'diatom', model: 'ols', parameter: 'slope', before: { estimate: 0.52, lower: 0.41, upper: 0.63 }, after: { estimate: 0.71, lower: 0.6, upper: 0.82 }, outsideOldInterval: true });
    expect(intercept.outsideOldInterval).toBe(false);
  });

  it('diffSnapshots(v1, v2) never calls a move "outside" an interval that was not known, and keeps NaN as null', () => {
    const k = changes.parameters.find((p) => p.parameter === 'k')!;
    expect(k.before).toEqual({ estimate: 0.3, lower: null, upper: null });
    expect(k.outsideOldInterval).toBe(false);
  });

  it('diffSnapshots(v1, v2) lists a parameter that appeared with no old value', () => {
    const qmax = changes.parameters.find((p) => p.parameter === 'qmax')!;
    expect(qmax.before).toBeNull();
    expect(qmax.outsideOldInterval).toBe(false);
  });

  it('diffSnapshots(v1, v2) sorts parameters by class, model, parameter', () => {
    expect(changes.parameters.map((p) => `${p.model}/${p.parameter}`)).toEqual(['ols/intercept', 'ols/slope', 'saturating/k', 'saturating/qmax']);
  });

  it('diffSnapshots(v1, v2) finds a region newly flagged, one cleared and one reversed, and skips unchanged ones', () => {
    expect(changes.regions).toEqual([
      { region: 'R1', class: 'diatom', change: 'newly-flagged', before: 'none', after: 'lower-than-fit', foldBefore: 1.05, foldAfter: 0.55 },
      { region: 'R2', class: 'diatom', change: 'cleared', before: 'lower-than-fit', after: 'none', foldBefore: 0.61, foldAfter: 0.92 },
      { region: 'R3', class: 'diatom', change: 'reversed', before: 'higher-than-fit', after: 'lower-than-fit', foldBefore: 1.8, foldAfter: 0.7 },
    ]);
  });

  it('diffSnapshots(v1, v2) keeps only ledger rows whose count differs, 0 where a row is new', () => {
    expect(changes.ledger).toEqual([
      { table: 'cells', action: 'excluded', reason: 'no-match', before: 0, after: 2 },
      { table: 'samples', action: 'excluded', reason: 'flag-bad', before: 3, after: 5 },
    ]);
  });

  it('diffSnapshots(v2, v1) reports removals and a disappeared parameter', () => {
    const back = diffSnapshots(snapshotV2(), snapshotV1());
    expect(back.cruises).toEqual({ added: [], removed: ['KX-03'] });
    expect(back.stations).toEqual([{ cruise: 'KX-01', added: [], removed: ['S3'] }]);
    expect(back.parameters.find((p) => p.parameter === 'qmax')!.after).toBeNull();
  });

  it('diffSnapshots(a, b) gives the same result after a JSON round trip of the snapshots (NaN → null)', () => {
    const viaJson = diffSnapshots(JSON.parse(JSON.stringify(snapshotV1())), JSON.parse(JSON.stringify(snapshotV2())));
    expect(prettyJson(viaJson)).toBe(prettyJson(changes));
  });

  it('diffSnapshots(a, b) sorts regions by region then class, not by their encoded text', () => {
    const a = { ...snapshotV1(), regions: [] };
    const b = { ...snapshotV1(), regions: [{ region: 'a b', class: 'x', flag: 'lower-than-fit', fold: 0.5 }, { region: 'a', class: 'z', flag: 'lower-than-fit', fold: 0.5 }] };
    expect(diffSnapshots(a, b).regions.map((r) => r.region)).toEqual(['a', 'a b']);
  });

  it('diffSnapshots(a, b) does not mutate its inputs', () => {
    const a = snapshotV1();
    const b = snapshotV2();
    diffSnapshots(a, b);
    expect(prettyJson([a, b])).toBe(prettyJson([snapshotV1(), snapshotV2()]));
  });

  it('diffSnapshots(a, a) finds nothing', () => {
    const same = diffSnapshots(snapshotV1(), snapshotV1());
    expect([same.cruises.added, same.stations, same.holdings, same.regions, same.ledger, same.parameters.filter((p) => p.outsideOldInterval)].every((l) => l.length === 0)).toBe(true);
    expect(same.cells.added + same.cells.removed).toBe(0);
  });
});

describe('firstVersionChanges', () => {
  it('firstVersionChanges(snapshot) has no previous version and empty lists', () => {
    const first = firstVersionChanges(snapshotV1());
    expect(first.previous).toBeNull();
    expect(first.current).toEqual({ version: 1, date: '2024-03-01' });
    expect(first.parameters).toEqual([]);
    expect(first.cells.after).toBe(5);
  });
});
